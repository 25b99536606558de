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
