import { readFileSync } from "node:fs";
import fc from "fast-check";
import { beforeEach, describe, expect, it } from "vitest";
import { checkGround, evaluateRig, groundHeightAt, monotoneCubic, RigInputError, RULE_OF_THUMB, type RigResult } from "../../../physics";

const example = JSON.parse(readFileSync(new URL("../../../physics/examples/quarry-highline.json", import.meta.url), "utf8"));
const withGround = JSON.parse(readFileSync(new URL("../../../physics/examples/quarry-highline-ground.json", import.meta.url), "utf8"));

describe("the ground under the line", () => {
  const points = [
    { xM: 10, heightM: -4 },
    { xM: 30, heightM: -24 },
    { xM: 50, heightM: -20 },
  ];
  it("is linear between points and level beyond the ends (hand-worked)", () => {
    expect(groundHeightAt(points, 0)).toBe(-4);
    expect(groundHeightAt(points, 20)).toBe(-14);
    expect(groundHeightAt(points, 45)).toBe(-21);
    expect(groundHeightAt(points, 80)).toBe(-20);
  });

  it.each([
    [
      "out of order",
      [
        { xM: 30, heightM: -5 },
        { xM: 20, heightM: -5 },
      ],
      "ground.points.1.xM",
    ],
    [
      "two at one distance",
      [
        { xM: 30, heightM: -5 },
        { xM: 30, heightM: -9 },
      ],
      "ground.points.1.xM",
    ],
    ["beyond the span", [{ xM: 130, heightM: -5 }], "ground.points.0.xM"],
    ["before anchor A", [{ xM: -1, heightM: -5 }], "ground.points.0.xM"],
    ["a height that is not a number", [{ xM: 10, heightM: NaN }], "ground.points.0.heightM"],
    ["an infinite distance", [{ xM: Infinity, heightM: -3 }], "ground.points.0.xM"],
    ["no points", [], "ground.points"],
    ["more than 200 points", Array.from({ length: 201 }, (_, i) => ({ xM: i * 0.5, heightM: -10 })), "ground.points"],
  ])("rejects ground points %s with a typed error naming the field", (_, ground, field) => {
    expect(() => evaluateRig({ ...example, ground: { points: ground } })).toThrow(expect.objectContaining({ name: "RigInputError", field }));
  });
});

describe("the walker's lowest point and the clearance after a leash fall", () => {
  it("matches a hand-worked case: the unloaded line's height − deflection − leash − body below the tie-in, above the ground", () => {
    // Ground sloping from 10 m to 50 m below A: at mid-span (60 m) it lies at −30 m (hand-worked interpolation).
    const rig = {
      ...example,
      ground: {
        points: [
          { xM: 0, heightM: -10 },
          { xM: 120, heightM: -50 },
        ],
      },
      leashFall: { ...example.leashFall, hangBelowTieInM: 1.1 },
    };
    const r = evaluateRig(rig);
    // The unloaded line at mid-span: B is 2.5 m above A, so the chord is at 1.25 m; the line sags below it.
    const lineHeight = 1.25 - r.unloaded.midSpanSagM;
    const lowest = lineHeight - r.leashFall.deflectionM - 1.2 - 1.1;
    expect(r.leashFall.positionM).toBe(60);
    expect(r.leashFall.lowestPointM).toBeCloseTo(lowest, 9);
    expect(r.leashFall.groundClearanceM).toBeCloseTo(lowest + 30, 9);
    // With the example's figures (README): sag ≈ 0.55 m unloaded, deflection 9.94 m → lowest ≈ −11.5 m, clearance ≈ 18.5 m.
    expect(r.leashFall.lowestPointM).toBeGreaterThan(-11.6);
    expect(r.leashFall.lowestPointM).toBeLessThan(-11.4);
  });

  it("defaults the body below the tie-in to 1.2 m (a value from memory) and says so in the input", () => {
    expect(evaluateRig(example).leashFall.hangBelowTieInM).toBe(1.2);
  });

  it("without ground gives null clearances and says no ground was given", () => {
    const r = evaluateRig(example);
    expect(r.leashFall.lowestPointM).not.toBeNull();
    expect(r.leashFall.groundClearanceM).toBeNull();
    expect(r.clearance.groundGiven).toBe(false);
    expect(r.clearance.leashFall).toBeNull();
    expect(r.clearance.backupCatch).toBeNull();
    expect(r.clearance.ruleOfThumb.midSpanHeightAboveGroundM).toBeNull();
    expect(r.clearance.note).toMatch(/No ground was given/);
  });

  it("without a leash length (only a free-fall height) gives no lowest point, and says why", () => {
    const r = evaluateRig({ ...withGround, leashFall: { fallHeightM: 2.2 } });
    expect(r.leashFall.lowestPointM).toBeNull();
    expect(r.clearance.leashFall).toBeNull();
    expect(r.clearance.note).toMatch(/No leash length/);
  });
});

