import { capacityDigits, figureDigits, fixedDigits, forceText, forceUnitOf, type ForceUnit } from "@/physics";
import { inputText, toShown, type QuantityKind, type UnitSystem } from "./rig-form/quantities";

// How the Kit's and the Slip bench's own figures read in the crew's units. The rounding and the decimals are the
// engine's display module's (physics/display.ts), as for every figure of the product; a load or a capacity in the
// crew's unit is `loadText` or `capacityText` from there. These helpers only add the Kit's kinds and units.

/** A force as the tester recorded it, in N, kN, lbf or kgf, cut down at the shown precision (a slip load is a capacity). */
export const capacityInUnit = (newtons: number, unit: ForceUnit) => forceText(newtons, unit, "down");

/** A setting given as a force (the fall that counts as a slip), to the nearest shown step: it is neither a load nor a capacity. */
export const thresholdText = (newtons: number, units: UnitSystem) => forceText(newtons, forceUnitOf(units), "nearest");

/** A number as it was given, without binary-fraction noise: 0.1 + 0.2 reads 0.3. */
export const asGiven = (value: number) => String(Number(value.toPrecision(6)));

/** A stretch point's tension (kept in kN, as measured): kN as given, or lbf to the nearest shown step. */
export const stretchTensionDigits = (kN: number, units: UnitSystem) =>
  units === "us" ? figureDigits(toShown(kN, "stretchTension", units), "lbf", "nearest") : asGiven(kN);
export const stretchTensionText = (kN: number, units: UnitSystem) => `${stretchTensionDigits(kN, units)} ${units === "us" ? "lbf" : "kN"}`;

/** Webbing or rope mass per length (kept in g/m): g/m as given, or oz/ft to a hundredth. */
export const massPerLengthDigits = (gramsPerMetre: number, units: UnitSystem) =>
  units === "us" ? figureDigits(toShown(gramsPerMetre / 1000, "massPerLength", units), "oz/ft", "nearest") : asGiven(gramsPerMetre);
export const massPerLengthText = (gramsPerMetre: number, units: UnitSystem) =>
  `${massPerLengthDigits(gramsPerMetre, units)} ${units === "us" ? "oz/ft" : "g/m"}`;

/** A pulley's efficiency (kept as a fraction of 1) in per cent: "93 %". */
export const efficiencyDigits = (fraction: number) => asGiven(fraction * 100);
export const efficiencyText = (fraction: number) => `${efficiencyDigits(fraction)} %`;

/** A rope diameter, webbing width or sheave size, in millimetres as the trade gives them everywhere. */
export const millimetresText = (mm: number) => `${asGiven(mm)} mm`;

/** A rope diameter as the slip bench gives it: to a tenth of a millimetre. */
export const ropeDiameterDigits = (mm: number) => fixedDigits(mm, 1, "nearest");
export const ropeDiameterText = (mm: number) => `${ropeDiameterDigits(mm)} mm`;

/**
 * A value of the rig's input where nobody types it (a box filled from the Kit, a difference between revisions): the
 * Kit's own figures as the Kit's boxes show them (an MBS in lbf cut down, a stretch point in whole lbf, not "449.618";
 * SI values as given), any other value as a person would type it.
 */
export function inputFigureDigits(si: number, kind: QuantityKind, units: UnitSystem): string {
  if (kind === "force" && units === "us") return capacityDigits(si, units);
  if (kind === "stretchTension") return stretchTensionDigits(si, units);
  if (kind === "massPerLength") return massPerLengthDigits(si * 1000, units);
  return inputText(si, kind, units);
}
