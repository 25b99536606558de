import { readFileSync } from "node:fs";
import { beforeEach, describe, expect, it } from "vitest";
import { CAUTIONS, ENGINE_VERSION, evaluateRig, RigInputError, RigInputSchema, type RigResult } from "../../../physics";

const example = JSON.parse(readFileSync(new URL("../../../physics/examples/quarry-highline.json", import.meta.url), "utf8"));

function withChange(path: string, value: unknown) {
  const rig = structuredClone(example);
  const keys = path.split(".");
  let target = rig;
  for (const k of keys.slice(0, -1)) target = target[k];
  target[keys[keys.length - 1]] = value;
  return rig;
}

function hasNoBadNumber(value: unknown): boolean {
  if (typeof value === "number") return Number.isFinite(value);
  if (Array.isArray(value)) return value.every(hasNoBadNumber);
  if (value && typeof value === "object") return Object.values(value).every(hasNoBadNumber);
  return true;
}

describe("evaluateRig", () => {
  // Evaluated in each test, not once in the describe body, so mutation testing sees which tests run the engine.
  let result: RigResult;
  beforeEach(() => {
    result = evaluateRig(example);
  });

  it("returns every figure with the engine version, the cautions and plain JSON", () => {
    expect(result.engineVersion).toBe(ENGINE_VERSION);
    expect(result.cautions).toEqual(CAUTIONS);
    expect(result.sweep.points).toHaveLength(101);
    expect(result.leashFall.upperBound).toBe(true);
    expect(hasNoBadNumber(result)).toBe(true);
    expect(JSON.parse(JSON.stringify(result))).toEqual(result);
  });

  it("reproduces the stated pretension at the tensioning anchor with nobody on the line", () => {
    expect(result.unloaded.tensionBN).toBeCloseTo(example.pretension.forceN, 6);
  });

  it("the leash fall loads the line more than the walker standing on it", () => {
    expect(result.leashFall.peakLoadN).toBeGreaterThan(result.walker.loadN);
    expect(result.leashFall.peakAnchorLoadN).toBeGreaterThan(result.sweep.worstTensionB.tensionB);
    expect(Math.abs(result.leashFall.energyStoredJ - result.leashFall.energyInJ) / result.leashFall.energyInJ).toBeLessThan(1e-9);
  });

  it("checks every component in the load path against the crew minimum", () => {
    expect(result.safetyFactors.map((f) => f.name)).toHaveLength(5);
    const bridleLeg = result.safetyFactors.find((f) => f.category === "sling")!;
    expect(bridleLeg.peakLoad).toBeCloseTo(result.anchors.a.peakTensionN / (2 * Math.cos(Math.PI / 6)), 6);
  });

  it("exports one zod schema that accepts the example", () => {
    expect(RigInputSchema.safeParse(example).success).toBe(true);
  });

  it.each([
    ["spanM", 0],
    ["spanM", -5],
    ["spanM", 10000],
    ["spanM", "120"],
    ["spanM", null],
    ["walker.massKg", 0],
    ["mainline.massPerMetreKg", -0.01],
    ["pretension.forceN", 0],
    ["pretension.forceN", 32000],
    ["pretension.forceN", 50000],
    ["walker", { massKg: 75, positionM: 500 }, "walker.positionM"],
    ["heightDifferenceM", 200],
    // A leash fall at an anchor: the line cannot deflect there (statics: no sag at a support).
    ["walker.positionFraction", 0],
    ["walker.positionFraction", 1],
    ["leashFall.positionFraction", 1],
    ["mainline.stretchPoints", [{ tensionKN: 0, elongationPct: 0 }]],
    ["anchors.a.layout", { kind: "bridle", includedAngleDeg: 200 }, "anchors.a.layout.includedAngleDeg"],
    ["tensioning.sheaveEfficiency", 1.5],
    ["leashFall.hangBelowTieInM", -0.1],
    ["leashFall.hangBelowTieInM", 6],
    ["minimumClearanceM", -1],
    ["minimumBrakeMargin", Infinity],
    ["mainline.stretchPoints", Array.from({ length: 51 }, (_, i) => ({ tensionKN: i, elongationPct: i / 10 }))],
  ] as [string, unknown, string?][])("rejects %s = %j with a typed error naming the field", (path, value, field = path) => {
    let error: unknown;
    try {
      evaluateRig(withChange(path, value));
    } catch (e) {
      error = e;
    }
    expect(error).toBeInstanceOf(RigInputError);
    const e = error as RigInputError;
    expect(e.field).toBe(field);
    expect(e.allowed.length).toBeGreaterThan(3);
    expect(e.message).toContain(e.field);
  });

  it("rejects a leash and harness height that add up to more than a 100 m fall, naming the leash", () => {
    const rig = withChange("leashFall.leashLengthM", 60);
    rig.leashFall.harnessHeightM = 50;
    expect(() => evaluateRig(rig)).toThrow(expect.objectContaining({ field: "leashFall.leashLengthM" }));
  });

  it("names NaN and Infinity as given, not as null", () => {
    expect(() => evaluateRig(withChange("spanM", NaN))).toThrow(/got NaN/);
    expect(() => evaluateRig(withChange("heightDifferenceM", Infinity))).toThrow(/got Infinity/);
  });
});
