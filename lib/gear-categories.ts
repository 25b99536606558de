import { COMPONENT_CATEGORIES, DEFAULT_MINIMUM_FACTORS, type ComponentCategory, type RigInputDraft } from "@/physics";
import type { GearKind } from "./validations/kit";
import type { SafetyFactorClass } from "./validations/crew";

// Where each piece of gear sits in the engine's safety-factor check. The engine has one "other" category
// for gear that is not webbing, a connector, a sling or an anchor (rope, pulleys, brakes and line grips).

/** The engine's component category of each kind of Kit gear. */
export const ENGINE_CATEGORY_OF_KIND: Record<GearKind, ComponentCategory> = {
  webbing: "webbing",
  rope: "other",
  brake: "other",
  line_grip: "other",
  pulley: "other",
  connector: "connector",
  sling: "sling",
  other: "other",
};

/** The engine's category of each class the crew sets a minimum safety factor for: a kind of gear, or the anchors. */
export const ENGINE_CATEGORY_OF_CLASS: Record<SafetyFactorClass, ComponentCategory> = {
  webbing: ENGINE_CATEGORY_OF_KIND.webbing,
  rope: ENGINE_CATEGORY_OF_KIND.rope,
  anchor: "anchor",
  connector: ENGINE_CATEGORY_OF_KIND.connector,
  sling: ENGINE_CATEGORY_OF_KIND.sling,
  pulley: ENGINE_CATEGORY_OF_KIND.pulley,
  brake: ENGINE_CATEGORY_OF_KIND.brake,
};

export type CrewMinimums = Record<SafetyFactorClass, number>;

const orDefault = (value: number | undefined, category: ComponentCategory) =>
  typeof value === "number" && Number.isFinite(value) ? value : DEFAULT_MINIMUM_FACTORS[category];

/**
 * The crew's minimums in the engine's categories: a category shared by several classes takes the strictest
 * of their minimums, so no component is held to less than the crew asks. A minimum the crew has not set is
 * the engine's default.
 */
export function engineMinimums(crew: Partial<CrewMinimums>): Record<ComponentCategory, number> {
  const classes = Object.entries(ENGINE_CATEGORY_OF_CLASS) as [SafetyFactorClass, ComponentCategory][];
  const strictest = (category: ComponentCategory) => {
    const own = classes.filter(([, c]) => c === category).map(([name]) => orDefault(crew[name], category));
    return own.length ? Math.max(...own) : DEFAULT_MINIMUM_FACTORS[category];
  };
  return Object.fromEntries(COMPONENT_CATEGORIES.map((category) => [category, strictest(category)])) as Record<ComponentCategory, number>;
}

/**
 * Every crew minimum the engine takes: the safety factors in its categories, the brake's margin (the crew's
 * minimum for brakes: lowest slip over the force at the brake) and the clearance below a fall.
 */
export function engineCrewMinimums(
  crew: Partial<CrewMinimums>,
  minClearanceM: number,
): Pick<RigInputDraft, "minimumSafetyFactors" | "minimumBrakeMargin" | "minimumClearanceM"> {
  return { minimumSafetyFactors: engineMinimums(crew), minimumBrakeMargin: orDefault(crew.brake, "other"), minimumClearanceM: minClearanceM };
}
