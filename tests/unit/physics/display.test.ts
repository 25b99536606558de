import { describe, expect, it } from "vitest";
import { capacityText, factorText, figureDigits, lengthText, loadText, roundTowards } from "../../../physics/display";

// The project's rule for shown figures (design brief: a failing factor is never rounded up; loads up, capacities
// down); the cases are worked by hand. 1 lbf = 4.448 221 615 260 5 N and 1 ft = 0.3048 m exactly (NIST SP 811, appendix B).
describe("one way to show a figure", () => {
  it("rounds a load up and cuts a capacity or factor down, so 2.999 never reads as 3.00", () => {
    expect(roundTowards(3.891, 2, "up")).toBe(3.9);
    expect(factorText(2.999)).toBe("2.99");
    expect(factorText(3.17999)).toBe("3.17");
    expect(factorText(2.9999999, 1)).toBe("2.9");
  });

  it("takes a value one binary step off a decimal as that decimal", () => {
    // 1150 / 1000 × 100 is 114.99999999999999 in binary floating point, 2450 / 1000 × 100 is 245.00000000000003:
    // hand-worked, 1150 N is 1.15 kN and 2450 N is 2.45 kN exactly, whichever way they are rounded.
    expect(loadText(1150, "si")).toBe("1.15 kN");
    expect(capacityText(1150, "si")).toBe("1.15 kN");
    expect(loadText(2450, "si")).toBe("2.45 kN");
    expect(capacityText(2450, "si")).toBe("2.45 kN");
    // 3 − 2ε is 3 read to 12 digits: the safety factor check reads it the same way (tests/unit/lib/one-voice.test.ts).
    expect(factorText(3 - Number.EPSILON * 2)).toBe("3.00");
  });

  it("never shows a minus zero", () => {
    expect(figureDigits(-0.001, "m", "nearest")).toBe("0.00");
    expect(lengthText(-0.001, "us", "up")).toBe("0.0 ft");
  });
});
