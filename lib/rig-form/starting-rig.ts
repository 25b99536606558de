import example from "@/physics/examples/quarry-highline.json";
import { DEFAULT_MINIMUM_FACTORS, RigInputSchema, type RigInputDraft } from "@/physics";

/** The crew's minimum safety factors as crew settings hold them (one per kind of gear). */
export interface CrewMinimums {
  webbing: number;
  rope: number;
  anchor: number;
  connector: number;
  sling: number;
  pulley: number;
  brake: number;
}

const orDefault = (value: number | undefined) => (typeof value === "number" && Number.isFinite(value) ? value : DEFAULT_MINIMUM_FACTORS.other);

/**
 * The crew's minimums in the engine's categories. The engine has one "other" category for gear
 * that is not webbing, a connector, a sling or an anchor (rope, pulleys, the brake): it takes
 * the strictest of the crew's minimums for those, so no component is held to less than the crew asks.
 */
export function engineMinimums(crew: Partial<CrewMinimums>): RigInputDraft["minimumSafetyFactors"] {
  return {
    webbing: orDefault(crew.webbing),
    connector: orDefault(crew.connector),
    sling: orDefault(crew.sling),
    anchor: orDefault(crew.anchor),
    other: Math.max(orDefault(crew.rope), orDefault(crew.pulley), orDefault(crew.brake)),
  };
}

/** The worked example (an invented quarry highline) with the crew's minimums: the page shows figures at once. */
export function startingRig(crew: Partial<CrewMinimums>): RigInputDraft {
  return { ...RigInputSchema.parse(example), minimumSafetyFactors: engineMinimums(crew) };
}
