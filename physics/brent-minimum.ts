/** The share of the larger part of an interval taken by a golden-section step, (3 − √5)/2. */
const GOLDEN_STEP = (3 - Math.sqrt(5)) / 2;
/** Positions closer than this share of their size are not told apart (Brent: the square root of the machine epsilon). */
const RELATIVE_RESOLUTION = Math.sqrt(Number.EPSILON);

/**
 * A minimum of f on [lo, hi], to within `tolerance` of its position (and √ε·|x|, the floating resolution):
 * Brent's method (R. P. Brent, "Algorithms for Minimization without Derivatives", 1973, ch. 5, procedure
 * localmin). A parabola through the three best points so far gives the next one where it falls well inside the
 * interval and the step shrinks fast enough; else a golden-section step, so it closes in on any minimum that
 * golden-section search would, and on a smooth one in far fewer evaluations (each catch the clearance search
 * evaluates is a whole solve). It starts at `start` (a point inside the interval whose value is known to be low)
 * or at the first golden section. Returns the position of the lowest value it evaluated.
 */
export function brentMinimum(f: (x: number) => number, lo: number, hi: number, tolerance: number, start = lo + GOLDEN_STEP * (hi - lo)): number {
  let a = lo;
  let b = hi;
  // x: the lowest value so far; w: the second lowest; v: the one before w.
  let x = start;
  let fx = f(x);
  let [w, fw, v, fv] = [x, fx, x, fx];
  // d: the step just taken; e: the one before it (a parabola must shrink the step before last by half).
  let d = 0;
  let e = 0;
  for (;;) {
    const middle = (a + b) / 2;
    const tol = RELATIVE_RESOLUTION * Math.abs(x) + tolerance / 2;
    if (Math.abs(x - middle) <= 2 * tol - (b - a) / 2) return x;
    let parabolic = false;
    if (Math.abs(e) > tol) {
      const r = (x - w) * (fx - fv);
      let q = (x - v) * (fx - fw);
      let p = (x - v) * q - (x - w) * r;
      q = 2 * (q - r);
      if (q > 0) p = -p;
      else q = -q;
      if (Math.abs(p) < Math.abs(q * e) / 2 && p > q * (a - x) && p < q * (b - x)) {
        e = d;
        d = p / q;
        // Not closer than the tolerance to an end of the interval.
        if (x + d - a < 2 * tol || b - (x + d) < 2 * tol) d = x < middle ? tol : -tol;
        parabolic = true;
      }
    }
    if (!parabolic) {
      e = (x < middle ? b : a) - x;
      d = GOLDEN_STEP * e;
    }
    // Never a step smaller than the tolerance: two evaluations closer than that tell nothing apart.
    const u = Math.abs(d) >= tol ? x + d : x + (d > 0 ? tol : -tol);
    const fu = f(u);
    if (fu <= fx) {
      if (u < x) b = x;
      else a = x;
      [v, fv, w, fw, x, fx] = [w, fw, x, fx, u, fu];
    } else {
      if (u < x) a = u;
      else b = u;
      if (fu <= fw || w === x) [v, fv, w, fw] = [w, fw, u, fu];
      else if (fu <= fv || v === x || v === w) [v, fv] = [u, fu];
    }
  }
}
