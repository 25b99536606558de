import { lineIntegrals } from "./line-integrals";
import type { StretchCurve } from "./stretch-curve";

/** A line between anchor A (at the origin) and anchor B, x horizontal towards B, y up. SI units. */
export interface Line {
  /** Horizontal distance A→B, m. */
  span: number;
  /** Height of B above A, m (negative if B is lower). */
  rise: number;
  /** Weight per unstretched metre of everything the line carries along, N/m. */
  weight: number;
  /** Strain against tension of the load-bearing webbing. */
  curve: StretchCurve;
}

/**
 * The unknowns of an elastic cable with one point load. The line's pull at A points along (H, VA);
 * along the unstretched arc s the vertical component is V(s) = VA + w·s (+ P past the load).
 */
export interface LineVariables {
  /** Horizontal tension, N (the same all along the line). */
  H: number;
  /** Vertical component of the tension at A, N (negative when the line leaves A downwards). */
  VA: number;
  /** Unstretched arc from A to the point load, m. */
  loadArc: number;
  /** Point load, N. */
  load: number;
  /** Unstretched length A→B, m. */
  length: number;
}

/**
 * Vertical tension component just before the load (Vm), just after it (Vp) and at B (Ve), N, and the
 * line integrals at A (i0) and at each of those.
 */
export function segmentEnds(line: Line, v: LineVariables) {
  const Vm = v.VA + line.weight * v.loadArc;
  const Vp = Vm + v.load;
  const Ve = v.VA + line.weight * v.length + v.load;
  const { curve } = line;
  return {
    Vm,
    Vp,
    Ve,
    i0: lineIntegrals(curve, v.H, v.VA),
    im: lineIntegrals(curve, v.H, Vm),
    ip: lineIntegrals(curve, v.H, Vp),
    ie: lineIntegrals(curve, v.H, Ve),
  };
}

export const VARIABLE_NAMES = ["H", "VA", "loadArc", "load", "length"] as const;
export type VariableName = (typeof VARIABLE_NAMES)[number];

/** One condition the equilibrium must meet. */
export type LineEquation =
  { kind: "span" } | { kind: "rise" } | { kind: "loadX"; x: number } | { kind: "loadY"; y: number } | { kind: "tension"; anchor: "a" | "b"; tension: number };

/**
 * Residuals of the chosen conditions and their exact Jacobian (columns in VARIABLE_NAMES order).
 * Segment A→load spans V from VA to Vm = VA + w·loadArc; segment load→B from Vp = Vm + P to
 * Ve = VA + w·L + P; x = ΔGx/w and y = ΔGy/w on each (Irvine & Sinclair 1976, Lagrangian form).
 */
export function lineEquations(line: Line, v: LineVariables, equations: readonly LineEquation[]) {
  const w = line.weight;
  const { Ve, i0, im, ip, ie } = segmentEnds(line, v);
  const residual: number[] = [];
  const jacobian: number[][] = [];
  for (const eq of equations) {
    switch (eq.kind) {
      case "span":
        residual.push((im.Gx - i0.Gx + ie.Gx - ip.Gx) / w - line.span);
        jacobian.push([(im.Hx - i0.Hx + ie.Hx - ip.Hx) / w, (im.gx - i0.gx + ie.gx - ip.gx) / w, im.gx - ip.gx, (ie.gx - ip.gx) / w, ie.gx]);
        break;
      case "rise":
        residual.push((im.Gy - i0.Gy + ie.Gy - ip.Gy) / w - line.rise);
        jacobian.push([(im.Hy - i0.Hy + ie.Hy - ip.Hy) / w, (im.gy - i0.gy + ie.gy - ip.gy) / w, im.gy - ip.gy, (ie.gy - ip.gy) / w, ie.gy]);
        break;
      case "loadX":
        residual.push((im.Gx - i0.Gx) / w - eq.x);
        jacobian.push([(im.Hx - i0.Hx) / w, (im.gx - i0.gx) / w, im.gx, 0, 0]);
        break;
      case "loadY":
        residual.push((im.Gy - i0.Gy) / w - eq.y);
        jacobian.push([(im.Hy - i0.Hy) / w, (im.gy - i0.gy) / w, im.gy, 0, 0]);
        break;
      case "tension": {
        if (eq.anchor === "a") {
          const T = Math.hypot(v.H, v.VA);
          residual.push(T - eq.tension);
          jacobian.push([v.H / T, v.VA / T, 0, 0, 0]);
        } else {
          const T = Math.hypot(v.H, Ve);
          residual.push(T - eq.tension);
          jacobian.push([v.H / T, Ve / T, 0, Ve / T, (w * Ve) / T]);
        }
        break;
      }
    }
  }
  return { residual, jacobian };
}
