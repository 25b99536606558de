import { describe, expect, it } from "vitest";
import { checkBrake, type SlipResult } from "../../../physics";

// Invented bench data for an invented device. The rules checked here are the product's definition
// of the brake check (force at the brake = line tension / ideal MA between brake and line; margin =
// lowest slip / that force; a held-to result is only a lower bound): common practice, no source.
// The figures are worked by hand: 9000 N / 6 = 1500 N; 3900 / 1500 = 2.6; 3900 × 6 = 23 400 N.
const bench: SlipResult[] = [
  { device: "Demo cam", ropeDiameterMm: 11, result: "slipped", forceN: 4200 },
  { device: "Demo cam", ropeDiameterMm: 11, result: "slipped", forceN: 3900 },
  { device: "Demo cam", ropeDiameterMm: 11, result: "held", forceN: 5000 },
  { device: "Demo cam", ropeDiameterMm: 10, result: "held", forceN: 3000 },
];

describe("checkBrake", () => {
  it("holds with a margin over the lowest measured slip, and states the highest line tension held", () => {
    const c = checkBrake("Demo cam", 11, bench, 9000, 6, 1.5);
    expect(c.verdict).toBe("holds");
    expect(c.brakeForce).toBe(1500);
    expect(c.governingLoad).toBe(3900);
    expect(c.margin).toBeCloseTo(2.6, 12);
    expect(c.highestLineTensionHeld).toBe(23400);
  });

  it("slips at or above the lowest slip load, whatever a held-to result says", () => {
    expect(checkBrake("Demo cam", 11, bench, 3900 * 6, 6, 1.5).verdict).toBe("slips");
  });

  it("treats held-to results only as a lower bound, never as a slip load", () => {
    const within = checkBrake("demo cam ", 10, bench, 12000, 6, 1.5);
    expect(within.verdict).toBe("holds");
    expect(within.lowerBoundOnly).toBe(true);
    const beyond = checkBrake("Demo cam", 10, bench, 24000, 6, 1.5);
    expect(beyond.verdict).toBe("untested");
  });

  it("holds but below the crew's minimum margin gets its own verdict, for a measured slip and for a held-to bound", () => {
    // 3900 / 1500 = 2.6 < 3; held to 3000 / (12000 / 6) = 1.5 < 2
    const thin = checkBrake("Demo cam", 11, bench, 9000, 6, 3);
    expect(thin.verdict).toBe("holds_below_margin");
    expect(thin.minimumMargin).toBe(3);
    expect(thin.message).toMatch(/below the crew's minimum of 3/);
    expect(checkBrake("Demo cam", 10, bench, 12000, 6, 2).verdict).toBe("holds_below_margin");
    // a margin equal to the minimum meets it
    expect(checkBrake("Demo cam", 11, bench, 9000, 6, 2.6).verdict).toBe("holds");
    // slipping stays slipping, whatever the minimum
    expect(checkBrake("Demo cam", 11, bench, 3900 * 6, 6, 3).verdict).toBe("slips");
  });

  it("is untested for a rope diameter with no results", () => {
    const c = checkBrake("Demo cam", 12, bench, 9000, 6, 1.5);
    expect(c.verdict).toBe("untested");
    expect(c.margin).toBeNull();
    expect(c.message).toMatch(/untested/);
  });
});
