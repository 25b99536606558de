import { solveEquilibrium } from "./equilibrium";
import { type Line, type LineEquation, type LineVariables } from "./line-equations";
import { kinkPotential, lineEnergy } from "./line-energy";
import { strainAt } from "./stretch-curve";
import { solveLine } from "./solve-line";

/** A state on the load path at one position: deflection u (m), the load P(u) (N) and the work ∫₀^u P du (J). */
export interface LoadPathState {
  u: number;
  load: number;
  work: number;
  /** dW/du of the work as computed (P itself, to the accuracy of the released-energy rule), and dP/du, when
   * known: the energy balance's Newton and Halley steps use them (they never change the root). */
  slope?: number;
  stiffness?: number;
}

/** The line's force–deflection curve at one horizontal position. */
export interface LineForceDeflection {
  /** Height of the unloaded line there, m (y up from A). */
  unloadedY: number;
  /** P(u): the static point load that holds the line u metres below its unloaded shape there, N. */
  load: (u: number) => number;
  /** P(u) and the work done to reach it. */
  state: (u: number) => LoadPathState;
  /** The unloaded equilibrium there, and the one solved at deflection u. */
  unloaded: LineVariables;
  variablesAt: (u: number) => LineVariables;
  /** Equilibria solved so far on this path (the unloaded one included) and their Newton iterations in all: what the
   * starting points save shows here, never in the figures. */
  effort: () => { solves: number; iterations: number };
}

const UNKNOWNS = ["H", "VA", "loadArc", "load"] as const;
/** dv/du along the load path, for the four unknowns. */
type Tangent = Record<(typeof UNKNOWNS)[number], number>;

/** Lagrange basis on the nodes 0, 1/3, 2/3, 1, as power coefficients. */
const NODES = [0, 1 / 3, 2 / 3, 1];
const BASIS = NODES.map((ni) => {
  let c = [1];
  for (const nj of NODES) {
    if (nj === ni) continue;
    const next = new Array<number>(c.length + 1).fill(0);
    c.forEach((a, k) => {
      next[k + 1] += a / (ni - nj);
      next[k] -= (a * nj) / (ni - nj);
    });
    c = next;
  }
  return c;
});
/** CORRECTION[i][j] = ∫₀¹ ℓᵢ(t) ℓⱼ′(t) dt: ∫ G dS with G and S both the cubics through the four nodes. */
const CORRECTION = BASIS.map((li) =>
  BASIS.map((lj) => li.reduce((sum, a, p) => sum + lj.reduce((s, b, q) => (q === 0 ? s : s + (a * q * b) / (p + q)), 0), 0)),
);

/**
 * Force–deflection of the line at horizontal position x (four unknowns H, VA, arc to load, load).
 *
 * The work ∫₀^u P du comes from energies rather than from a quadrature of P: along the static load path
 * the load's work is the change of the line's strain energy and of its own weight's potential (both in
 * closed form, line-energy.ts), less the energy released as the loaded point's arc s_P slides along the
 * line: dΠ/du = P + ΔG·ds_P/du, ΔG the jump of e(T) − T(1 + ε) across the load. That small term (a few %
 * of the work near an anchor, none at a symmetric mid-span) is integrated with the cubic rule on the
 * states at u/3, 2u/3 and u; checked against a dense quadrature of P(u) in the tests.
 * Solutions already found are reused as starting points; they never change the answer.
 */
