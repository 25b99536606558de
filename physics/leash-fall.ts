import { checkNumber } from "./check-number";
import { GAUSS_LOBATTO_5 } from "./gauss-lobatto";
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

/** A state on the load path: deflection u (m), load P(u) (N) and the work ∫₀^u P du done to reach it (J). */
interface PathState {
  u: number;
  load: number;
  work: number;
}

/**
 * The state at deflection u, reached from a known state by one Gauss–Lobatto panel of ∫P du: the
 * panel's ends are the known state and the new one, so each step costs three new loads.
 */
function stepTo(from: PathState, u: number, loadAtDeflection: (u: number) => number): PathState {
  const { nodes, weights } = GAUSS_LOBATTO_5;
  const h = u - from.u;
  let sum = weights[0] * from.load;
  for (let i = 1; i < nodes.length - 1; i++) sum += weights[i] * loadAtDeflection(from.u + h * nodes[i]);
  const load = loadAtDeflection(u);
  sum += weights[nodes.length - 1] * load;
  return { u, load, work: from.work + h * sum };
}

/**
 * Peak of a leash fall with no damping (an upper bound): the walker falls freely through h_f, then the
 * line deflects until all the energy is stored, m·g·(h_f + δ) = ∫₀^δ P(u) du, P(u) being the static
 * load that holds the line u below its unloaded shape at the fall position (energy balance, e.g.
 * Meriam & Kraige, Engineering Mechanics: Dynamics, work–energy for a mass dropped on a spring).
 * The work is carried along the load path panel by panel, each new state stepping from the nearest
 * known one, so no load is solved twice and the last panels are short. `kinkBetween(u0, u1)` names the
 * first deflection in between where P(u) bends sharply (e.g. the stiffness changing at a measured
 * point of the stretch curve): no panel straddles one.
 */
export function leashFallPeak(
  mass: number,
  fallHeight: number,
  loadAtDeflection: (u: number) => number,
  kinkBetween: (u0: number, u1: number) => number | undefined = () => undefined,
): LeashFallPeak {
  checkNumber("leashFall.mass", mass, (v) => v > 0, "a mass > 0 kg");
  checkNumber("leashFall.fallHeight", fallHeight, (v) => v >= 0 && v <= 100, "a free-fall height from 0 m to 100 m");
  const weight = mass * STANDARD_GRAVITY;
  const imbalance = (s: PathState) => s.work - weight * (fallHeight + s.u);
  // Bracket the deflection by doubling (at least the first step), the work carried from one end of the bracket to the next; a
  // panel that straddles a kink is taken again up to the kink, so the bracket holds none.
  const panel = (from: PathState, u: number) => {
    const to = stepTo(from, u, loadAtDeflection);
    const kink = kinkBetween(from.u, u);
    return kink === undefined || !(kink > from.u && kink < u) ? to : stepTo(from, kink, loadAtDeflection);
  };
  const firstStep = Math.max(fallHeight, 0.05);
  let lo: PathState = { u: 0, load: loadAtDeflection(0), work: 0 };
  let hi = panel(lo, firstStep);
  for (let i = 0; imbalance(hi) <= 0; i++) {
    if (i > 80) throw new SolveError("leash fall: bracketing the deflection", i, Math.abs(imbalance(hi)));
    lo = hi;
    hi = panel(hi, hi.u + Math.max(hi.u, firstStep));
  }
  // Safeguarded Newton from the high end: d(imbalance)/dδ = P(δ) − m·g, and the imbalance is convex
  // (P grows with u), so the steps close in from above.
  let current = hi;
  for (let iteration = 0; iteration < 100; iteration++) {
    const r = imbalance(current);
    if (Math.abs(r) <= 1e-12 * weight * (fallHeight + current.u) || hi.u - lo.u <= 1e-12 * hi.u) {
      return { peakLoad: current.load, deflection: current.u, energyIn: weight * (fallHeight + current.u), energyStored: current.work };
    }
    const slope = current.load - weight;
    let next = slope > 0 ? current.u - r / slope : (lo.u + hi.u) / 2;
    if (!(next > lo.u && next < hi.u)) next = (lo.u + hi.u) / 2;
    current = stepTo(next - lo.u < hi.u - next ? lo : hi, next, loadAtDeflection);
    if (imbalance(current) > 0) hi = current;
    else lo = current;
  }
  throw new SolveError("leash fall energy balance", 100, Math.abs(imbalance(current)) / (weight * (fallHeight + current.u)));
}
