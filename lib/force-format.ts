import { fromNewtons, type ForceUnit } from "@/physics";

/** Decimals a force is shown to in each unit: 0.01 kN, and whole N, lbf and kgf (common practice, no source). */
const DECIMALS: Record<ForceUnit, number> = { N: 0, kN: 2, lbf: 0, kgf: 0 };

/**
 * A force in newtons as a number in the given unit at its shown precision, cut down and never rounded up:
 * a slip load is a capacity, and a shown capacity must not be more than was measured.
 */
export function forceIn(newtons: number, unit: ForceUnit): number {
  const scale = 10 ** DECIMALS[unit];
  // Rounded to 12 digits first so that 1150 N is 1.15 kN, not 1.14 through the binary fraction 114.999….
  return Math.floor(Number((fromNewtons(newtons, unit) * scale).toPrecision(12))) / scale;
}

/** The digits of `forceIn`, without the unit: "4.30" for 4300 N in kN. */
export const forceDigits = (newtons: number, unit: ForceUnit) => forceIn(newtons, unit).toFixed(DECIMALS[unit]);

/** A force shown in a unit, cut down at the shown precision: "5000 N", "4.30 kN". */
export const formatForce = (newtons: number, unit: ForceUnit) => `${forceDigits(newtons, unit)} ${unit}`;
