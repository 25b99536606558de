import type { Line, LineVariables } from "./line-equations";
import { solveLine } from "./solve-line";

export interface SweepPoint {
  /** Walker's horizontal distance from anchor A, m. */
  x: number;
  tensionA: number;
  tensionB: number;
  /** Drop of the walker below the chord, m. */
  sag: number;
}

export interface Sweep {
  points: SweepPoint[];
  /** The walker position that loads each anchor most, and the deepest sag. */
  worstTensionA: SweepPoint;
  worstTensionB: SweepPoint;
  deepestSag: SweepPoint;
}

/**
 * The next position's start: the last three solutions (newest first), evenly spaced, extrapolated by the quadratic
 * through them (3a − 3b + c), so Newton usually needs a single step; with fewer, the last one or the line through two.
 */
export function sweepStart(previous: readonly LineVariables[]): LineVariables | undefined {
  const [a, b, c] = previous;
  if (!a || !b) return a;
  const next = (key: "H" | "VA" | "loadArc") => (c ? 3 * a[key] - 3 * b[key] + c[key] : 2 * a[key] - b[key]);
  return { ...a, H: next("H"), VA: next("VA"), loadArc: next("loadArc") };
}

/** Walker at `count` evenly spaced positions from anchor A to anchor B (each solve starts from its neighbours). */
export function sweepWalker(line: Line, length: number, force: number, breakingStrength: number, count = 101): Sweep {
  const points: SweepPoint[] = [];
  const previous: LineVariables[] = [];
  for (let i = 0; i < count; i++) {
    const x = (line.span * i) / (count - 1);
    const s = solveLine(line, length, { force, x }, breakingStrength, sweepStart(previous));
    previous.unshift(s.variables);
    previous.length = Math.min(previous.length, 3);
    points.push({ x, tensionA: s.tensionA, tensionB: s.tensionB, sag: s.loadSag });
  }
  const worst = (key: "tensionA" | "tensionB" | "sag") => points.reduce((a, b) => (b[key] > a[key] ? b : a));
  return { points, worstTensionA: worst("tensionA"), worstTensionB: worst("tensionB"), deepestSag: worst("sag") };
}
