import { describe, expect, it } from "vitest";
import example from "@/physics/examples/quarry-highline.json";
import { anchorLoads, anchorWarnings, evaluateRig, RigInputError } from "../../../physics";

describe("anchorLoads", () => {
  it.each([
    // sling-angle tables of rigging practice: load on each leg as a share of the line tension
    [120, 1.0],
    [90, 0.7071],
    [60, 0.5774],
    [0, 0.5],
  ])("a %s° bridle puts %s of the load on each leg (sling-angle tables)", (angle, share) => {
    const loads = anchorLoads({ kind: "bridle", includedAngleDeg: angle }, 10000);
    expect(loads.leg / 10000).toBeCloseTo(share, 4);
    expect(loads.masterPoint).toBe(10000);
    expect(loads.legs).toBe(2);
  });

  it("a single point carries the line tension", () => {
    expect(anchorLoads({ kind: "single" }, 8000)).toEqual({ masterPoint: 8000, leg: 8000, legs: 1 });
  });

  it("rejects an angle of 180° or more", () => {
    expect(() => anchorLoads({ kind: "bridle", includedAngleDeg: 180 }, 1)).toThrow(RigInputError);
  });
});

// Leg load of a symmetric two-leg bridle: F / (2 cos(α/2)) (statics, resolving the master point's forces).
describe("anchor warnings", () => {
  const loadsAt = (angle: number) => anchorLoads({ kind: "bridle", includedAngleDeg: angle }, 10_000);
  it("says nothing of a bridle up to 90°, where each leg takes 0.71 of the line tension", () => {
    expect(loadsAt(90).leg / 10_000).toBeCloseTo(1 / Math.SQRT2, 12);
    expect(anchorWarnings("a", { kind: "bridle", includedAngleDeg: 90 }, 2, loadsAt(90), "si")).toEqual([]);
  });
  it("cautions past 90°, with the load on each leg (100°: 10 kN / (2 cos 50°) = 7.78 kN, 78 %, hand-worked)", () => {
    const [warning] = anchorWarnings("b", { kind: "bridle", includedAngleDeg: 100 }, 2, loadsAt(100), "si");
    expect(warning).toBe(
      "Anchor b: a bridle angle of 100° puts 7.78 kN on each leg (78 % of the line tension); past 90° the load on each leg climbs steeply, to the whole line tension at 120°.",
    );
  });
  it("warns past 120°, where each leg takes more than the line tension (150°: 10 kN / (2 cos 75°) = 19.32 kN, hand-worked)", () => {
    const [warning] = anchorWarnings("a", { kind: "bridle", includedAngleDeg: 150 }, 2, loadsAt(150), "us");
    // 19 318.5 N ÷ 4.448 221 615 260 5 N/lbf = 4342.99 lbf, rounded up (NIST SP 811).
    expect(warning).toBe("Anchor a: a bridle angle of 150° puts more than the line tension on each leg, 4343 lbf on each leg (194 % of the line tension).");
  });
  it("warns of an anchor with no component in its load path", () => {
    const warnings = anchorWarnings("a", { kind: "single" }, 0, anchorLoads({ kind: "single" }, 10_000), "si");
    expect(warnings).toHaveLength(1);
    expect(warnings[0]).toMatch(/^Anchor a has no component in its load path/);
  });
  it("reaches the engine's warnings", () => {
    const bare = structuredClone(example) as typeof example;
    (bare.anchors.b as { components: unknown[] }).components = [];
    expect(evaluateRig(bare).warnings.some((w) => w.startsWith("Anchor b has no component in its load path"))).toBe(true);
  });
});

describe("a bridle's angle at the edges (the product's own limits, common practice, no source)", () => {
  it("takes 0° up to just under 180°, refuses a negative angle and 180°, naming the anchor's field", () => {
    expect(anchorLoads({ kind: "bridle", includedAngleDeg: 0 }, 1000).leg).toBeCloseTo(500, 9);
    expect(anchorLoads({ kind: "bridle", includedAngleDeg: 179 }, 1000).leg).toBeCloseTo(1000 / (2 * Math.cos((89.5 * Math.PI) / 180)), 6);
    for (const angle of [-1, 180, Number.NaN]) {
      expect(() => anchorLoads({ kind: "bridle", includedAngleDeg: angle }, 1000, "anchors.b")).toThrow(
        expect.objectContaining({ field: "anchors.b.includedAngleDeg", allowed: "an included angle ≥ 0° and < 180°" }),
      );
    }
    expect(() => anchorLoads({ kind: "bridle", includedAngleDeg: -1 }, 1000)).toThrow(expect.objectContaining({ field: "anchor.includedAngleDeg" }));
  });

  it("at 120° exactly each leg takes the whole line tension: cautioned, not yet warned of more than it", () => {
    const loads = anchorLoads({ kind: "bridle", includedAngleDeg: 120 }, 10_000);
    expect(anchorWarnings("a", { kind: "bridle", includedAngleDeg: 120 }, 1, loads, "si")).toEqual([
      "Anchor a: a bridle angle of 120° puts 10.00 kN on each leg (100 % of the line tension); past 90° the load on each leg climbs steeply, to the whole line tension at 120°.",
    ]);
  });

  it("says both when a wide bridle has nothing in its load path, the load path first", () => {
    const warnings = anchorWarnings("b", { kind: "bridle", includedAngleDeg: 91 }, 0, anchorLoads({ kind: "bridle", includedAngleDeg: 91 }, 10_000), "si");
    expect(warnings).toEqual([
      "Anchor b has no component in its load path: nothing there is checked against its MBS. Add the slings, shackles, master point and anchor points it is rigged with.",
      // 10 kN / (2 cos 45.5°) = 7.1337 kN, 71.34 % (hand-worked), both rounded up.
      "Anchor b: a bridle angle of 91° puts 7.14 kN on each leg (72 % of the line tension); past 90° the load on each leg climbs steeply, to the whole line tension at 120°.",
    ]);
    expect(anchorWarnings("b", { kind: "single" }, 1, anchorLoads({ kind: "single" }, 10_000), "si")).toEqual([]);
  });
});
