import { lineEquations, VARIABLE_NAMES, type Line, type LineEquation, type LineVariables, type VariableName } from "./line-equations";
import { newtonSolve, solveLinear, type NewtonSystem } from "./newton";

/**
 * The chosen conditions as a Newton system in the chosen unknowns, both scaled to order one. A class rather
 * than closures made at every solve: the solve is the engine's inner loop, and this keeps it free of
 * per-call function objects.
 */
class ScaledEquilibrium implements NewtonSystem {
  /** For each of VARIABLE_NAMES, its place among the unknowns, or −1 when it is held at its start value. */
  private readonly slot: number[];
  private readonly columns: number[];
  private readonly scales: number[];
  private readonly rowScales: number[];

  constructor(
    private readonly line: Line,
    private readonly start: LineVariables,
    unknowns: readonly VariableName[],
    private readonly equations: readonly LineEquation[],
  ) {
    const force = Math.max(Math.abs(start.H), Math.abs(start.VA), start.load, line.weight * start.length, 1);
    this.columns = unknowns.map((name) => VARIABLE_NAMES.indexOf(name));
    this.slot = VARIABLE_NAMES.map((name) => unknowns.indexOf(name));
    this.scales = unknowns.map((name) => (name === "loadArc" || name === "length" ? line.span : force));
    this.rowScales = equations.map((eq) => (eq.kind === "tension" ? eq.tension : line.span));
  }

  startVector(): number[] {
    return this.columns.map((c, i) => this.start[VARIABLE_NAMES[c]] / this.scales[i]);
  }

  variables(x: readonly number[]): LineVariables {
    const { start } = this;
    return {
      H: this.value(x, 0, start.H),
      VA: this.value(x, 1, start.VA),
      loadArc: this.value(x, 2, start.loadArc),
      load: this.value(x, 3, start.load),
      length: this.value(x, 4, start.length),
    };
  }

  private value(x: readonly number[], k: number, held: number): number {
    const i = this.slot[k];
    return i < 0 ? held : x[i] * this.scales[i];
  }

  evaluate(x: number[]) {
    const { residual, jacobian } = lineEquations(this.line, this.variables(x), this.equations);
    const { columns, scales, rowScales } = this;
    const scaled: number[][] = [];
    for (let i = 0; i < residual.length; i++) {
      residual[i] /= rowScales[i];
      const row: number[] = [];
      for (let j = 0; j < columns.length; j++) row.push((jacobian[i][columns[j]] * scales[j]) / rowScales[i]);
      scaled.push(row);
    }
    return { residual, jacobian: scaled };
  }

  /** Each residual is (value − target) / row scale, so d(scaled unknowns)/d(target k) = J⁻¹·e_k / row scale k. */
  sensitivity(jacobian: number[][], k: number, unknowns: readonly VariableName[]): Sensitivity | undefined {
    const unit = this.rowScales.map((scale, i) => (i === k ? 1 / scale : 0));
    const dx = solveLinear(jacobian, unit);
    if (dx === null) return undefined;
    const result: Sensitivity = {};
    for (let i = 0; i < unknowns.length; i++) result[unknowns[i]] = dx[i] * this.scales[i];
    return result;
  }

  isValid(x: number[]) {
    const v = this.variables(x);
    return v.H > 0 && v.length > 0 && v.load >= 0;
  }
}

/** How the solution moves as one condition's target moves, in real units: d(unknown)/d(target), by unknown. */
export type Sensitivity = Partial<Record<VariableName, number>>;

/**
 * Solves the chosen conditions for the chosen unknowns (as many of each), the other variables held
 * at their start values. Unknowns and residuals are scaled to order one so one tolerance fits all.
 * With `sensitivityOf` (an index into `equations`) it also returns how the solution moves with that
 * condition's target (the implicit function theorem on the Jacobian at the root): a next solve along a path
 * of such targets can start from the tangent.
 */
export function solveEquilibrium(
  line: Line,
  start: LineVariables,
  unknowns: readonly VariableName[],
  equations: readonly LineEquation[],
  what: string,
  sensitivityOf?: number,
): { variables: LineVariables; iterations: number; sensitivity?: Sensitivity } {
  const system = new ScaledEquilibrium(line, start, unknowns, equations);
  const { x, iterations, jacobian } = newtonSolve(system, system.startVector(), { what });
  const variables = system.variables(x);
  if (sensitivityOf === undefined) return { variables, iterations };
  return { variables, iterations, sensitivity: system.sensitivity(jacobian, sensitivityOf, unknowns) };
}
