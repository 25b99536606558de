import { solveEquilibrium } from "./equilibrium";
import { segmentEnds, type Line, type LineEquation, type LineVariables } from "./line-equations";
import { kinkPotential, lineEnergy } from "./line-energy";
import { solveLine } from "./solve-line";

/** A state on the load path at one position: deflection u (m), the load P(u) (N) and the work ∫₀^u P du (J). */
export interface LoadPathState {
  u: number;
  load: number;
  work: number;
  /** dP/du at u when known, N/m: it lets the energy balance take Halley steps (it never changes the root). */
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
}

const UNKNOWNS = ["H", "VA", "loadArc", "load"] as const;

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
export function lineForceDeflection(
  line: Line,
  length: number,
  x: number,
  breakingStrength: number,
  start?: { unloaded: LineVariables; loaded: LineVariables },
): LineForceDeflection {
  const unloaded = solveLine(line, length, { force: 0, x }, breakingStrength, start?.unloaded);
  const energyOf = (v: LineVariables) => {
    const e = lineEnergy(line, v);
    return e.strain + e.gravity;
  };
  const jumpOf = (v: LineVariables) => {
    const { Vm, Vp } = segmentEnds(line, v);
    return kinkPotential(line.curve, Math.hypot(v.H, Vm)) - kinkPotential(line.curve, Math.hypot(v.H, Vp));
  };
  const base = { variables: unloaded.variables, energy: energyOf(unloaded.variables), jump: 0 };
  const known = new Map<number, { variables: LineVariables; energy: number; jump: number }>([[0, base]]);
  // The first solve starts from a loaded state of a neighbouring position when given, later ones from the nearest solved deflection.
  const seed: LineVariables = start ? start.loaded : { ...unloaded.variables, load: 1e-3 * Math.max(unloaded.variables.H, 1) };
  // A new state starts from the line through the two solved states nearest in deflection (the first from
  // the seed): about one Newton step fewer than starting from the nearest alone.
  const predicted = (u: number): LineVariables => {
    let first: [number, LineVariables] | undefined;
    let second: [number, LineVariables] | undefined;
    for (const [k, s] of known) {
      if (k === 0) continue;
      if (!first || Math.abs(k - u) < Math.abs(first[0] - u)) {
        second = first;
        first = [k, s.variables];
      } else if (!second || Math.abs(k - u) < Math.abs(second[0] - u)) second = [k, s.variables];
    }
    if (!first) return seed;
    if (!second) return first[1];
    const [u1, a] = first;
    const [u2, b] = second;
    const t = (u - u1) / (u2 - u1);
    const guess = {
      ...a,
      H: a.H + t * (b.H - a.H),
      VA: a.VA + t * (b.VA - a.VA),
      loadArc: a.loadArc + t * (b.loadArc - a.loadArc),
      load: a.load + t * (b.load - a.load),
    };
    return guess.H > 0 && guess.load >= 0 && guess.loadArc > 0 && guess.loadArc < length ? guess : a;
  };
  const condition = (u: number): LineEquation => ({ kind: "loadY", y: unloaded.loadY - u });
  const solved = (u: number) => {
    const found = known.get(u);
    if (found) return found;
    const variables = solveEquilibrium(
      line,
      predicted(u),
      UNKNOWNS,
      [{ kind: "span" }, { kind: "rise" }, { kind: "loadX", x }, condition(u)],
      "line force–deflection",
    ).variables;
    const s = { variables, energy: energyOf(variables), jump: jumpOf(variables) };
    known.set(u, s);
    return s;
  };
  const load = (u: number) => (u === 0 ? 0 : solved(u).variables.load);
  const state = (u: number): LoadPathState => {
    if (u === 0) return { u, load: 0, work: 0 };
    const nodes = NODES.map((t) => (t === 0 ? base : solved(t * u)));
    let released = 0;
    for (let i = 0; i < 4; i++) for (let j = 0; j < 4; j++) released += nodes[i].jump * CORRECTION[i][j] * nodes[j].variables.loadArc;
    const end = nodes[3];
    // dP/du at u from the cubic through the four states (the four-point backward difference).
    const stiffness = (11 * end.variables.load - 18 * nodes[2].variables.load + 9 * nodes[1].variables.load) / (2 * u);
    return { u, load: end.variables.load, work: end.energy - base.energy - released, stiffness };
  };
  const variablesAt = (u: number) => solved(u).variables;
  return { unloadedY: unloaded.loadY, unloaded: unloaded.variables, load, state, variablesAt };
}
