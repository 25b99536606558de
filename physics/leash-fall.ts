import { checkNumber } from "./check-number";
import { gaussLegendre } from "./gauss-legendre";
import { SolveError } from "./solve-error";
import { STANDARD_GRAVITY } from "./units";

export interface LeashFallPeak {
  /** Peak force between walker and line, N. */
  peakLoad: number;
  /** How far the line deflects below its unloaded shape at the peak, m. */
  deflection: number;
  /** Energy the walker brings (m·g·(h_f + δ)) and the energy the line stores (∫P du), J. */
  energyIn: number;
  energyStored: number;
}

const QUADRATURE = gaussLegendre(16);

/** ∫₀^δ P(u) du by 16-point Gauss–Legendre on u = δ·t. */
function storedEnergy(loadAtDeflection: (u: number) => number, deflection: number): number {
  let sum = 0;
  for (let i = 0; i < QUADRATURE.nodes.length; i++) sum += QUADRATURE.weights[i] * loadAtDeflection(deflection * QUADRATURE.nodes[i]);
  return sum * deflection;
}

/**
 * Peak of a leash fall with no damping (an upper bound): the walker falls freely through h_f, then the
 * line deflects until all the energy is stored, m·g·(h_f + δ) = ∫₀^δ P(u) du, P(u) being the static
 * load that holds the line u below its unloaded shape at the fall position (energy balance, e.g.
 * Meriam & Kraige, Engineering Mechanics: Dynamics, work–energy for a mass dropped on a spring).
 */
export function leashFallPeak(mass: number, fallHeight: number, loadAtDeflection: (u: number) => number): LeashFallPeak {
  checkNumber("leashFall.mass", mass, (v) => v > 0, "a mass > 0 kg");
  checkNumber("leashFall.fallHeight", fallHeight, (v) => v >= 0 && v <= 100, "a free-fall height from 0 m to 100 m");
  const weight = mass * STANDARD_GRAVITY;
  const imbalance = (d: number) => storedEnergy(loadAtDeflection, d) - weight * (fallHeight + d);
  // Bracket the deflection, then safeguarded Newton: d(imbalance)/dδ = P(δ) − m·g.
  let lo = 0;
  let hi = Math.max(fallHeight, 0.05);
  let rHi = imbalance(hi);
  for (let i = 0; rHi <= 0; i++) {
    if (i > 60) throw new SolveError("leash fall: bracketing the deflection", i, Math.abs(rHi));
    lo = hi;
    hi *= 2;
    rHi = imbalance(hi);
  }
  let d = hi;
  let r = rHi;
  let settled = false;
  for (let iteration = 0; iteration < 100 && !settled; iteration++) {
    const slope = loadAtDeflection(d) - weight;
    let next = slope > 0 ? d - r / slope : (lo + hi) / 2;
    if (!(next > lo && next < hi)) next = (lo + hi) / 2;
    const rNext = imbalance(next);
    if (rNext > 0) hi = next;
    else lo = next;
    settled = Math.abs(next - d) <= 1e-12 * next || hi - lo <= 1e-12 * hi;
    d = next;
    r = rNext;
  }
  if (!settled) throw new SolveError("leash fall energy balance", 100, Math.abs(r) / (weight * (fallHeight + d)));
  const energyStored = storedEnergy(loadAtDeflection, d);
  return { peakLoad: loadAtDeflection(d), deflection: d, energyIn: weight * (fallHeight + d), energyStored };
}
