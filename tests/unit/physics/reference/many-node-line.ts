/**
 * An independent many-node model of a slackline, written for the tests: the line is cut into N
 * straight two-node cable elements of equal unstretched length, each element's weight lumped half at
 * each end node, the walker's load at one node; static equilibrium by full Newton–Raphson on the node
 * positions with the tangent stiffness of a cable element, K = k_axial·nnᵀ + (T/l)(I − nnᵀ)
 * (the standard nonlinear truss/cable element: e.g. Crisfield, "Non-linear Finite Element Analysis
 * of Solids and Structures", vol. 1, ch. 3; Irvine 1981, ch. 5).
 * It shares no code with the engine: its own stretch law, no closed forms, no catenary equations.
 */
export interface ManyNodeLine {
  span: number; // m, horizontal A→B
  rise: number; // m, B above A
  weight: number; // N per unstretched metre
  length: number; // unstretched, m
  /** Measured points (N, strain fraction), first at the origin. */
  tensions: number[];
  strains: number[];
  walkerForce: number; // N
  /** Unstretched arc from A to the walker as a fraction of the length (rounded to a node). */
  walkerArcFraction: number;
  elements: number;
}

/** The many-node description of a line given as span, rise, weight and measured points (kN, %). */
export function manyNodeLine(
  line: { span: number; rise: number; weight: number },
  length: number,
  points: { tensionKN: number; elongationPct: number }[],
  walkerForce: number,
  walkerArcFraction: number,
  elements: number,
): ManyNodeLine {
  return {
    span: line.span,
    rise: line.rise,
    weight: line.weight,
    length,
    tensions: points.map((p) => p.tensionKN * 1000),
    strains: points.map((p) => p.elongationPct / 100),
    walkerForce,
    walkerArcFraction,
    elements,
  };
}

export interface ManyNodeResult {
  tensionA: number;
  tensionB: number;
  walkerX: number;
  walkerY: number;
  iterations: number;
}

/** Tension from strain: linear between the points, the last slope beyond, none in compression. */
export function tensionOf(line: ManyNodeLine, strain: number): { tension: number; stiffness: number } {
  if (strain <= 0) return { tension: 0, stiffness: 0 };
  let k = 0;
  while (k < line.strains.length - 2 && strain > line.strains[k + 1]) k++;
  const stiffness = (line.tensions[k + 1] - line.tensions[k]) / (line.strains[k + 1] - line.strains[k]);
  return { tension: line.tensions[k] + stiffness * (strain - line.strains[k]), stiffness };
}

const BAND = 3; // unknowns (x1, y1, x2, y2, …): a node couples only to its neighbours

/** Cholesky factorisation and solve of a symmetric positive definite band matrix, in place. */
function solveBand(a: Float64Array[], b: Float64Array): void {
  const m = b.length;
  for (let j = 0; j < m; j++) {
    let d = a[j][0];
    for (let k = Math.max(0, j - BAND); k < j; k++) d -= a[k][j - k] ** 2;
    if (!(d > 0)) throw new Error("many-node stiffness not positive definite");
    const r = Math.sqrt(d);
    a[j][0] = r;
    for (let i = j + 1; i <= Math.min(m - 1, j + BAND); i++) {
      let s = a[j][i - j];
      for (let k = Math.max(0, i - BAND); k < j; k++) s -= a[k][j - k] * a[k][i - k];
      a[j][i - j] = s / r;
    }
  }
  for (let i = 0; i < m; i++) {
    let s = b[i];
    for (let k = Math.max(0, i - BAND); k < i; k++) s -= a[k][i - k] * b[k];
    b[i] = s / a[i][0];
  }
  for (let i = m - 1; i >= 0; i--) {
    let s = b[i];
    for (let k = i + 1; k <= Math.min(m - 1, i + BAND); k++) s -= a[i][k - i] * b[k];
    b[i] = s / a[i][0];
  }
}

/**
 * Node positions on a parabola stretched to the first measured point, so every element starts in
 * tension, and the nodal loads: half of each element's weight at each end, the walker at its node.
 */