describe("the lowest clearance over the span", () => {
  // Evaluated in each test, not once in the describe body, so mutation testing sees which tests run the engine.
  let r: RigResult;
  beforeEach(() => {
    r = evaluateRig(withGround);
  });

  it("is no more than the clearance at the fall position, and is itself an exact catch at its position", () => {
    expect(r.clearance.leashFall!.clearanceM).toBeLessThanOrEqual(r.leashFall.groundClearanceM!);
    expect(r.clearance.backupCatch!.clearanceM).toBeLessThanOrEqual(r.backupCatch!.groundClearanceM!);
    for (const kind of ["leashFall", "backupCatch"] as const) {
      const worst = r.clearance[kind]!;
      const there = evaluateRig({ ...withGround, walker: { ...withGround.walker, positionFraction: undefined, positionM: worst.positionM } });
      const at = kind === "leashFall" ? there.leashFall : there.backupCatch!;
      expect(at.groundClearanceM).toBeCloseTo(worst.clearanceM, 6);
    }
  });

  // About 100 whole evaluations: a generous timeout for a loaded machine (no speed is asserted here).
  it("is no higher than a brute-force scan of exact catches every 2 % of the span (independent search in the test) by more than 2 cm", () => {
    for (const kind of ["leashFall", "backupCatch"] as const) {
      let lowest = Infinity;
      for (let f = 0.02; f < 0.99; f += 0.02) {
        const there = evaluateRig({ ...withGround, leashFall: { ...withGround.leashFall, positionFraction: f } });
        lowest = Math.min(lowest, (kind === "leashFall" ? there.leashFall : there.backupCatch!).groundClearanceM!);
      }
      expect(r.clearance[kind]!.clearanceM).toBeLessThan(lowest + 0.02);
    }
  }, 60_000);

  it("is compared with the crew's minimum and warned about", () => {
    expect(r.clearance.minimumM).toBe(2);
    expect(r.clearance.leashFall!.passes).toBe(r.clearance.leashFall!.clearanceM >= 2);
    expect(r.warnings.some((w) => w.includes("the crew's minimum clearance is 2.00 m"))).toBe(!r.clearance.leashFall!.passes);
  });

  it("interpolates between exact catches without overshoot (Fritsch & Carlson 1980: monotone data stay monotone)", () => {
    const f = monotoneCubic([0, 1, 2, 3], [0, 0, 1, 1]);
    for (let x = 0; x <= 3; x += 0.05) {
      expect(f(x)).toBeGreaterThanOrEqual(-1e-12);
      expect(f(x)).toBeLessThanOrEqual(1 + 1e-12);
    }
    expect(f(1.5)).toBeCloseTo(0.5, 12);
  });
});

describe("two rocks under the demo line, 48 m and 72 m from A", () => {
  // Level ground 40 m below A, rocks 1 m wide reaching −14 m and −13.7 m: the guide through the scan ranks the rock at
  // 72 m lower, where a fall's exact catch leaves about 19 cm more clearance than over the rock at 48 m.
  const rocks = [
    { xM: 47.5, heightM: -40 },
    { xM: 48, heightM: -14 },
    { xM: 48.5, heightM: -40 },
    { xM: 71.5, heightM: -40 },
    { xM: 72, heightM: -13.7 },
    { xM: 72.5, heightM: -40 },
  ];
  const rig = { ...withGround, ground: { points: rocks } };

  it("gives the lower rock's clearance: that of an exact catch over its top, no higher (independent: a fall worked out at each top)", () => {
    const r = evaluateRig(rig);
    const overTop = (xM: number) => evaluateRig({ ...rig, leashFall: { ...rig.leashFall, positionFraction: xM / rig.spanM } });
    const [at48, at72] = [overTop(48), overTop(72)];
    expect(at48.leashFall.groundClearanceM!).toBeLessThan(at72.leashFall.groundClearanceM! - 0.1);
    for (const kind of ["leashFall", "backupCatch"] as const) {
      const tops = [at48, at72].map((there) => (kind === "leashFall" ? there.leashFall : there.backupCatch!).groundClearanceM!);
      expect(r.clearance[kind]!.clearanceM).toBeLessThanOrEqual(Math.min(...tops) + 1e-9);
      expect(r.clearance[kind]!.clearanceM).toBeGreaterThan(Math.min(...tops) - 0.001);
    }
  });
});

