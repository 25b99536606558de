import { checkNumber } from "./check-number";
import { RigInputError } from "./rig-input-error";

/** Where the brake holds the system: on the crew's tail, or on the tail of one stage (0 = the stage on the line). */
export type BrakeLocation = { on: "tail" } | { on: "stage"; stage: number };

/** A simple (one stage) or compound (stages multiply) pulley system; stage 0 pulls on the line. */
export interface PulleySystem {
  /** n of each n:1 stage. */
  stages: number[];
  /** Efficiency of each sheave, 0 < e ≤ 1. */
  sheaveEfficiency: number;
  brake: BrakeLocation;
}

export interface PulleyAnalysis {
  idealAdvantage: number;
  /** Advantage while hauling, sheave friction included. */
  haulingAdvantage: number;
  /** Force the crew puts on the tail to reach the target line tension, N. */
  haulForce: number;
  peopleNeeded: number;
  /** Ideal advantage between the brake and the line: friction is not relied on to hold. */
  brakeAdvantage: number;
}

/**
 * Hauling advantage of one n:1 stage: strand i carries e^i of the haul force, so MA = 1 + e + … + e^(n−1)
 * (rope-rescue training practice, e.g. a 3:1 gives 1 + e + e²). Stages of a compound system multiply.
 */
function stageHaulingAdvantage(ratio: number, efficiency: number): number {
  let sum = 0;
  for (let i = 0; i < ratio; i++) sum += efficiency ** i;
  return sum;
}

export function checkPulleySystem(system: PulleySystem): void {
  if (!Array.isArray(system.stages) || system.stages.length === 0) throw new RigInputError("tensioning.stages", system.stages, "at least one stage");
  system.stages.forEach((n, i) =>
    checkNumber(`tensioning.stages.${i}.ratio`, n, (v) => Number.isInteger(v) && v >= 1 && v <= 20, "a whole number from 1 to 20 (n of an n:1 stage)"),
  );
  checkNumber("tensioning.sheaveEfficiency", system.sheaveEfficiency, (v) => v > 0 && v <= 1, "a fraction > 0 and ≤ 1");
  if (system.brake.on === "stage") {
    const last = system.stages.length - 1;
    checkNumber(
      "tensioning.brake.stage",
      system.brake.stage,
      (v) => Number.isInteger(v) && v >= 0 && v <= last,
      `a stage index from 0 (the stage on the line) to ${last}`,
    );
  }
}

/** Advantages, haul force and crew for a pulley system tensioning a line to `lineTension` (N). */
export function analysePulleySystem(system: PulleySystem, lineTension: number, pullPerPerson: number): PulleyAnalysis {
  checkPulleySystem(system);
  checkNumber("tensioning.pullPerPersonN", pullPerPerson, (v) => v > 0, "a pull per person > 0 N");
  const idealAdvantage = system.stages.reduce((a, n) => a * n, 1);
  const haulingAdvantage = system.stages.reduce((a, n) => a * stageHaulingAdvantage(n, system.sheaveEfficiency), 1);
  const haulForce = lineTension / haulingAdvantage;
  // A brake on the tail holds behind every stage; one on a stage, behind that stage and those nearer the line.
  const braked = system.brake.on === "tail" ? system.stages : system.stages.slice(0, system.brake.stage + 1);
  const brakeAdvantage = braked.reduce((a, n) => a * n, 1);
  return { idealAdvantage, haulingAdvantage, haulForce, peopleNeeded: Math.ceil(haulForce / pullPerPerson), brakeAdvantage };
}
