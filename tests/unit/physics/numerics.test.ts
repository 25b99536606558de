import { describe, expect, it } from "vitest";
import { bracketedRoot, checkNumber, GAUSS_LOBATTO_5, newtonSolve, RigInputError, SolveError } from "../../../physics";

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
