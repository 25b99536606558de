import { describe, expect, it } from "vitest";
import { bracketedRoot, checkNumber, GAUSS_LOBATTO_5, newtonSolve, RigInputError, SolveError } from "../../../physics";
import { solveLinear } from "../../../physics/newton";

describe("bracketedRoot", () => {
  it("finds √2 and refuses an interval without a sign change", () => {
    expect(bracketedRoot((x) => x * x - 2, 0, 2, "test")).toBeCloseTo(Math.SQRT2, 12);
    expect(() => bracketedRoot((x) => x * x + 1, -1, 1, "test")).toThrow(SolveError);
  });
});

describe("GAUSS_LOBATTO_5", () => {
  it("integrates t^k on [0, 1] to 1/(k + 1) exactly up to degree 7 and not at degree 8 (calculus; degree 2n − 3 for Lobatto)", () => {
    const { nodes, weights } = GAUSS_LOBATTO_5;
    const integral = (f: (t: number) => number) => nodes.reduce((s, t, i) => s + weights[i] * f(t), 0);
    for (let k = 0; k <= 7; k++) expect(integral((t) => t ** k)).toBeCloseTo(1 / (k + 1), 14);
    expect(Math.abs(integral((t) => t ** 8) - 1 / 9)).toBeGreaterThan(1e-6);
  });
});

describe("newtonSolve", () => {
  it("solves a small nonlinear system and raises SolveError when it cannot", () => {
    const system = {
      evaluate: (x: number[]) => ({
        residual: [x[0] * x[0] + x[1] * x[1] - 4, x[0] - x[1]],
        jacobian: [
          [2 * x[0], 2 * x[1]],
          [1, -1],
        ],
      }),
      isValid: () => true,
    };
    const { x } = newtonSolve(system, [1, 0.5], { what: "test" });
    expect(x[0]).toBeCloseTo(Math.SQRT2, 12);
    expect(x[1]).toBeCloseTo(Math.SQRT2, 12);
    const impossible = { evaluate: (x: number[]) => ({ residual: [x[0] * x[0] + 1], jacobian: [[2 * x[0]]] }), isValid: () => true };
    expect(() => newtonSolve(impossible, [1], { what: "impossible" })).toThrow(SolveError);
  });
});

describe("checkNumber", () => {
  it("passes good numbers and names the field for bad ones", () => {
    expect(checkNumber("span", 25, (v) => v > 0, "> 0 m")).toBe(25);
    for (const bad of [NaN, Infinity, "25", -1]) expect(() => checkNumber("span", bad, (v) => v > 0, "> 0 m")).toThrow(RigInputError);
  });
});

