import { toShown, unitLabel, type QuantityKind, type UnitSystem } from "./quantities";

/**
 * Which way a figure may be rounded for display without flattering the rig: loads and sags are
 * rounded up (never shown lighter or shallower than computed), capacities and ratios down (a
 * failing safety factor or a thin margin is never rounded up into a passing one).
 */
export type Rounding = "up" | "down";

// Float noise (4.39 stored as 4.3900000000000006) must not push a figure up a whole step.
const NOISE = 1e-9;

/** `value` rounded to `decimals` in the given direction. */
export function roundTowards(value: number, decimals: number, direction: Rounding): number {
  const scale = 10 ** decimals;
  const scaled = value * scale;
  const rounded = direction === "up" ? Math.ceil(scaled - NOISE) : Math.floor(scaled + NOISE);
  return rounded / scale;
}

/** A ratio (safety factor, margin, advantage) cut down to `decimals`, never rounded up. */
export function truncateRatio(value: number, decimals = 2): string {
  return roundTowards(value, decimals, "down").toFixed(decimals);
}

// Decimals worth reading in each unit: a hundredth of a kN or metre, a pound-force or a tenth of a foot.
const DECIMALS: Record<string, number> = { kN: 2, lbf: 0, m: 2, ft: 1, kg: 1, lb: 0, "%": 0 };

/** An SI figure in the crew's units with its unit, e.g. "4.39 kN" or "988 lbf". */
export function formatQuantity(si: number, kind: QuantityKind, units: UnitSystem, direction: Rounding): string {
  const unit = unitLabel(kind, units);
  const decimals = DECIMALS[unit] ?? 2;
  return `${roundTowards(toShown(si, kind, units), decimals, direction).toFixed(decimals)} ${unit}`.trim();
}

/** A load (force in N) for display, rounded up. */
export const formatLoad = (newtons: number, units: UnitSystem) => formatQuantity(newtons, "force", units, "up");

/** A capacity (force in N the gear is good for) for display, rounded down. */
export const formatCapacity = (newtons: number, units: UnitSystem) => formatQuantity(newtons, "force", units, "down");

/** A sag or deflection (m) for display, rounded up. */
export const formatDepth = (metres: number, units: UnitSystem) => formatQuantity(metres, "length", units, "up");

/** A position or distance (m) for display, to the nearest shown step. */
export function formatDistance(metres: number, units: UnitSystem): string {
  const unit = unitLabel("length", units);
  return `${toShown(metres, "length", units).toFixed(DECIMALS[unit])} ${unit}`;
}

/** A clearance above the ground (m) for display, rounded down: never shown roomier than computed. */
export const formatClearance = (metres: number, units: UnitSystem) => formatQuantity(metres, "length", units, "down");
