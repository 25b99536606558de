import { segmentEnds, type Line, type LineVariables } from "./line-equations";
import { strainAt, type StretchCurve } from "./stretch-curve";

/** Strain energy per unstretched metre at tension T (J/m): ∫₀^ε T dε on the piecewise linear curve. */
export function strainEnergyDensity(curve: StretchCurve, tension: number): number {
  const { tensions, slopes } = curve;
  let e = 0;
  for (let k = 0; k < tensions.length; k++) {
    const end = k + 1 < tensions.length ? Math.min(tensions[k + 1], tension) : tension;
    if (end <= tensions[k]) break;
    e += (slopes[k] * (end - tensions[k]) * (end + tensions[k])) / 2;
  }
  return e;
}

/**
 * ∫₀^V e(T) dV and ∫₀^V Gy dV at horizontal tension H, where Gy(V) = ∫₀^V (V/T)(1 + ε) dV (w times the
 * rise, as in line-integrals.ts). On each piece of the curve e = C + b(T² − t²)/2 with T² = H² + V², and by
 * parts ∫₀^V Gy = V·Gy(V) − ∫₀^V (V²/T)(1 + ε) dV, whose integrand is a1·V²/T + b·V²: all elementary.
 */
function energyIntegrals(curve: StretchCurve, H: number, V: number): { E: number; K: number; Gy: number } {
  const v = Math.abs(V);
  const T = Math.hypot(H, v);
  const starts = curve.tensions;
  const n = starts.length;
  let E = 0;
  let Y = 0;
  let Gy = 0;
  let below = 0; // strain energy density at the start of piece k
  for (let k = 0; k < n; k++) {
    const tEnd = k + 1 < n ? starts[k + 1] : Infinity;
    const b = curve.slopes[k];
    const pieceEnergy = (b * (tEnd - starts[k]) * (tEnd + starts[k])) / 2;
    if (tEnd <= H) {
      below += pieceEnergy;
      continue;
    }
    if (starts[k] >= T) break;
    const tLo = Math.max(starts[k], H);
    const tHi = Math.min(tEnd, T);
    const vLo = tLo === H ? 0 : Math.sqrt((tLo - H) * (tLo + H));
    const vHi = tHi === T ? v : Math.sqrt((tHi - H) * (tHi + H));
    const a1 = 1 + curve.intercepts[k];
    const dv = vHi - vLo;
    const dv2 = (vHi - vLo) * (vHi + vLo);
    const dv3 = vHi ** 3 - vLo ** 3;
    E += (below + (b * (H - starts[k]) * (H + starts[k])) / 2) * dv + (b * dv3) / 6;
    // ∫ V²/T dV = (V·T − H²·asinh(V/H)) / 2
    Y += (a1 * (vHi * tHi - vLo * tLo - H * H * (Math.asinh(vHi / H) - Math.asinh(vLo / H)))) / 2 + (b * dv3) / 3;
    Gy += a1 * (dv2 / (tHi + tLo)) + (b * dv2) / 2;
    below += pieceEnergy;
  }
  const sign = V < 0 ? -1 : 1;
  return { E: sign * E, K: sign * (v * Gy - Y), Gy };
}

/** Energy of one equilibrium state, J: the line's strain energy and the potential of its own weight (y up from A). */
export function lineEnergy(line: Line, v: LineVariables): { strain: number; gravity: number } {
  const w = line.weight;
  const { Vm, Vp, Ve } = segmentEnds(line, v);
  const a = energyIntegrals(line.curve, v.H, v.VA);
  const m = energyIntegrals(line.curve, v.H, Vm);
  const p = energyIntegrals(line.curve, v.H, Vp);
  const e = energyIntegrals(line.curve, v.H, Ve);
  const loadY = (m.Gy - a.Gy) / w;
  const gravity = (m.K - a.K - a.Gy * (Vm - v.VA)) / w + loadY * (Ve - Vp) + (e.K - p.K - p.Gy * (Ve - Vp)) / w;
  return { strain: (m.E - a.E + e.E - p.E) / w, gravity };
}

/** e(T) − T(1 + ε(T)): its jump across the load point is the energy a unit of unstretched line releases passing under it. */
export function kinkPotential(curve: StretchCurve, tension: number): number {
  return strainEnergyDensity(curve, tension) - tension * (1 + strainAt(curve, tension));
}
