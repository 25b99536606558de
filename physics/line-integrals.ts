import { strainAt, type StretchCurve } from "./stretch-curve";

/**
 * Closed-form integrals along an elastic cable piece, taken over the vertical tension component V.
 * Along a piece without point loads dV = w·ds (w: weight per unstretched metre), so every quantity
 * below is w times its integral over the unstretched arc s. T = sqrt(H² + V²) and, on each piece of the
 * stretch curve, ε(T) = a + b·T, which makes every integral elementary (asinh and square roots).
 */
export interface LineIntegrals {
  /** dx/ds = (H/T)(1 + ε) at V. */
  gx: number;
  /** dy/ds = (V/T)(1 + ε) at V. */
  gy: number;
  /** ∫₀^V (H/T)(1 + ε) dV: w times the horizontal run. */
  Gx: number;
  /** ∫₀^V (V/T)(1 + ε) dV: w times the rise. */
  Gy: number;
  /** ∂Gx/∂H. */
  Hx: number;
  /** ∂Gy/∂H. */
  Hy: number;
  /** ∫₀^V (1 + ε) dV: w times the stretched length. */
  S: number;
}

/** The integrals from V = 0 to V at horizontal tension H (N). Gx, Hx and S are odd in V; Gy and Hy even. */
export function lineIntegrals(curve: StretchCurve, H: number, V: number): LineIntegrals {
  const v = Math.abs(V);
  const T = Math.hypot(H, v);
  let Gx = 0;
  let Gy = 0;
  let Hx = 0;
  let Hy = 0;
  let S = 0;
  const starts = curve.tensions;
  const n = starts.length;
  for (let k = 0; k < n; k++) {
    const tEnd = k + 1 < n ? starts[k + 1] : Infinity;
    if (tEnd <= H) continue;
    if (starts[k] >= T) break;
    const tLo = Math.max(starts[k], H);
    const tHi = Math.min(tEnd, T);
    // Written as sqrt((t−H)(t+H)) so small V keeps its digits when T is close to H.
    const vLo = tLo === H ? 0 : Math.sqrt((tLo - H) * (tLo + H));
    const vHi = tHi === T ? v : Math.sqrt((tHi - H) * (tHi + H));
    const a1 = 1 + curve.intercepts[k];
    const b = curve.slopes[k];
    const asLo = Math.asinh(vLo / H);
    const asHi = Math.asinh(vHi / H);
    const dv2 = (vHi - vLo) * (vHi + vLo);
    // ∫(H/T)(a1 + bT) dV = H·(a1·asinh(V/H) + b·V)  (Irvine 1981, ch. 2, extended piecewise)
    Gx += H * (a1 * (asHi - asLo) + b * (vHi - vLo));
    // ∫(V/T)(a1 + bT) dV = a1·T + b·V²/2, with T_hi − T_lo = (V_hi² − V_lo²)/(T_hi + T_lo)
    Gy += a1 * (dv2 / (tHi + tLo)) + (b * dv2) / 2;
    // ∂/∂H of the Gx integrand is a1·V²/T³ + b, whose integral is a1·(asinh(V/H) − V/T) + b·V
    Hx += a1 * (asHi - vHi / tHi - (asLo - vLo / tLo)) + b * (vHi - vLo);
    // ∂/∂H of the Gy integrand is −a1·V·H/T³, whose integral is a1·H/T
    Hy += (a1 * H * -(dv2 / (tHi + tLo))) / (tHi * tLo);
    // ∫(a1 + bT) dV, with ∫ sqrt(H² + V²) dV = (V·T + H²·asinh(V/H)) / 2
    S += a1 * (vHi - vLo) + (b * (vHi * tHi - vLo * tLo + H * H * (asHi - asLo))) / 2;
  }
  const sign = V < 0 ? -1 : 1;
  const stretch = 1 + strainAt(curve, T);
  return { gx: (H / T) * stretch, gy: (V / T) * stretch, Gx: sign * Gx, Gy, Hx: sign * Hx, Hy, S: sign * S };
}