export function startingShape(line: ManyNodeLine): { x: Float64Array; y: Float64Array; load: Float64Array } {
  const n = line.elements;
  const x = new Float64Array(n + 1);
  const y = new Float64Array(n + 1);
  const load = new Float64Array(n + 1).fill((line.weight * line.length) / n);
  load[walkerNodeOf(line)] += line.walkerForce;
  const chord = Math.hypot(line.span, line.rise);
  const sag = Math.sqrt(Math.max((3 * line.span * ((1 + line.strains[1]) * line.length - chord)) / 8, (0.001 * line.span) ** 2));
  for (let i = 0; i <= n; i++) {
    const t = i / n;
    x[i] = t * line.span;
    y[i] = t * line.rise - 4 * sag * t * (1 - t);
  }
  return { x, y, load };
}

/** Index of the node that carries the walker. */
export function walkerNodeOf(line: ManyNodeLine): number {
  return Math.round(line.walkerArcFraction * line.elements);
}

export function solveManyNodeLine(line: ManyNodeLine, tolerance = 1e-8, maxIterations = 200): ManyNodeResult {
  const n = line.elements;
  const l0 = line.length / n;
  const walkerNode = walkerNodeOf(line);
  const { x, y, load } = startingShape(line);
  const tension = new Float64Array(n);
  const m = 2 * (n - 1);
  const scale = Math.max(line.walkerForce, line.weight * line.length);
  for (let iteration = 1; iteration <= maxIterations; iteration++) {
    const K = Array.from({ length: m }, () => new Float64Array(BAND + 1));
    const r = new Float64Array(m);
    for (let i = 1; i < n; i++) r[2 * (i - 1) + 1] = -load[i];
    for (let e = 0; e < n; e++) {
      const dx = x[e + 1] - x[e];
      const dy = y[e + 1] - y[e];
      const l = Math.hypot(dx, dy);
      const { tension: T, stiffness } = tensionOf(line, l / l0 - 1);
      tension[e] = T;
      const c = dx / l;
      const s = dy / l;
      const ka = stiffness / l0;
      const kg = T / l;
      const kxx = ka * c * c + kg * (1 - c * c);
      const kyy = ka * s * s + kg * (1 - s * s);
      const kxy = (ka - kg) * c * s;
      const ends = [e - 1, e]; // unknown-node indices of the element's two nodes (−1 and n−1 are anchors)
      const sign = [-1, 1];
      for (let p = 0; p < 2; p++) {
        const a = ends[p];
        if (a < 0 || a >= n - 1) continue;
        r[2 * a] -= sign[p] * T * c;
        r[2 * a + 1] -= sign[p] * T * s;
        for (let q = 0; q < 2; q++) {
          const b = ends[q];
          if (b < a || b >= n - 1) continue;
          const f = p === q ? 1 : -1;
          const i0 = 2 * a;
          const j0 = 2 * b;
          K[i0][j0 - i0] += f * kxx;
          K[i0][j0 + 1 - i0] += f * kxy;
          if (j0 > i0) K[i0 + 1][j0 - i0 - 1] += f * kxy;
          K[i0 + 1][j0 + 1 - i0 - 1] += f * kyy;
        }
      }
    }
    let residual = 0;
    for (let i = 0; i < m; i++) residual = Math.max(residual, Math.abs(r[i]));
    if (residual < tolerance * scale) {
      return { tensionA: tension[0], tensionB: tension[n - 1], walkerX: x[walkerNode], walkerY: y[walkerNode], iterations: iteration };
    }
    solveBand(K, r);
    // Limit the step so an early iterate cannot fold the line over on itself.
    let largest = 0;
    for (let i = 0; i < m; i++) largest = Math.max(largest, Math.abs(r[i]));
    const damping = Math.min(1, (0.05 * line.span) / largest);
    for (let i = 1; i < n; i++) {
      x[i] += damping * r[2 * (i - 1)];
      y[i] += damping * r[2 * (i - 1) + 1];
    }
  }
  throw new Error("many-node model did not converge");
}
