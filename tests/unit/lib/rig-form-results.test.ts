import { describe, expect, it } from "vitest";
import example from "@/physics/examples/quarry-highline.json";
import { evaluateRig, RigInputSchema } from "@/physics";
import { compareResults, judgeAgreement } from "@/lib/rig-form/compare-results";
import { startingRig } from "@/lib/rig-form/starting-rig";
import { engineMinimums } from "@/lib/gear-categories";
import { verticalExaggeration } from "@/lib/rig-form/exaggeration";

describe("comparing the browser's result with the server's", () => {
  it("finds nothing between a result and its own JSON round trip", () => {
    const result = evaluateRig(example);
    expect(compareResults(JSON.parse(JSON.stringify(result)), JSON.parse(JSON.stringify(result)))).toEqual([]);
  });

  it("names every figure that differs, even by one bit, and keys that are missing", () => {
    const a = { anchors: { a: { leg: 4221.5 } }, warnings: ["x"], engineVersion: "1.0.0" };
    const b = { anchors: { a: { leg: 4221.500000000001 } }, warnings: [], engineVersion: "1.0.0", extra: 1 };
    expect(compareResults(a, b)).toEqual([
      { path: "anchors.a.leg", browser: 4221.5, server: 4221.500000000001 },
      { path: "warnings.0", browser: "x", server: undefined },
      { path: "extra", browser: undefined, server: 1 },
    ]);
  });
});

describe("the starting rig", () => {
  it("is the worked example, valid for the shared schema, with the crew's minimums", () => {
    const crew = { webbing: 4, rope: 3, anchor: 5, connector: 3.5, sling: 3, pulley: 6, brake: 2 };
    const rig = startingRig(crew, 3.5);
    expect(RigInputSchema.safeParse(rig).success).toBe(true);
    expect(rig.spanM).toBe(example.spanM);
    expect(rig.minimumSafetyFactors).toEqual({ webbing: 4, connector: 3.5, sling: 3, anchor: 5, other: 6 });
    // The brake's margin is the crew's minimum for brakes; the clearance below a fall is its own setting.
    expect(rig.minimumBrakeMargin).toBe(2);
    expect(rig.minimumClearanceM).toBe(3.5);
  });

  it("falls back to the engine's default for a minimum the crew has not set", () => {
    // The engine's default minimum factor of 3 is common practice, no source.
    expect(engineMinimums({ webbing: 4 })).toEqual({ webbing: 4, connector: 3, sling: 3, anchor: 3, other: 3 });
  });
});

describe("vertical exaggeration of the side view", () => {
  it("picks the largest of 1, 2, 5 × 10^k that fits, exaggerating a shallow sag and compressing a deep gorge", () => {
    // 120 m span on 600 px: 5 px/m; a 6 m drop in 180 px fits ×6 → ×5.
    expect(verticalExaggeration(6, 5, 180)).toBe(5);
    expect(verticalExaggeration(0.5, 5, 180)).toBe(50);
    expect(verticalExaggeration(36, 5, 180)).toBe(1);
    // A deep gorge under the line is compressed to fit: 180 px / (100 m × 5 px/m) = 0.36 → 0.2.
    expect(verticalExaggeration(100, 5, 180)).toBe(0.2);
    expect(verticalExaggeration(0, 5, 180)).toBe(1);
  });
});

describe("judging agreement between browser and server", () => {
  it("is exact for identical results", () => {
    const result = JSON.parse(JSON.stringify(evaluateRig(example)));
    expect(judgeAgreement(result, structuredClone(result))).toEqual({ exact: true, agrees: true, largestRelative: 0, disagreements: [] });
  });

  it("agrees when figures differ only in the last bits, and not beyond a billionth", () => {
    const near = judgeAgreement({ t: 3631.876360241112, iterations: 7 }, { t: 3631.876360240882, iterations: 8 });
    expect(near.exact).toBe(false);
    expect(near.agrees).toBe(true);
    expect(near.largestRelative).toBeCloseTo(6.3e-14, 15);
    // The sag with the walker at an anchor is zero up to solver noise, of either sign.
    expect(judgeAgreement({ sag: 4.13e-14 }, { sag: -4.71e-14 }).agrees).toBe(true);
    const far = judgeAgreement({ t: 3631.88, verdict: "holds" }, { t: 3631.87, verdict: "slips" });
    expect(far.agrees).toBe(false);
    expect(far.disagreements.map((d) => d.path)).toEqual(["t", "verdict"]);
  });
});
