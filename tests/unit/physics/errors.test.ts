import { describe, expect, it } from "vitest";
import rigExample from "@/physics/examples/quarry-highline.json";
import { checkNumber } from "../../../physics/check-number";
import { parseRigInput } from "../../../physics/parse-rig-input";
import { RigInputError, SolveError } from "../../../physics";
import { refusalOf } from "./fixtures";

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

// parseRigInput turns the schema's first problem into the engine's refusal: the field's path, the value found there,
// and what the field takes in words (the product's own), or the schema's own sentence where it has one.
describe("parseRigInput's refusals", () => {
  const example = () => structuredClone(rigExample) as Record<string, unknown>;
  const refusal = (input: unknown) => refusalOf(() => parseRigInput(input));

  it("names the whole input when it is not a group of fields", () => {
    expect(refusal(null)).toMatchObject({ field: "(the whole input)", given: "null", allowed: "its fields, given together as one group" });
    expect(refusal([1, 2])).toMatchObject({ field: "(the whole input)", allowed: "its fields, given together as one group" });
  });

  it("says what a field of the wrong type takes, by its type, with the value found there", () => {
    // Every number and yes-or-no field of today's schema has words of its own: groups, lists and text show the mapping.
    const cases: [string, (rig: Record<string, unknown>) => void, string, string, string][] = [
      ["a group", (r) => (r.walker = 5), "walker", "5", "its fields, given together as one group"],
      ["a list", (r) => (r.slipBench = "flat"), "slipBench", '"flat"', "a list of entries"],
      ["text", (r) => (r.name = 12), "name", "12", "text"],
      ["a field's own words", (r) => (r.spanM = "120"), "spanM", '"120"', "a horizontal span > 0 m and ≤ 3000 m"],
    ];
    for (const [, change, field, given, allowed] of cases) {
      const rig = example();
      change(rig);
      expect(refusal(rig)).toMatchObject({ field, given, allowed });
    }
  });

  it("gives a missing field as nothing, and passes a field's own rule through", () => {
    const rig = example();
    delete rig.spanM;
    expect(refusal(rig)).toMatchObject({ field: "spanM", given: "nothing", allowed: "a horizontal span > 0 m and ≤ 3000 m" });
    const negative = example();
    negative.spanM = -5;
    const error = refusal(negative);
    expect(error.field).toBe("spanM");
    expect(error.given).toBe("-5");
    expect(error.allowed).not.toMatch(/^Invalid input/);
    // A value under a path through something that is not a group: nothing is found there.
    const deep = example();
    (deep.anchors as Record<string, unknown>).a = 7;
    expect(refusal(deep)).toMatchObject({ field: "anchors.a", given: "7" });
  });
});
