import { checkNumber } from "./check-number";

/** How an anchor takes the line: straight onto one point, or through a two-leg bridle to a master point. */
export type AnchorLayout = { kind: "single" } | { kind: "bridle"; includedAngleDeg: number };

export interface AnchorLoads {
  /** Load at the master point (or the single anchor point), N: the line tension. */
  masterPoint: number;
  /** Load in each leg, N (the line tension itself for a single point). */
  leg: number;
  legs: 1 | 2;
}

/** Leg and master-point loads for a line tension T. */
export function anchorLoads(layout: AnchorLayout, tension: number, field = "anchor"): AnchorLoads {
  if (layout.kind === "single") return { masterPoint: tension, leg: tension, legs: 1 };
  const angle = checkNumber(`${field}.includedAngleDeg`, layout.includedAngleDeg, (v) => v >= 0 && v < 180, "an included angle ≥ 0° and < 180°");
  // Two symmetric legs at an included angle α: leg = T / (2 cos(α/2)) (statics; the sling-angle tables of rigging practice)
  return { masterPoint: tension, leg: tension / (2 * Math.cos(((angle / 2) * Math.PI) / 180)), legs: 2 };
}
