import { fromNewtons, type ForceUnit } from "@/physics";
import { forceDigits, formatForce } from "./force-format";
import { toShown, type UnitSystem } from "./rig-form/quantities";

// How the Kit's and the Slip bench's figures read in the crew's units: one helper per kind of figure, so
// that every page, table, chart, CSV and message shows a figure the same way (and one place changes them all).

/** The force unit a crew reads: kN in SI, lbf in US units. */
export const forceUnitOf = (units: UnitSystem): ForceUnit => (units === "us" ? "lbf" : "kN");

/** A capacity (an MBS, a slip load, a held-to bound, a spread of slips), cut down at the shown precision: "4.30 kN", "966 lbf". */
export const capacityText = (newtons: number, units: UnitSystem) => capacityInUnit(newtons, forceUnitOf(units));

/** The same in a unit of its own: a force as the tester recorded it, in N, kN, lbf or kgf. */
export const capacityInUnit = (newtons: number, unit: ForceUnit) => formatForce(newtons, unit);

/** The digits of `capacityText`, without the unit: for a CSV column or an input box. */
export const capacityDigits = (newtons: number, units: UnitSystem) => forceDigits(newtons, forceUnitOf(units));

/** A setting given as a force (the fall that counts as a slip), to the nearest shown step: it is neither a load nor a capacity. */
export const thresholdText = (newtons: number, units: UnitSystem) => {
  const unit = forceUnitOf(units);
  return `${fromNewtons(newtons, unit).toFixed(unit === "kN" ? 2 : 0)} ${unit}`;
};

/** A number as it was given, without binary-fraction noise: 0.1 + 0.2 reads 0.3. */
export const asGiven = (value: number) => String(Number(value.toPrecision(6)));

/** A stretch point's tension (kept in kN, as measured): kN as given, or whole lbf. */
export const stretchTensionDigits = (kN: number, units: UnitSystem) =>
  units === "us" ? String(Math.round(toShown(kN, "stretchTension", units))) : asGiven(kN);
export const stretchTensionText = (kN: number, units: UnitSystem) => `${stretchTensionDigits(kN, units)} ${units === "us" ? "lbf" : "kN"}`;

/** Webbing or rope mass per length (kept in g/m): g/m as given, or oz/ft to a hundredth. */
export const massPerLengthDigits = (gramsPerMetre: number, units: UnitSystem) =>
  units === "us" ? toShown(gramsPerMetre / 1000, "massPerLength", units).toFixed(2) : asGiven(gramsPerMetre);
export const massPerLengthText = (gramsPerMetre: number, units: UnitSystem) =>
  `${massPerLengthDigits(gramsPerMetre, units)} ${units === "us" ? "oz/ft" : "g/m"}`;

/** A pulley's efficiency (kept as a fraction of 1) in per cent: "93 %". */
export const efficiencyDigits = (fraction: number) => asGiven(fraction * 100);
export const efficiencyText = (fraction: number) => `${efficiencyDigits(fraction)} %`;

/** A rope diameter, webbing width or sheave size, in millimetres as the trade gives them everywhere. */
export const millimetresText = (mm: number) => `${asGiven(mm)} mm`;

/** A rope diameter as the slip bench gives it: to a tenth of a millimetre. */
export const ropeDiameterDigits = (mm: number) => mm.toFixed(1);
export const ropeDiameterText = (mm: number) => `${ropeDiameterDigits(mm)} mm`;
