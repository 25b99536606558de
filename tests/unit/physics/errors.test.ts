import { describe, expect, it } from "vitest";
import { checkNumber } from "../../../physics/check-number";
import { RigInputError, SolveError } from "../../../physics";

// The engine's two refusals, as the app shows them (its route handlers send toJSON): the product's own wording.
describe("RigInputError", () => {
  it("names the field, what was given and what is allowed, and says NaN, Infinity and nothing as they are", () => {
    const given = [
      [Number.NaN, "NaN"],
      [Number.POSITIVE_INFINITY, "Infinity"],
      [-2.5, "-2.5"],
      [undefined, "nothing"],
      [null, "null"],
      ["ten", '"ten"'],
      [{ kind: "ring" }, '{"kind":"ring"}'],
      [[1, 2], "[1,2]"],
      [() => 1, "() => 1"],
    ] as const;
    for (const [value, shown] of given) {
      const error = new RigInputError("spanM", value, "a span > 0 m");
      expect(error.given).toBe(shown);
      expect(error.message).toBe(`spanM: got ${shown}; allowed: a span > 0 m`);
    }
  });

  it("names a value it cannot write as JSON by its own text (a list that holds itself)", () => {
    const circular: unknown[] = [];
    circular.push(circular);
    expect(new RigInputError("stages", circular, "a list").given).toBe("");
    expect(new RigInputError("big", 10n, "a number").given).toBe("10");
  });

  it("goes over the wire as its name, field, given, allowed and message", () => {
    const error = new RigInputError("walker.massKg", 0, "a mass > 0 kg");
    expect(error).toBeInstanceOf(Error);
    expect(error.name).toBe("RigInputError");
    expect(error.toJSON()).toEqual({
      error: "RigInputError",
      field: "walker.massKg",
      given: "0",
      allowed: "a mass > 0 kg",
      message: "walker.massKg: got 0; allowed: a mass > 0 kg",
    });
  });
});

describe("checkNumber", () => {
  it("returns a finite number that meets the rule, refuses anything else with the rule's words", () => {
    const positive = (v: number) => v > 0;
    expect(checkNumber("f", 2, positive, "> 0")).toBe(2);
    for (const bad of [0, -1, Number.NaN, Number.POSITIVE_INFINITY, "2", null, undefined]) {
      expect(() => checkNumber("f", bad, positive, "> 0")).toThrow(expect.objectContaining({ name: "RigInputError", field: "f", allowed: "> 0" }));
    }
    // Infinity is refused even where the rule alone would take it.
    expect(() => checkNumber("f", Number.POSITIVE_INFINITY, () => true, "any")).toThrow(RigInputError);
  });
});

describe("SolveError", () => {
  it("says what failed, how, and the residual, and goes over the wire with its counts", () => {
    const ran = new SolveError("The line's equilibrium", 60, 0.000123456);
    expect(ran.name).toBe("SolveError");
    expect(ran.message).toBe("The line's equilibrium did not converge after 60 iterations (scaled residual 1.23e-4)");
    expect(ran.toJSON()).toEqual({ error: "SolveError", message: ran.message, iterations: 60, residual: 0.000123456 });
    expect(new SolveError("The catch", 3, 2, "met a singular Jacobian").message).toBe("The catch met a singular Jacobian (scaled residual 2.00e+0)");
  });
});
