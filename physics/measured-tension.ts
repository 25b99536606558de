import { fixedDigits } from "./display";
import { bracketedRoot } from "./bracketed-root";
import { sagAt } from "./line-profile";
import { parseRigInput } from "./parse-rig-input";
import { rigLine } from "./rig-line";
import { RigInputError } from "./rig-input-error";
import { solveLine } from "./solve-line";
import { STANDARD_GRAVITY } from "./units";
import { lengthForPretension } from "./unstretched-length";

// What the engine predicts a load cell reads on the rigged line, for the conditions measured on site,
// so a crew can compare its readings with the plan.

/**
 * Tension at `anchor` of the unloaded line whose mid-span sag is `sagM`: the length is found from the
 * sag (sag grows with length), then the equilibrium gives the tension.
 */
export function tensionForSag(input: unknown, sagM: number, anchor: "a" | "b"): number {
  const rig = parseRigInput(input);
  const line = rigLine(rig);
  const mbs = rig.mainline.mbsN;
  const mid = line.span / 2;
  const sagOf = (length: number) => sagAt(line, solveLine(line, length, { force: 0, x: mid }, mbs).variables, mid);
  // Tightest: just below the MBS. Slackest: a line long enough to hang well past the measured sag.
  const tightest = lengthForPretension(line, 0.999 * mbs, anchor, mbs).variables.length;
  const tightestSag = sagOf(tightest);
  if (!(sagM > tightestSag)) {
    throw new RigInputError("sagM", sagM, `a sag above ${fixedDigits(tightestSag, 3, "up")} m: any less and the line would be tighter than its MBS`);
  }
  const chord = Math.hypot(line.span, line.rise);
  const slackest = chord + (8 * (2 * sagM) ** 2) / (3 * line.span);
  const length = bracketedRoot((l) => sagOf(l) - sagM, tightest, slackest, "unstretched length for the measured sag");
  const solution = solveLine(line, length, { force: 0, x: mid }, mbs);
  return anchor === "a" ? solution.tensionA : solution.tensionB;
}

/** Tension at `anchor` with a walker of `massKg` standing `positionM` from anchor A, on the line as pretensioned in the plan. */
export function tensionWithWalker(input: unknown, massKg: number, positionM: number, anchor: "a" | "b"): number {
  const rig = parseRigInput(input);
  const line = rigLine(rig);
  const mbs = rig.mainline.mbsN;
  const length = lengthForPretension(line, rig.pretension.forceN, rig.pretension.readAt, mbs).variables.length;
  const solution = solveLine(line, length, { force: massKg * STANDARD_GRAVITY, x: positionM }, mbs);
  return anchor === "a" ? solution.tensionA : solution.tensionB;
}
