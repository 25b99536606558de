import { describe, expect, it } from "vitest";
import { DEFAULT_MINIMUM_FACTORS, safetyFactors } from "../../../physics";

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
