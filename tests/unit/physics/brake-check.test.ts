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

// Every field and sentence of each of the four outcomes, on the same invented bench (figures worked by hand above;
// the sentences are the product's own words, in the crew's units: 1 lbf = 4.448 221 615 260 5 N, NIST SP 811).
describe("checkBrake, field by field", () => {
  it("a measured slip that holds: every figure, and the sentence", () => {
    expect(checkBrake("Demo cam", 11, bench, 9000, 6, 1.5)).toEqual({
      verdict: "holds",
      minimumMargin: 1.5,
      brakeForce: 1500,
      governingLoad: 3900,
      lowerBoundOnly: false,
      margin: 2.6,
      highestLineTensionHeld: 23400,
      resultsUsed: 3,
      message: "Demo cam on 11 mm holds: 1.50 kN at the brake against a lowest measured slip of 3.90 kN (margin 2.60).",
    });
    expect(checkBrake("Demo cam", 11, bench, 9000, 6, 3).message).toBe(
      "Demo cam on 11 mm holds: 1.50 kN at the brake against a lowest measured slip of 3.90 kN (margin 2.60, below the crew's minimum of 3).",
    );
  });

  it("a measured slip reached: slips, with the margin and the highest tension held still stated", () => {
    const c = checkBrake("Demo cam", 11, bench, 24000, 6, 1.5);
    expect(c).toMatchObject({ verdict: "slips", brakeForce: 4000, governingLoad: 3900, lowerBoundOnly: false, highestLineTensionHeld: 23400 });
    expect(c.margin).toBeCloseTo(0.975, 12);
    expect(c.message).toBe("Demo cam on 11 mm slips: 4.00 kN at the brake reaches its lowest measured slip of 3.90 kN.");
  });

  it("held to a load and within it: a lower bound, in the crew's units", () => {
    expect(checkBrake("Demo cam", 10, bench, 12000, 6, 1.5, "us")).toEqual({
      verdict: "holds",
      minimumMargin: 1.5,
      brakeForce: 2000,
      governingLoad: 3000,
      lowerBoundOnly: true,
      margin: 1.5,
      highestLineTensionHeld: 18000,
      resultsUsed: 1,
      // 2000 N = 449.6 lbf, up to 450; 3000 N = 674.4 lbf, down to 674.
      message:
        "Demo cam on 10 mm held to 674 lbf on the bench without slipping; 450 lbf at the brake is within that (margin at least 1.50; the slip load itself was never measured).",
    });
    // At the held-to load itself (3000 N at the brake) it is still within what the bench showed.
    expect(checkBrake("Demo cam", 10, bench, 18000, 6, 1).verdict).toBe("holds");
    expect(checkBrake("Demo cam", 10, bench, 12000, 6, 2).message).toBe(
      "Demo cam on 10 mm held to 3.00 kN on the bench without slipping; 2.00 kN at the brake is within that (margin at least 1.50, below the crew's minimum of 2; the slip load itself was never measured).",
    );
  });

  it("held to a load and beyond it: untested, with what the bench showed", () => {
    expect(checkBrake("Demo cam", 10, bench, 24000, 6, 1.5)).toEqual({
      verdict: "untested",
      minimumMargin: 1.5,
      brakeForce: 4000,
      governingLoad: 3000,
      lowerBoundOnly: true,
      margin: 0.75,
      highestLineTensionHeld: 18000,
      resultsUsed: 1,
      message: "Demo cam on 10 mm was only tested to 3.00 kN; 4.00 kN at the brake is beyond anything the bench has shown.",
    });
  });

  it("no results for the rope: untested, with no figures", () => {
    expect(checkBrake("Demo cam", 12, bench, 9000, 6, 1.5)).toEqual({
      verdict: "untested",
      minimumMargin: 1.5,
      brakeForce: 1500,
      governingLoad: null,
      lowerBoundOnly: false,
      margin: null,
      highestLineTensionHeld: null,
      resultsUsed: 0,
      message: "Demo cam has no slip results on 12 mm rope: untested for this rope.",
    });
  });

  it("matches a device by name whatever its case and spaces, and a diameter to the tenth of a millimetre", () => {
    expect(checkBrake("  DEMO CAM", 11.04, bench, 9000, 6, 1.5).resultsUsed).toBe(3);
    expect(checkBrake("Demo cam", 10.96, bench, 9000, 6, 1.5).resultsUsed).toBe(3);
    expect(checkBrake("Demo cam", 11.06, bench, 9000, 6, 1.5).resultsUsed).toBe(0);
    expect(checkBrake("Demo cam", 10.94, bench, 9000, 6, 1.5).resultsUsed).toBe(0);
    expect(checkBrake("Demo cam", 10.04, bench, 9000, 6, 1.5).resultsUsed).toBe(1);
    expect(checkBrake("Demo cams", 11, bench, 9000, 6, 1.5).resultsUsed).toBe(0);
    // The highest held-to result counts, not the first: held to 3000 and to 3500 on 10 mm.
    const more: SlipResult[] = [...bench, { device: "Demo cam", ropeDiameterMm: 10, result: "held", forceN: 3500 }];
    expect(checkBrake("Demo cam", 10, more, 12000, 6, 1.5).governingLoad).toBe(3500);
  });
});
