import { solveEquilibrium } from "./equilibrium";
import type { Line, LineEquation, LineVariables } from "./line-equations";
import { describeEquilibrium, solveLine } from "./solve-line";

/** The line's force–deflection curve at one horizontal position. */
export interface LineForceDeflection {
  /** P(u): the static point load that holds the line u metres below its unloaded shape there, N. */
  load: (u: number) => number;
  /**
   * The first deflection between two already solved ones (u0 < u1) at which an anchor's tension
   * reaches a measured point of the stretch curve, or undefined. There the line's stiffness changes
   * abruptly, so P(u) has a kink that a quadrature panel should not straddle.
   */
  kinkBetween: (u0: number, u1: number) => number | undefined;
}

const UNKNOWNS = ["H", "VA", "loadArc", "load"] as const;

/**
 * Force–deflection of the line at horizontal position x (four unknowns H, VA, arc to load, load).
 * Solutions already found are reused as starting points; they never change the answer.
 */
export function lineForceDeflection(line: Line, length: number, x: number, breakingStrength: number): LineForceDeflection {
  const unloaded = solveLine(line, length, { force: 0, x }, breakingStrength);
  const known: { u: number; variables: LineVariables }[] = [{ u: 0, variables: { ...unloaded.variables, load: 1e-3 * Math.max(unloaded.variables.H, 1) } }];
  const nearest = (u: number) => known.reduce((a, b) => (Math.abs(b.u - u) < Math.abs(a.u - u) ? b : a)).variables;
  const solve = (start: LineVariables, condition: LineEquation) =>
    solveEquilibrium(line, start, UNKNOWNS, [{ kind: "span" }, { kind: "rise" }, { kind: "loadX", x }, condition], "line force–deflection").variables;
  const anchorTension = (v: LineVariables, anchor: "a" | "b") => Math.hypot(v.H, anchor === "a" ? v.VA : v.VA + line.weight * v.length + v.load);

  const load = (u: number) => {
    if (u === 0) return 0;
    const variables = solve(nearest(u), { kind: "loadY", y: unloaded.loadY - u });
    known.push({ u, variables });
    return variables.load;
  };

  const kinkBetween = (u0: number, u1: number) => {
    const before = u0 === 0 ? unloaded.variables : nearest(u0);
    const after = nearest(u1);
    let first: number | undefined;
    for (const anchor of ["a", "b"] as const) {
      const from = anchorTension(before, anchor);
      const to = Math.min(anchorTension(after, anchor), breakingStrength);
      const tension = line.curve.tensions.find((t) => t > from && t < to);
      if (tension === undefined) continue;
      // Solved from the loaded end: near the kink and well away from the unloaded line.
      const variables = solve(after, { kind: "tension", anchor, tension });
      const u = unloaded.loadY - describeEquilibrium(line, variables, 0).loadY;
      known.push({ u, variables });
      if (first === undefined || u < first) first = u;
    }
    return first;
  };
  return { load, kinkBetween };
}
