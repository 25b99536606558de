/**
 * An independent model of the line's shape and stretched length, written for the tests: the elastic cable's own
 * equations in the unstretched arc s (Irvine, Cable Structures, 1981, ch. 2), integrated numerically by composite
 * Simpson's rule instead of in closed form. With V(s) = VA + w·s (plus the point load P past the load's arc) and
 * T = √(H² + V²):  dx/ds = (H/T)(1 + ε(T)),  dy/ds = (V/T)(1 + ε(T)),  d(stretched length)/ds = 1 + ε(T).
 * The strain ε(T) is the engine's strainAt, checked against the measured points on its own in stretch-curve.test.ts
 * and stretch-curve-boundaries.test.ts; nothing else of the engine is used.
 */
import { strainAt, type Line, type LineVariables } from "../../../../physics";

export interface ArcPoint {
  x: number;
  y: number;
  /** Stretched length from A to this point, m. */
  stretched: number;
}

/** Simpson's steps on each side of the load point: enough for 1e-10 of the span on these smooth integrands. */
const STEPS = 2000;

/** Position and stretched length of the point at unstretched arc s from A, for the line's state v. */
export function arcPointBySimpson(line: Line, v: LineVariables, s: number, steps = STEPS): ArcPoint {
  const w = line.weight;
  // The vertical component jumps by P at the load, so each side is integrated on its own.
  const before = simpson(line, v.H, (arc) => v.VA + w * arc, 0, Math.min(s, v.loadArc), steps);
  if (s <= v.loadArc) return before;
  const after = simpson(line, v.H, (arc) => v.VA + w * arc + v.load, v.loadArc, s, steps);
  return { x: before.x + after.x, y: before.y + after.y, stretched: before.stretched + after.stretched };
}

function simpson(line: Line, H: number, verticalAt: (arc: number) => number, from: number, to: number, steps: number): ArcPoint {
  const h = (to - from) / steps;
  const sum = { x: 0, y: 0, stretched: 0 };
  for (let i = 0; i <= steps; i++) {
    const weight = i === 0 || i === steps ? 1 : i % 2 === 1 ? 4 : 2;
    const V = verticalAt(from + i * h);
    const T = Math.hypot(H, V);
    const stretch = 1 + strainAt(line.curve, T);
    sum.x += (weight * H * stretch) / T;
    sum.y += (weight * V * stretch) / T;
    sum.stretched += weight * stretch;
  }
  return { x: (sum.x * h) / 3, y: (sum.y * h) / 3, stretched: (sum.stretched * h) / 3 };
}
