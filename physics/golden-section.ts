/** 1/φ, the share of the interval kept at each step of the golden-section search. */
const INVERSE_GOLDEN_RATIO = (Math.sqrt(5) - 1) / 2;

/**
 * A minimum of f on [lo, hi], to within `tolerance` of its position: golden-section search (Kiefer 1953;
 * Press et al., Numerical Recipes, 3rd ed., §10.2). One new evaluation a step, each shrinking the interval by
 * 1/φ; on a function with one minimum in [lo, hi] it closes in on that one, on any other on one of them.
 * Returns the position of the lowest value it evaluated.
 */
export function goldenSectionMinimum(f: (x: number) => number, lo: number, hi: number, tolerance: number): number {
  let a = lo;
  let b = hi;
  let c = b - INVERSE_GOLDEN_RATIO * (b - a);
  let d = a + INVERSE_GOLDEN_RATIO * (b - a);
  let fc = f(c);
  let fd = f(d);
  while (b - a > tolerance) {
    if (fc <= fd) {
      b = d;
      d = c;
      fd = fc;
      c = b - INVERSE_GOLDEN_RATIO * (b - a);
      fc = f(c);
    } else {
      a = c;
      c = d;
      fc = fd;
      d = a + INVERSE_GOLDEN_RATIO * (b - a);
      fd = f(d);
    }
  }
  return fc <= fd ? c : d;
}
