import { describe, expect, it } from "vitest";
import {
  atTwelveDigits,
  capacityDigits,
  capacityText,
  changeText,
  decimalsOf,
  factorText,
  figureDigits,
  figureText,
  fixedDigits,
  forceIn,
  forceText,
  forceUnitOf,
  lengthText,
  lengthUnitOf,
  loadText,
  roundTowards,
} from "../../../physics/display";

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

// Every helper of physics/display.ts, each on a case worked by hand from the conversion factors of NIST SP 811
// (1 lbf = 4.448 221 615 260 5 N, 1 kgf = 9.806 65 N, 1 ft = 0.3048 m) and the decimals the module gives each unit.
describe("each way a figure is shown", () => {
  it("gives each unit its decimals, and two to a unit without its own", () => {
    const expected = { N: 0, kN: 2, lbf: 0, kgf: 0, m: 2, ft: 1, kg: 1, lb: 0, "oz/ft": 2, "%": 0, furlong: 2, "": 2 };
    for (const [unit, decimals] of Object.entries(expected)) expect(decimalsOf(unit), unit).toBe(decimals);
  });

  it("rounds up, down and to the nearest step, at the step itself and on either side", () => {
    expect(roundTowards(3.891, 2, "down")).toBe(3.89);
    expect(roundTowards(3.891, 2, "nearest")).toBe(3.89);
    expect(roundTowards(3.899, 2, "nearest")).toBe(3.9);
    expect(roundTowards(3.89, 2, "up")).toBe(3.89);
    expect(roundTowards(3.89, 2, "down")).toBe(3.89);
    // 3.895 × 100 is 389.49999999999994 in binary; read to 12 digits it is the half step, which goes up.
    expect(roundTowards(3.895, 2, "nearest")).toBe(3.9);
    expect(roundTowards(-1.234, 1, "up")).toBe(-1.2);
    expect(roundTowards(-1.234, 1, "down")).toBe(-1.3);
    expect(roundTowards(1234.5, 0, "down")).toBe(1234);
    expect(atTwelveDigits(114.99999999999999)).toBe(115);
    expect(atTwelveDigits(0.1234567890123)).toBe(0.123456789012);
  });

  it("writes digits to the unit's decimals, a unit after them, and nothing after a plain number", () => {
    expect(fixedDigits(2.5, 2, "nearest")).toBe("2.50");
    expect(fixedDigits(-0.004, 2, "up")).toBe("0.00");
    expect(fixedDigits(-0.006, 2, "nearest")).toBe("-0.01");
    expect(figureDigits(12.345, "kN", "up")).toBe("12.35");
    expect(figureDigits(12.345, "N", "down")).toBe("12");
    expect(figureText(4.391, "kN", "up")).toBe("4.40 kN");
    expect(figureText(2.5, "", "nearest")).toBe("2.50");
  });

  it("reads forces in kN or lbf and lengths in m or ft by the crew's units", () => {
    expect(forceUnitOf("si")).toBe("kN");
    expect(forceUnitOf("us")).toBe("lbf");
    expect(lengthUnitOf("si")).toBe("m");
    expect(lengthUnitOf("us")).toBe("ft");
  });

  it("converts a force to the unit asked, at that unit's precision and in the direction asked", () => {
    expect(forceIn(4448.2216152605, "lbf", "nearest")).toBe(1000);
    expect(forceIn(1234.5, "kN", "up")).toBe(1.24);
    expect(forceIn(1234.5, "kN", "down")).toBe(1.23);
    expect(forceIn(1234.5, "N", "nearest")).toBe(1235);
    expect(forceText(9806.65, "kgf", "down")).toBe("1000 kgf");
    expect(forceText(1234.5, "N", "up")).toBe("1235 N");
    // 1150 N is 258.53… lbf: a load reads 259 lbf, a capacity 258 lbf.
    expect(loadText(1150, "us")).toBe("259 lbf");
    expect(capacityText(1150, "us")).toBe("258 lbf");
    expect(capacityDigits(1150, "us")).toBe("258");
    expect(capacityDigits(1159, "si")).toBe("1.15");
    expect(loadText(1151, "si")).toBe("1.16 kN");
  });

  it("reads a length in the crew's units in the direction asked: 10 m is 32.808… ft", () => {
    expect(lengthText(10, "us", "nearest")).toBe("32.8 ft");
    expect(lengthText(10, "us", "up")).toBe("32.9 ft");
    expect(lengthText(10, "us", "down")).toBe("32.8 ft");
    expect(lengthText(1.234, "si", "up")).toBe("1.24 m");
    expect(lengthText(1.236, "si", "down")).toBe("1.23 m");
  });

  it("signs a change in per cent, with no sign on zero", () => {
    expect(changeText(1.234)).toBe("+1.2 %");
    expect(changeText(-0.44)).toBe("-0.4 %");
    expect(changeText(0)).toBe("0.0 %");
    expect(changeText(0.04)).toBe("0.0 %");
    expect(changeText(0.06)).toBe("+0.1 %");
    expect(changeText(1.6, 0)).toBe("+2 %");
  });

  it("cuts a factor down to two decimals unless told otherwise", () => {
    expect(factorText(1.999)).toBe("1.99");
    expect(factorText(1.999, 0)).toBe("1");
    expect(factorText(12.3456, 3)).toBe("12.345");
  });
});