describe("rocks anywhere under the demo line", () => {
  const span: number = withGround.spanM;
  const rig = { ...withGround, ground: undefined };
  const exactLowest = new Map<number, number>();
  /** The walker's lowest point after a fall at x, an exact catch (the engine with no ground), kept once worked out. */
  const lowestAt = (x: number) => {
    let y = exactLowest.get(x);
    if (y === undefined) {
      y = evaluateRig({ ...rig, leashFall: { ...rig.leashFall, positionFraction: x / span } }).leashFall.lowestPointM!;
      exactLowest.set(x, y);
    }
    return y;
  };
  const grid = Array.from({ length: 197 }, (_, i) => (0.01 + 0.005 * i) * span);
  // Two to five rocks 0.4 to 6 m wide on ground 40 m below A, each top 0.5 to 1.5 m below the walker's lowest point there.
  const rock = fc.record({
    share: fc.double({ min: 0.03, max: 0.97, noNaN: true }),
    halfWidthM: fc.double({ min: 0.2, max: 3, noNaN: true }),
    depthM: fc.double({ min: 0.5, max: 1.5, noNaN: true }),
  });

  // About 200 whole evaluations without ground and 60 with: a generous timeout for a loaded machine.
  it("never gives a clearance above a scan of exact catches every 0.5 % of the span and over every rock's top (independent search in the test)", () => {
    fc.assert(
      fc.property(fc.array(rock, { minLength: 2, maxLength: 5 }), (rocks) => {
        const points: { xM: number; heightM: number }[] = [];
        for (const { share, halfWidthM, depthM } of [...rocks].sort((a, b) => a.share - b.share)) {
          const x = share * span;
          if (points.length > 0 && points[points.length - 1].xM >= x - halfWidthM) continue;
          points.push({ xM: x - halfWidthM, heightM: -40 }, { xM: x, heightM: lowestAt(x) - depthM }, { xM: x + halfWidthM, heightM: -40 });
        }
        const found = evaluateRig({ ...rig, ground: { points } }).clearance.leashFall!.clearanceM;
        const inRange = points.map((p) => p.xM).filter((x) => x > 0.01 * span && x < 0.99 * span);
        const scanned = Math.min(...[...grid, ...inRange].map((x) => lowestAt(x) - groundHeightAt(points, x)));
        // 1 µm: exact catches agree to about 1e-9 m, as each solve starts from a neighbour's catch.
        return found <= scanned + 1e-6;
      }),
      { numRuns: 60, seed: 20261205 },
    );
  }, 120_000);
});

describe("the rule of thumb", () => {
  it("a third of the length plus 3 m (Swiss Slackline Association, “Highlining – the 10 most important points”, 2014): 60 m → 23 m, 120 m → 43 m", () => {
    expect(RULE_OF_THUMB.heightAboveGroundM(60)).toBe(23);
    expect(RULE_OF_THUMB.heightAboveGroundM(120)).toBe(43);
    const r = evaluateRig(withGround);
    expect(r.clearance.ruleOfThumb.heightAboveGroundM).toBe(43);
    expect(r.clearance.ruleOfThumb.source).toMatch(/Swiss Slackline Association/);
    // The unloaded line's height above the ground at mid-span: chord 1.25 m, less the sag, above the ground at −31 m.
    expect(r.clearance.ruleOfThumb.midSpanHeightAboveGroundM).toBeCloseTo(1.25 - r.unloaded.midSpanSagM + 31, 9);
  });
});

describe("the crew's minimum brake margin", () => {
  it("a brake that holds with a margin below it gets its own verdict and warning", () => {
    // The example's brake holds with a margin of 3.17 (README).
    expect(evaluateRig({ ...example, minimumBrakeMargin: 3 }).brake.verdict).toBe("holds");
    const thin = evaluateRig({ ...example, minimumBrakeMargin: 3.5 });
    expect(thin.brake.verdict).toBe("holds_below_margin");
    expect(thin.warnings).toContain(thin.brake.message);
    expect(thin.brake.message).toMatch(/below the crew's minimum of 3.5/);
  });
  it("rejects a minimum margin ≤ 0", () => {
    expect(() => evaluateRig({ ...example, minimumBrakeMargin: 0 })).toThrow(RigInputError);
  });
});

describe("the ground's points at their edges (hand-worked)", () => {
  const points = [
    { xM: 10, heightM: -4 },
    { xM: 30, heightM: -24 },
    { xM: 50, heightM: -20 },
  ];
  it("takes each point's own height at the point, and is linear just either side of it", () => {
    expect(groundHeightAt(points, 10)).toBe(-4);
    expect(groundHeightAt(points, 30)).toBe(-24);
    expect(groundHeightAt(points, 50)).toBe(-20);
    expect(groundHeightAt(points, 11)).toBe(-5);
    expect(groundHeightAt(points, 31)).toBe(-23.8);
    expect(groundHeightAt(points, 49)).toBe(-20.2);
    expect(groundHeightAt(points, 9)).toBe(-4);
    expect(groundHeightAt(points, 51)).toBe(-20);
    expect(groundHeightAt([{ xM: 5, heightM: -2 }], 100)).toBe(-2);
  });

  it("takes a point at the span's end, refuses one past it or at the same distance as the one before, saying what is allowed", () => {
    expect(
      checkGround(
        [
          { xM: 0, heightM: -1 },
          { xM: 120, heightM: 1 },
        ],
        120,
      ),
    ).toHaveLength(2);
    expect(() => checkGround([{ xM: 120.01, heightM: 0 }], 120)).toThrow(
      expect.objectContaining({ field: "ground.points.0.xM", allowed: "a distance from anchor A from 0 m to the span, 120 m" }),
    );
    expect(() =>
      checkGround(
        [
          { xM: 10, heightM: 0 },
          { xM: 40, heightM: 0 },
          { xM: 40, heightM: -3 },
        ],
        120,
      ),
    ).toThrow(expect.objectContaining({ field: "ground.points.2.xM", allowed: "farther from A than the point before (40 m): points in order from A" }));
  });
});
