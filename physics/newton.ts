import { SolveError } from "./solve-error";

export interface NewtonSystem {
  /** Residuals (already scaled to order one) and their Jacobian, rows by residual. */
  evaluate(x: number[]): { residual: number[]; jacobian: number[][] };
  /** False for points outside the physical domain (e.g. a negative horizontal tension). */
  isValid(x: number[]): boolean;
}

export interface NewtonOptions {
  /** What is being solved, for the error message. */
  what: string;
  tolerance?: number;
  maxIterations?: number;
}

/** Damped Newton–Raphson for a small square system; halves the step until the residual falls. Also returns the Jacobian at the root. */
export function newtonSolve(system: NewtonSystem, start: number[], options: NewtonOptions): { x: number[]; iterations: number; jacobian: number[][] } {
  const tolerance = options.tolerance ?? 1e-11;
  const maxIterations = options.maxIterations ?? 60;
  let x = start.slice();
  let { residual, jacobian } = system.evaluate(x);
  let norm = maxAbs(residual);
  let why: string | undefined;
  let iteration = 0;
  for (; iteration <= maxIterations; iteration++) {
    if (norm < tolerance) return { x, iterations: iteration, jacobian };
    if (iteration === maxIterations) break;
    if (!Number.isFinite(norm)) {
      why = `reached a non-finite residual after ${iteration} iterations`;
      break;
    }
    const step = solveLinear(jacobian, residual);
    if (step === null) {
      why = `met a singular Jacobian after ${iteration} iterations`;
      break;
    }
    let scale = 1;
    let accepted = false;
    for (let halving = 0; halving < 40; halving++, scale /= 2) {
      const trial: number[] = [];
      for (let i = 0; i < x.length; i++) trial.push(x[i] - scale * step[i]);
      if (!system.isValid(trial)) continue;
      const next = system.evaluate(trial);
      const nextNorm = maxAbs(next.residual);
      if (nextNorm < norm) {
        x = trial;
        residual = next.residual;
        jacobian = next.jacobian;
        norm = nextNorm;
        accepted = true;
        break;
      }
    }
    if (!accepted) {
      why = `could not reduce the residual after ${iteration} iterations`;
      break;
    }
  }
  throw new SolveError(options.what, iteration, norm, why);
}

function maxAbs(values: number[]): number {
  let m = 0;
  for (const v of values) {
    const a = Math.abs(v);
    if (Number.isNaN(a)) return NaN;
    if (a > m) m = a;
  }
  return m;
}

/** Gaussian elimination with partial pivoting; null if the matrix is singular. */
export function solveLinear(matrix: number[][], rhs: number[]): number[] | null {
  const n = rhs.length;
  const a: number[][] = [];
  for (let i = 0; i < n; i++) a.push([...matrix[i], rhs[i]]);
  for (let col = 0; col < n; col++) {
    let pivot = col;
    for (let r = col + 1; r < n; r++) if (Math.abs(a[r][col]) > Math.abs(a[pivot][col])) pivot = r;
    if (!(Math.abs(a[pivot][col]) > 1e-300)) return null;
    [a[col], a[pivot]] = [a[pivot], a[col]];
    for (let r = col + 1; r < n; r++) {
      const f = a[r][col] / a[col][col];
      for (let c = col; c <= n; c++) a[r][c] -= f * a[col][c];
    }
  }
  const x = new Array<number>(n);
  for (let r = n - 1; r >= 0; r--) {
    let s = a[r][n];
    for (let c = r + 1; c < n; c++) s -= a[r][c] * x[c];
    x[r] = s / a[r][r];
  }
  return x;
}
