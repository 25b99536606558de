import { checkNumber } from "./check-number";
import type { LoadPathState } from "./line-force-deflection";
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

/**
 * Peak of a fall with no damping (an upper bound): the walker falls freely through h_f, then the line
 * deflects until all the energy is stored, m·g·(h_f + δ) = ∫₀^δ P(u) du (energy balance, e.g. Meriam &
 * Kraige, Engineering Mechanics: Dynamics, work–energy for a mass dropped on a spring). `stateAt(u)` gives
 * P(u) and the work ∫₀^u P du. `guess` (e.g. the deflection at a neighbouring position) only saves steps.
 */
export function leashFallPeak(mass: number, fallHeight: number, stateAt: (u: number) => LoadPathState, guess?: number): LeashFallPeak {
  checkNumber("leashFall.mass", mass, (v) => v > 0, "a mass > 0 kg");
  checkNumber("leashFall.fallHeight", fallHeight, (v) => v >= 0 && v <= 100, "a free-fall height from 0 m to 100 m");
  const weight = mass * STANDARD_GRAVITY;
  const imbalance = (s: LoadPathState) => s.work - weight * (fallHeight + s.u);
  // d(imbalance)/dδ = P(δ) − m·g and the imbalance is convex (P grows with u): Newton from above closes in
  // monotonically; from below, the trial at most doubles. When the load path gives them, the step uses the
  // slope of the work as computed (equal to P only to the accuracy of its released-energy rule, which near an
  // anchor would leave Newton closing in linearly) and the stiffness dP/du, for Halley's cubic convergence.
  let lo: LoadPathState = { u: 0, load: 0, work: 0 };
  let hi: LoadPathState | undefined;
  let current = stateAt(guess !== undefined && guess > 0 ? guess : Math.max(fallHeight, 0.05));
  for (let iteration = 0; iteration < 200; iteration++) {
    const r = imbalance(current);
    if (r > 0) hi = current;
    else lo = current;
    if (Math.abs(r) <= 1e-9 * weight * (fallHeight + current.u) || (hi && hi.u - lo.u <= 1e-10 * hi.u)) {
      return { peakLoad: current.load, deflection: current.u, energyIn: weight * (fallHeight + current.u), energyStored: current.work };
    }
    const slope = (current.slope ?? current.load) - weight;
    const curvature = current.stiffness;
    let next = slope > 0 ? current.u - r / slope : 2 * current.u;
    // Halley: the Newton step divided by 1 − r·r''/(2r'²), only while that factor stays near one.
    const halley = slope > 0 && curvature !== undefined ? 1 - (r * curvature) / (2 * slope * slope) : 0;
    if (halley > 0.5 && halley < 2) next = current.u - r / slope / halley;
    if (hi && !(next > lo.u && next < hi.u)) next = (lo.u + hi.u) / 2;
    // Below the root a Newton step where P barely exceeds m·g would shoot far past it: at most double.
    if (!hi && !(next > lo.u && next <= 2 * current.u)) next = 2 * current.u;
    current = stateAt(next);
  }
  throw new SolveError("leash fall energy balance", 200, Math.abs(imbalance(current)) / (weight * (fallHeight + current.u)));
}
