import { solveEquilibrium } from "./equilibrium";
import type { Line, LineVariables } from "./line-equations";
import { solveLine } from "./solve-line";

/**
 * The line's force–deflection curve at a horizontal position x: P(u), the static point load that holds
 * the line u metres below its unloaded shape there (four unknowns H, VA, arc to load, load).
 * Solutions already found are reused as starting points; they never change the answer.
 */
export function lineForceDeflection(line: Line, length: number, x: number, breakingStrength: number): (u: number) => number {
  const unloaded = solveLine(line, length, { force: 0, x }, breakingStrength);
  const known: { u: number; variables: LineVariables }[] = [{ u: 0, variables: unloaded.variables }];
  return (u: number) => {
    if (u === 0) return 0;
    const nearest = known.reduce((a, b) => (Math.abs(b.u - u) < Math.abs(a.u - u) ? b : a));
    const start = nearest.u === 0 ? { ...nearest.variables, load: 1e-3 * Math.max(nearest.variables.H, 1) } : nearest.variables;
    const { variables } = solveEquilibrium(
      line,
      start,
      ["H", "VA", "loadArc", "load"],
      [{ kind: "span" }, { kind: "rise" }, { kind: "loadX", x }, { kind: "loadY", y: unloaded.loadY - u }],
      "line force–deflection",
    );
    known.push({ u, variables });
    return variables.load;
  };
}
