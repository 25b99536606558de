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

/** Walker at `count` evenly spaced positions from anchor A to anchor B (each solve starts from its neighbour). */
export function sweepWalker(line: Line, length: number, force: number, breakingStrength: number, count = 101): Sweep {
  const points: SweepPoint[] = [];
  let start: LineVariables | undefined;
  for (let i = 0; i < count; i++) {
    const x = (line.span * i) / (count - 1);
    const s = solveLine(line, length, { force, x }, breakingStrength, start);
    start = s.variables;
    points.push({ x, tensionA: s.tensionA, tensionB: s.tensionB, sag: s.loadSag });
  }
  const worst = (key: "tensionA" | "tensionB" | "sag") => points.reduce((a, b) => (b[key] > a[key] ? b : a));
  return { points, worstTensionA: worst("tensionA"), worstTensionB: worst("tensionB"), deepestSag: worst("sag") };
}
