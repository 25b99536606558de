import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { checkBrake, createStretchCurve, evaluateRig, strainAt, tensionAtStrain, type RigInput } from "../../../physics";
import { refusalOf, STRETCHY } from "./fixtures";

// The edges of what the engine takes: a value exactly at a stated limit is taken (the refusal says "at most" or "≤"),
// a refusal names the value as it was given and the field as the form has it, and a stretch curve is one piece per
// pair of measured points and nothing more.

const plain = JSON.parse(readFileSync(new URL("../../../physics/examples/quarry-highline.json", import.meta.url), "utf8")) as RigInput;

describe("evaluateRig at its stated limits", () => {
  it("takes a leash and a harness height that make a free fall of exactly 100 m, the most it allows", () => {
    // The refusal past it reads "a free fall of at most 100 m" (evaluate-rig-words.test.ts): 99 m + 1 m is that fall.
    const r = evaluateRig({ ...plain, leashFall: { leashLengthM: 99, harnessHeightM: 1, hangBelowTieInM: 1.2 } });
    expect(r.leashFall.fallHeightM).toBe(100);
  });

  it.each([20, -20])("takes a height difference as large as the span (%d m over 20 m): the refusal allows |h| ≤ span", (heightDifferenceM) => {
    const r = evaluateRig({ ...plain, spanM: 20, heightDifferenceM });
    // The chord of a 45° line: √(20² + 20²) m (Pythagoras).
    expect(r.line.chordM).toBeCloseTo(20 * Math.SQRT2, 12);
  });

  it("names the walker's position as given when a walker at an anchor leaves the leash fall nowhere to be", () => {
    const at = (walker: RigInput["walker"]) => refusalOf(() => evaluateRig({ ...plain, walker }));
    expect(at({ massKg: 75, positionM: 120 })).toMatchObject({ field: "walker.positionM", given: "120" });
    expect(at({ massKg: 75, positionM: 0 })).toMatchObject({ field: "walker.positionM", given: "0" });
    expect(at({ massKg: 75, positionFraction: 1 })).toMatchObject({ field: "walker.positionFraction", given: "1" });
  });
});

describe("the mainline's stretch points, refused under the form's field", () => {
  // The schema takes any list of two or more points of numbers ≥ 0; the curve itself refuses the rest, under the
  // mainline's own field name (the backup's is backup.stretchPoints), so the form can point at the right table.
  const withPoints = (stretchPoints: { tensionKN: number; elongationPct: number }[]): RigInput => ({
    ...plain,
    mainline: { ...plain.mainline, stretchPoints },
  });

  it("a curve that does not start at the origin", () => {
    const refusal = refusalOf(() =>
      evaluateRig(
        withPoints([
          { tensionKN: 0, elongationPct: 0.5 },
          { tensionKN: 2, elongationPct: 1.5 },
        ]),
      ),
    );
    expect(refusal).toMatchObject({ field: "mainline.stretchPoints.0", allowed: "the curve starts at the origin: 0 kN, 0 %" });
  });

  it("a tension that does not rise", () => {
    const refusal = refusalOf(() =>
      evaluateRig(
        withPoints([
          { tensionKN: 0, elongationPct: 0 },
          { tensionKN: 4, elongationPct: 2 },
          { tensionKN: 3, elongationPct: 3 },
        ]),
      ),
    );
    expect(refusal).toMatchObject({ field: "mainline.stretchPoints.2.tensionKN", given: "3" });
  });
});

describe("a stretch curve's pieces", () => {
  it("holds one slope and one intercept for each pair of neighbouring points, and no more (worked by hand)", () => {
    // 0–1 kN to 1.5 %: 1.5e-5 /N; 1–3 kN to 3.4 %: 0.019 / 2000 N = 9.5e-6 /N, intercept 0.015 − 9.5e-6 × 1000 = 0.0055.
    const curve = createStretchCurve([
      { tensionKN: 0, elongationPct: 0 },
      { tensionKN: 1, elongationPct: 1.5 },
      { tensionKN: 3, elongationPct: 3.4 },
    ]);
    expect(curve.slopes).toHaveLength(2);
    expect(curve.intercepts).toHaveLength(2);
    expect(curve.slopes[0]).toBeCloseTo(1.5e-5, 18);
    expect(curve.slopes[1]).toBeCloseTo(9.5e-6, 18);
    expect(curve.intercepts[1]).toBeCloseTo(0.0055, 15);
  });

  it("inverts strain to tension below zero too, on the first piece carried on, as strainAt reads it there", () => {
    // STRETCHY's first piece: 1.5 % at 1 kN, 1.5e-5 per N (hand calculation), carried on below 0 N by pieceAt.
    const curve = createStretchCurve(STRETCHY);
    for (const tension of [-500, -2000]) {
      expect(strainAt(curve, tension)).toBeCloseTo(1.5e-5 * tension, 15);
      expect(tensionAtStrain(curve, 1.5e-5 * tension)).toBeCloseTo(tension, 8);
    }
  });
});

describe("the slip bench's device names", () => {
  it("counts a bench result whose device name was typed with spaces around it", () => {
    // One slip at 3900 N; 9000 N on a 6:1 puts 1500 N at the brake: margin 3900 / 1500 = 2.6 (hand calculation).
    const bench = [{ device: "  Demo cam ", ropeDiameterMm: 11, result: "slipped" as const, forceN: 3900 }];
    const check = checkBrake("Demo cam", 11, bench, 9000, 6, 1.5);
    expect(check).toMatchObject({ resultsUsed: 1, verdict: "holds", governingLoad: 3900 });
    expect(check.margin).toBeCloseTo(2.6, 12);
  });
});
