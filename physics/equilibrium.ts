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
  function toVariables(x: number[]): LineVariables {
    const v = { ...start };
    for (let i = 0; i < unknowns.length; i++) v[unknowns[i]] = x[i] * scales[i];
    return v;
  }
  const { x, iterations } = newtonSolve(
    {
      evaluate(x) {
        const { residual, jacobian } = lineEquations(line, toVariables(x), equations);
        const scaled: number[][] = [];
        for (let i = 0; i < residual.length; i++) {
          residual[i] /= rowScales[i];
          const row: number[] = [];
          for (let j = 0; j < columns.length; j++) row.push((jacobian[i][columns[j]] * scales[j]) / rowScales[i]);
          scaled.push(row);
        }
        return { residual, jacobian: scaled };
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
