/** A solve that did not converge: the engine refuses to return a figure it is not sure of. */
export class SolveError extends Error {
  readonly iterations: number;
  readonly residual: number;

  /** `why` says how the solve failed; by default, that it ran out of iterations. */
  constructor(what: string, iterations: number, residual: number, why = `did not converge after ${iterations} iterations`) {
    super(`${what} ${why} (scaled residual ${residual.toExponential(2)})`);
    this.name = "SolveError";
    this.iterations = iterations;
    this.residual = residual;
  }

  toJSON() {
    return { error: this.name, message: this.message, iterations: this.iterations, residual: this.residual };
  }
}
