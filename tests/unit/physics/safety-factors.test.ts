import { describe, expect, it } from "vitest";
import { DEFAULT_MINIMUM_FACTORS, safetyFactors } from "../../../physics";

// Safety factor = MBS / peak load (the definition used in rigging practice); the crew's default
// minimum of 3 is common practice, no source. Figures worked by hand: 60 000 / 12 000 = 5; 29 990 / 10 000 = 2.999.
describe("safetyFactors", () => {
  it("divides MBS by peak load, compares with the crew minimum and never rounds a failing factor up", () => {
    const [pass, fail] = safetyFactors(
      [
        { name: "demo sling", category: "sling", location: "a", mbs: 60000, peakLoad: 12000 },
        { name: "demo shackle", category: "connector", location: "b", mbs: 29990, peakLoad: 10000 },
      ],
      DEFAULT_MINIMUM_FACTORS,
    );
    expect(pass.factor).toBe(5);
    expect(pass.passes).toBe(true);
    expect(fail.factor).toBeCloseTo(2.999, 12);
    expect(fail.shown).toBe("2.99");
    expect(fail.passes).toBe(false);
  });
});

describe("safetyFactors against each category's minimum", () => {
  it("passes a factor that is the minimum, fails one a step below, and keeps each component's own fields", () => {
    const minimums = { webbing: 5, connector: 2, sling: 3, anchor: 4, other: 10 };
    const results = safetyFactors(
      [
        { name: "exactly three", category: "sling", location: "line", mbs: 30000, peakLoad: 10000 },
        // 3 − 2ε reads as 3.00, so it passes as it reads (hand-worked: 12 significant digits).
        { name: "a hair under three", category: "sling", location: "a", mbs: 3 - 2 * Number.EPSILON, peakLoad: 1 },
        { name: "two point nine nine", category: "sling", location: "b", mbs: 29900, peakLoad: 10000 },
        { name: "webbing at four", category: "webbing", location: "line", mbs: 40000, peakLoad: 10000 },
        { name: "connector at four", category: "connector", location: "backup", mbs: 40000, peakLoad: 10000 },
        { name: "anchor at four", category: "anchor", location: "a", mbs: 40000, peakLoad: 10000 },
        { name: "other at four", category: "other", location: "b", mbs: 40000, peakLoad: 10000 },
      ],
      minimums,
    );
    expect(results.map((r) => [r.name, r.minimum, r.passes, r.shown])).toEqual([
      ["exactly three", 3, true, "3.00"],
      ["a hair under three", 3, true, "3.00"],
      ["two point nine nine", 3, false, "2.99"],
      ["webbing at four", 5, false, "4.00"],
      ["connector at four", 2, true, "4.00"],
      ["anchor at four", 4, true, "4.00"],
      ["other at four", 10, false, "4.00"],
    ]);
    expect(results[0]).toEqual({
      name: "exactly three",
      category: "sling",
      location: "line",
      mbs: 30000,
      peakLoad: 10000,
      factor: 3,
      shown: "3.00",
      minimum: 3,
      passes: true,
    });
    expect(DEFAULT_MINIMUM_FACTORS).toEqual({ webbing: 3, connector: 3, sling: 3, anchor: 3, other: 3 });
  });
});
