import { describe, expect, it } from "vitest";
import { leashFallPeak, lengthForPretension, lineForceDeflection, RigInputError, solveLine, STANDARD_GRAVITY } from "../../../physics";
import { demoLine, MBS, relative, STRETCHY } from "./fixtures";

describe("leashFallPeak", () => {
  it("on a linear spring gives F = mg(1 + √(1 + 2kh/(mg))) (dynamics texts, mass dropped onto a spring) within 0.1 %", () => {
    for (const [m, h, k] of [[80, 2, 2000], [60, 0.5, 15000], [100, 3, 600]]) {
      const peak = leashFallPeak(m, h, (u) => k * u);
      const mg = m * STANDARD_GRAVITY;
      expect(relative(peak.peakLoad, mg * (1 + Math.sqrt(1 + (2 * k * h) / mg)))).toBeLessThan(1e-3);
      // energy balanced at the peak
      expect(relative(peak.energyStored, peak.energyIn)).toBeLessThan(1e-9);
    }
  });

  it("with no free fall the peak is twice the static load (suddenly applied load)", () => {
    const peak = leashFallPeak(70, 0, (u) => 3000 * u);
    expect(relative(peak.peakLoad, 2 * 70 * STANDARD_GRAVITY)).toBeLessThan(1e-9);
  });

  it("rejects a mass ≤ 0 and a negative fall", () => {
    expect(() => leashFallPeak(0, 1, (u) => u)).toThrow(RigInputError);
    expect(() => leashFallPeak(70, -1, (u) => u)).toThrow(RigInputError);
  });
});

describe("lineForceDeflection", () => {
  it("is the load whose static solve deflects the line by u below its unloaded shape", () => {
    const line = demoLine(60, 1, 0.06, STRETCHY);
    const length = lengthForPretension(line, 2500, "a", MBS).variables.length;
    const P = lineForceDeflection(line, length, 20, MBS);
    const unloaded = solveLine(line, length, { force: 0, x: 20 }, MBS);
    for (const u of [0.3, 1.5, 3]) {
      const loaded = solveLine(line, length, { force: P(u), x: 20 }, MBS);
      expect(unloaded.loadY - loaded.loadY).toBeCloseTo(u, 8);
    }
    expect(P(0)).toBe(0);
  });
});
