import { lineEquations, VARIABLE_NAMES, type Line, type LineEquation, type LineVariables, type VariableName } from "./line-equations";
import { newtonSolve } from "./newton";

/**
 * Solves the chosen conditions for the chosen unknowns (as many of each), the other variables held
 * at their start values. Unknowns and residuals are scaled to order one so one tolerance fits all.
 */
export function solveEquilibrium(
  line: Line,
  start: LineVariables,
  unknowns: readonly VariableName[],
  equations: readonly LineEquation[],
  what: string,
): { variables: LineVariables; iterations: number } {
  const force = Math.max(Math.abs(start.H), Math.abs(start.VA), start.load, line.weight * start.length, 1);
  const scaleOf = (name: VariableName) => (name === "loadArc" || name === "length" ? line.span : force);
  const columns = unknowns.map((name) => VARIABLE_NAMES.indexOf(name));
  const scales = unknowns.map(scaleOf);
  const rowScales = equations.map((eq) => (eq.kind === "tension" ? eq.tension : line.span));
  const toVariables = (x: number[]): LineVariables => {
    const v = { ...start };
    unknowns.forEach((name, i) => (v[name] = x[i] * scales[i]));
    return v;
  };
  const { x, iterations } = newtonSolve(
    {
      evaluate(x) {
        const { residual, jacobian } = lineEquations(line, toVariables(x), equations);
        return {
          residual: residual.map((r, i) => r / rowScales[i]),
          jacobian: jacobian.map((row, i) => columns.map((c, j) => (row[c] * scales[j]) / rowScales[i])),
        };
      },
      isValid(x) {
        const v = toVariables(x);
        return v.H > 0 && v.length > 0 && v.load >= 0;
      },
    },
    unknowns.map((name, i) => start[name] / scales[i]),
    { what },
  );
  return { variables: toVariables(x), iterations };
}
