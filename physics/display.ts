import { fromMetres, fromNewtons, type ForceUnit } from "./units";

// How every figure reads, decided once: the engine's sentences, and the app's pages, tables, chart axes, CSV
// and rig card, all come through here (the app only adds its own kinds of quantity and units on top). A load or a
// sag is rounded up and a capacity, clearance, margin or safety factor cut down, so no text shows more reserve
// than there is; a position or a setting goes to the nearest step.

/** Which way a figure may be rounded: up for loads and sags, down for capacities, clearances and ratios. */
export type Rounding = "up" | "down" | "nearest";

/** The crew's choice of units for what people read; the engine always works in SI. */
export type DisplayUnits = "si" | "us";

// Decimals worth reading in each unit (common practice, no source): a hundredth of a kN or a metre, whole N,
// lbf and kgf, a tenth of a foot or a kilogram, whole pounds and per cent.
const DECIMALS: Record<string, number> = { N: 0, kN: 2, lbf: 0, kgf: 0, m: 2, ft: 1, kg: 1, lb: 0, "oz/ft": 2, "%": 0 };

/** The decimals a figure in `unit` is shown to (two for a unit without its own, and for plain numbers). */
export const decimalsOf = (unit: string) => DECIMALS[unit] ?? 2;

/**
 * A value read to 12 significant digits: what a division or a unit conversion left one binary step off a decimal
 * (1150 N / 1000 × 100 = 114.99999999999999; 2000 lbf stored in newtons and read back as 1999.9999999999998)
 * is that decimal, and so is not pushed a whole shown step by float noise. Real inputs carry far fewer digits.
 */
export const atTwelveDigits = (value: number) => Number(value.toPrecision(12));

/** `value` rounded to `decimals` places in the given direction. */
export function roundTowards(value: number, decimals: number, rounding: Rounding): number {
  const scale = 10 ** decimals;
  const scaled = atTwelveDigits(value * scale);
  const whole = rounding === "up" ? Math.ceil(scaled) : rounding === "down" ? Math.floor(scaled) : Math.round(scaled);
  return whole / scale;
}

/** `value` rounded to `decimals` places in the given direction, as digits; never "-0.00" (toFixed writes a minus only
 * for a value below 0, and −0 is not: ECMA-262, Number.prototype.toFixed). */
export function fixedDigits(value: number, decimals: number, rounding: Rounding): string {
  return roundTowards(value, decimals, rounding).toFixed(decimals);
}

/** The digits of a figure in its unit, without the unit. */
export const figureDigits = (value: number, unit: string, rounding: Rounding) => fixedDigits(value, decimalsOf(unit), rounding);

/** A figure already in `unit`, with its unit: "4.39 kN", "988 lbf"; a plain number has no unit. */
export const figureText = (value: number, unit: string, rounding: Rounding) => `${figureDigits(value, unit, rounding)} ${unit}`.trim();

/** The force unit a crew reads: kN in SI, lbf in US units. */
export const forceUnitOf = (units: DisplayUnits): ForceUnit => (units === "us" ? "lbf" : "kN");

/** The length unit a crew reads: m in SI, ft in US units. */
export const lengthUnitOf = (units: DisplayUnits) => (units === "us" ? "ft" : "m");

/** A force (N) as a number in `unit` at its shown precision: what an input box is filled with. */
export const forceIn = (newtons: number, unit: ForceUnit, rounding: Rounding) => roundTowards(fromNewtons(newtons, unit), decimalsOf(unit), rounding);

/** A force (N) in a unit of its own, e.g. as a tester recorded it in N, kN, lbf or kgf. */
export const forceText = (newtons: number, unit: ForceUnit, rounding: Rounding) => figureText(fromNewtons(newtons, unit), unit, rounding);

/** A load (N) in the crew's units, rounded up: "1.15 kN", "259 lbf". */
export const loadText = (newtons: number, units: DisplayUnits) => forceText(newtons, forceUnitOf(units), "up");

/** A capacity (N: an MBS, a slip load, a held-to bound) in the crew's units, cut down: "1.15 kN", "258 lbf". */
export const capacityText = (newtons: number, units: DisplayUnits) => forceText(newtons, forceUnitOf(units), "down");

/** The digits of `capacityText`, without the unit: for a CSV column or an input box. */
export const capacityDigits = (newtons: number, units: DisplayUnits) => figureDigits(fromNewtons(newtons, forceUnitOf(units)), forceUnitOf(units), "down");

/** A length (m) in the crew's units: a sag rounded up, a clearance cut down, a position to the nearest step. */
export const lengthText = (metres: number, units: DisplayUnits, rounding: Rounding) =>
  figureText(fromMetres(metres, lengthUnitOf(units)), lengthUnitOf(units), rounding);

/** A change or a difference in per cent, signed and to the nearest step: "+1.2 %", "-0.4 %". */
export function changeText(percent: number, decimals = 1): string {
  const digits = fixedDigits(percent, decimals, "nearest");
  return `${Number(digits) > 0 ? "+" : ""}${digits} %`;
}

/** A safety factor, margin or advantage, cut down to `decimals` (never rounded up): "2.99". */
export const factorText = (factor: number, decimals = 2) => fixedDigits(factor, decimals, "down");
