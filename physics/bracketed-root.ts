import { SolveError } from "./solve-error";

/**
 * Root of a continuous f on [lo, hi] where f(lo) and f(hi) differ in sign: regula falsi with the
 * Illinois correction (Dowell & Jarratt 1971), which keeps the bracket and converges superlinearly.
 */
export function bracketedRoot(f: (x: number) => number, lo: number, hi: number, what: string, tolerance = 1e-12): number {
  let a = lo;
  let b = hi;
  let fa = f(a);
  let fb = f(b);
  if (fa === 0) return a;
  if (fb === 0) return b;
  // Signs are compared, not the product's: the product of two values below about 1e-154 underflows to zero.
  if (!(Math.sign(fa) === -Math.sign(fb))) throw new SolveError(what, 0, Math.min(Math.abs(fa), Math.abs(fb)), `found no sign change on [${lo}, ${hi}]`);
  for (let i = 0; i < 200; i++) {
    const c = b - (fb * (b - a)) / (fb - fa);
    const fc = f(c);
    if (fc === 0) return c;
    if (Math.sign(fc) !== Math.sign(fb)) {
      a = b;
      fa = fb;
    } else {
      fa /= 2;
    }
    b = c;
    fb = fc;
    if (Math.abs(b - a) <= tolerance * Math.max(Math.abs(a), Math.abs(b), 1e-300)) return b;
  }
  throw new SolveError(what, 200, Math.abs(fb));
}