export function lineForceDeflection(line: Line, length: number, x: number, breakingStrength: number, start?: { unloaded: LineVariables }): LineForceDeflection {
  const unloaded = solveLine(line, length, { force: 0, x }, breakingStrength, start?.unloaded);
  const energyOf = (v: LineVariables) => {
    const e = lineEnergy(line, v);
    return e.strain + e.gravity;
  };
  // ΔG across the load, and how fast it changes along the path: dG/dT = −(1 + ε(T)), since de/dT = T·dε/dT.
  const jumpOf = (v: LineVariables, tangent: Tangent | undefined) => {
    const Vm = v.VA + line.weight * v.loadArc;
    const Vp = Vm + v.load;
    const Tm = Math.hypot(v.H, Vm);
    const Tp = Math.hypot(v.H, Vp);
    const jump = kinkPotential(line.curve, Tm) - kinkPotential(line.curve, Tp);
    if (!tangent) return { jump, jumpRate: undefined };
    const dVm = tangent.VA + line.weight * tangent.loadArc;
    const dTm = (v.H * tangent.H + Vm * dVm) / Tm;
    const dTp = (v.H * tangent.H + Vp * (dVm + tangent.load)) / Tp;
    return { jump, jumpRate: -(1 + strainAt(line.curve, Tm)) * dTm + (1 + strainAt(line.curve, Tp)) * dTp };
  };
  const condition = (u: number): LineEquation => ({ kind: "loadY", y: unloaded.loadY - u });
  const equations = (u: number): LineEquation[] => [{ kind: "span" }, { kind: "rise" }, { kind: "loadX", x }, condition(u)];
  // Every solved state keeps its tangent along the path, dv/du (the loadY target is y₀ − u: minus its sensitivity).
  const effort = { solves: 1, iterations: unloaded.iterations };
  const solveAt = (u: number, guess: LineVariables) => {
    const { variables, iterations, sensitivity: d } = solveEquilibrium(line, guess, UNKNOWNS, equations(u), "line force–deflection", 3);
    effort.solves++;
    effort.iterations += iterations;
    const tangent = d && { H: -d.H!, VA: -d.VA!, loadArc: -d.loadArc!, load: -d.load! };
    return { variables, tangent, energy: energyOf(variables), ...jumpOf(variables, tangent) };
  };
  type Solved = ReturnType<typeof solveAt>;
  // The unloaded state is on the path too (u = 0, no load, no jump): solved again with the four unknowns for its tangent.
  const base: Solved = solveAt(0, unloaded.variables);
  const known = new Map<number, Solved>([[0, base]]);
  // A new state starts from the cubic Hermite through the solved states on either side of it (value and
  // tangent), or from the tangent of the nearest when none lies beyond: a Newton step or two fewer.
  const predicted = (u: number): LineVariables => {
    let below: [number, Solved] | undefined;
    let above: [number, Solved] | undefined;
    for (const entry of known) {
      const k = entry[0];
      if (k <= u && (!below || k > below[0])) below = entry;
      if (k > u && (!above || k < above[0])) above = entry;
    }
    const [ua, a] = below ?? above!;
    if (!a.tangent) return a.variables;
    const guess = { ...a.variables };
    const keys = ["H", "VA", "loadArc", "load"] as const;
    if (below && above && above[1].tangent) {
      const [ub, b] = above;
      const h = ub - ua;
      const t = (u - ua) / h;
      const t2 = t * t;
      const t3 = t2 * t;
      for (const key of keys) {
        guess[key] =
          (2 * t3 - 3 * t2 + 1) * a.variables[key] +
          (t3 - 2 * t2 + t) * h * a.tangent[key] +
          (3 * t2 - 2 * t3) * b.variables[key] +
          (t3 - t2) * h * b.tangent![key];
      }
    } else for (const key of keys) guess[key] = a.variables[key] + (u - ua) * a.tangent[key];
    return guess.H > 0 && guess.load >= 0 && guess.loadArc > 0 && guess.loadArc < length ? guess : a.variables;
  };
  const solved = (u: number) => {
    const found = known.get(u);
    if (found) return found;
    const s = solveAt(u, predicted(u));
    known.set(u, s);
    return s;
  };
  const load = (u: number) => (u === 0 ? 0 : solved(u).variables.load);
  const state = (u: number): LoadPathState => {
    if (u === 0) return { u, load: 0, work: 0 };
    const nodes = NODES.map((t) => (t === 0 ? base : solved(t * u)));
    // The released energy by the cubic rule, and its exact derivative in u (each node sits at t·u), so the
    // energy balance's Newton steps follow the work as computed: dW/du = P + ΔG·ds_P/du − d(released)/du.
    let released = 0;
    let releasedRate = 0;
    for (let i = 0; i < 4; i++) {
      for (let j = 0; j < 4; j++) {
        const a = nodes[i];
        const b = nodes[j];
        released += a.jump * CORRECTION[i][j] * b.variables.loadArc;
        releasedRate += CORRECTION[i][j] * (NODES[i] * (a.jumpRate ?? NaN) * b.variables.loadArc + a.jump * NODES[j] * (b.tangent?.loadArc ?? NaN));
      }
    }
    const end = nodes[3];
    const work = end.energy - base.energy - released;
    // Without a tangent somewhere (a singular Jacobian) the rate is NaN and the energy balance steps on P alone.
    if (!end.tangent || !Number.isFinite(releasedRate)) return { u, load: end.variables.load, work };
    return { u, load: end.variables.load, work, slope: end.variables.load + end.jump * end.tangent.loadArc - releasedRate, stiffness: end.tangent.load };
  };
  const variablesAt = (u: number) => solved(u).variables;
  return { unloadedY: unloaded.loadY, unloaded: unloaded.variables, load, state, variablesAt, effort: () => ({ ...effort }) };
}