// The solvers' own behaviour, on problems whose answers and iterates are known by hand: Newton on x² − 2 from 1 is
// Heron's method for √2 (1, 3/2, 17/12, 577/408, 665857/470832, each squaring the error); Gaussian elimination on
// small systems solved by hand; each way a solve can fail, with the words it fails in.
describe("the solvers, step by step", () => {
  const scalar = (f: (x: number) => number, df: (x: number) => number, isValid: (x: number) => boolean = () => true) => ({
    evaluate: (x: number[]) => ({ residual: [f(x[0])], jacobian: [[df(x[0])]] }),
    isValid: (x: number[]) => isValid(x[0]),
  });

  it("Newton on x² − 2 from 1 follows Heron's iterates and stops once the residual is under its tolerance", () => {
    const heron = scalar(
      (x) => x * x - 2,
      (x) => 2 * x,
    );
    expect(newtonSolve(heron, [1], { what: "√2", maxIterations: 3, tolerance: 1e-5 })).toMatchObject({ x: [577 / 408], iterations: 3 });
    // 665857/470832 is within 4.5e-12 of the root's square: under the default tolerance of 1e-11.
    const { x, iterations, jacobian } = newtonSolve(heron, [1], { what: "√2" });
    expect(x[0]).toBeCloseTo(665857 / 470832, 15);
    expect(iterations).toBe(4);
    expect(jacobian[0][0]).toBe(2 * x[0]);
    expect(newtonSolve(heron, [Math.SQRT2], { what: "√2" }).iterations).toBe(0);
  });

  it("halves a step that leaves the domain or does not reduce the residual", () => {
    // x − 1 with a slope taken as 0.25: from 2 the full step lands on −2 (outside x ≥ 0), half of it on 0 (no better
    // than 2), a quarter of it on 1, the root.
    const overshooting = scalar(
      (x) => x - 1,
      () => 0.25,
      (x) => x >= 0,
    );
    expect(newtonSolve(overshooting, [2], { what: "overshoot" })).toMatchObject({ x: [1], iterations: 1 });
  });

  it("says how it failed: out of iterations, a non-finite residual, a singular Jacobian, or no step that helps", () => {
    const message = (run: () => unknown) => {
      try {
        run();
      } catch (error) {
        expect(error).toBeInstanceOf(SolveError);
        return (error as SolveError).message;
      }
      throw new Error("expected a SolveError");
    };
    const heron = scalar(
      (x) => x * x - 2,
      (x) => 2 * x,
    );
    expect(message(() => newtonSolve(heron, [1], { what: "√2", maxIterations: 2 }))).toBe("√2 did not converge after 2 iterations (scaled residual 6.94e-3)");
    expect(
      message(() =>
        newtonSolve(
          scalar(
            () => Number.NaN,
            () => 1,
          ),
          [1],
          { what: "nan" },
        ),
      ),
    ).toBe("nan reached a non-finite residual after 0 iterations (scaled residual NaN)");
    expect(
      message(() =>
        newtonSolve(
          scalar(
            (x) => x * x + 1,
            () => 0,
          ),
          [0],
          { what: "flat" },
        ),
      ),
    ).toBe("flat met a singular Jacobian after 0 iterations (scaled residual 1.00e+0)");
    // Every trial step leaves the domain: no step is taken at all.
    expect(
      message(() =>
        newtonSolve(
          scalar(
            (x) => x - 2,
            () => 1,
            (x) => x === 0,
          ),
          [0],
          { what: "fenced in" },
        ),
      ),
    ).toBe("fenced in could not reduce the residual after 0 iterations (scaled residual 2.00e+0)");
  });

  it("eliminates with partial pivoting and knows a singular matrix", () => {
    // x + 2y = 5, 3x + 4y = 11 → x = 1, y = 2; a zero first pivot needs the swap.
    expect(
      solveLinear(
        [
          [1, 2],
          [3, 4],
        ],
        [5, 11],
      ),
    ).toEqual([1, 2]);
    expect(
      solveLinear(
        [
          [0, 1],
          [1, 0],
        ],
        [3, 4],
      ),
    ).toEqual([4, 3]);
    const [a, b, c] = solveLinear(
      [
        [2, 1, -1],
        [-3, -1, 2],
        [-2, 1, 2],
      ],
      [8, -11, -3],
    )!;
    expect([a, b, c].map((v) => Number(v.toFixed(12)))).toEqual([2, 3, -1]);
    expect(
      solveLinear(
        [
          [1, 2],
          [2, 4],
        ],
        [1, 2],
      ),
    ).toBeNull();
    expect(solveLinear([[0]], [1])).toBeNull();
  });

  it("bracketed roots: an end that is a root, the bracket's tolerance, and the words when there is no sign change", () => {
    expect(bracketedRoot((x) => x - 3, 3, 5, "end")).toBe(3);
    expect(bracketedRoot((x) => x - 5, 3, 5, "end")).toBe(5);
    expect(bracketedRoot((x) => x ** 3 - 8, 0, 5, "cube root")).toBeCloseTo(2, 11);
    expect(bracketedRoot((x) => Math.cos(x) - x, 0, 1, "Dottie number", 1e-15)).toBeCloseTo(0.7390851332151607, 14);
    expect(() => bracketedRoot((x) => x * x + 1, -1, 2, "none")).toThrow(
      expect.objectContaining({ message: "none found no sign change on [-1, 2] (scaled residual 2.00e+0)" }),
    );
  });

  it("bracketed roots of a function scaled by 1e-160 and 1e-200: the root of c·g is g's (analytic: ln 1.5 and 0.3), though products of its values underflow", () => {
    // Below about 1e-154 a product of two values is zero or subnormal: a sign test by product once lost the bracket
    // (1e-160 gave 0.41075 for ln 1.5) or saw no sign change (1e-200).
    for (const scale of [1, 1e-160, 1e-200]) {
      expect(bracketedRoot((x) => scale * (Math.exp(x) - 1.5), 0, 1, "scaled")).toBeCloseTo(Math.log(1.5), 12);
      expect(bracketedRoot((x) => scale * (x - 0.3), 0, 1, "scaled")).toBeCloseTo(0.3, 12);
    }
    expect(() => bracketedRoot((x) => 1e-200 * (x * x + 1), -1, 2, "none")).toThrow(
      expect.objectContaining({ message: expect.stringContaining("found no sign change") }),
    );
  });
});
