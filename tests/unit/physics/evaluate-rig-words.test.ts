import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import {
  CAUTIONS,
  ENGINE_VERSION,
  evaluateRig,
  lengthText,
  loadText,
  forceText,
  RigInputError,
  STANDARD_GRAVITY,
  type RigInput,
  type RigResult,
} from "../../../physics";

// What evaluateRig says beside its figures: each refusal (the field, and what is allowed, in the product's own words),
// each warning sentence with the figure it names taken from the same result, the clearance notes, and the plain
// fields it passes through. The sentences are the product's own wording; the figures in them are checked against
// the result's own fields, so a sentence wired to the wrong figure fails.

const load = (name: string) => JSON.parse(readFileSync(new URL(`../../../physics/examples/${name}`, import.meta.url), "utf8")) as RigInput;

/** The example with changes merged in one level deep. */
function rig(changes: Record<string, unknown> = {}, base = "quarry-highline.json"): RigInput {
  const r = load(base) as unknown as Record<string, unknown>;
  for (const [key, value] of Object.entries(changes)) {
    const old = r[key];
    r[key] = old && typeof old === "object" && !Array.isArray(old) && value && typeof value === "object" ? { ...old, ...value } : value;
  }
  return r as unknown as RigInput;
}

function refusal(input: RigInput): { field: string; allowed: string } {
  try {
    evaluateRig(input);
  } catch (error) {
    expect(error).toBeInstanceOf(RigInputError);
    const { field, allowed } = error as RigInputError;
    return { field, allowed };
  }
  throw new Error("expected evaluateRig to refuse the rig");
}

describe("evaluateRig's refusals", () => {
  it("a height difference larger than the span; the span itself is allowed", () => {
    expect(refusal(rig({ spanM: 20, heightDifferenceM: -20.5 }))).toEqual({
      field: "heightDifferenceM",
      allowed: "a height difference no larger than the span (|h| ≤ 20 m)",
    });
    expect(() => evaluateRig(rig({ spanM: 20, heightDifferenceM: 19.99 }))).not.toThrow(RigInputError);
  });

  it("a pretension at the mainline's MBS", () => {
    expect(refusal(rig({ pretension: { forceN: 32000 } }))).toEqual({
      field: "pretension.forceN",
      allowed: "a pretension > 0 N and below the mainline's MBS, 32000 N",
    });
  });

  it("a walker placed both ways, or beyond the span; at the span's end the leash fall has nowhere to be", () => {
    expect(refusal(rig({ walker: { massKg: 75, positionFraction: 0.5, positionM: 60 } }))).toEqual({
      field: "walker",
      allowed: "either positionFraction or positionM, not both",
    });
    expect(refusal(rig({ walker: { massKg: 75, positionM: 120.5, positionFraction: undefined } }))).toEqual({
      field: "walker.positionM",
      allowed: "a distance from anchor A from 0 m to the span, 120 m",
    });
    const atAnchor =
      "a position between the anchors, or a leash-fall position (leashFall.positionFraction, between 0 and 1) when the walker stands at an anchor";
    expect(refusal(rig({ walker: { massKg: 75, positionM: 120, positionFraction: undefined } }))).toEqual({ field: "walker.positionM", allowed: atAnchor });
    expect(refusal(rig({ walker: { massKg: 75, positionFraction: 0 } }))).toEqual({ field: "walker.positionFraction", allowed: atAnchor });
    // At an anchor the walker may stand, when the leash fall is placed on the line.
    const standing = evaluateRig(rig({ walker: { massKg: 75, positionM: 120, positionFraction: undefined }, leashFall: { positionFraction: 0.25 } }));
    expect(standing.walker.positionM).toBe(120);
    expect(standing.leashFall.positionM).toBe(30);
  });

  it("a leash fall with neither a height nor both a leash and a harness height, past 100 m, or at an anchor", () => {
    expect(refusal(rig({ leashFall: { leashLengthM: 1.2, harnessHeightM: undefined } }))).toEqual({
      field: "leashFall",
      allowed: "a free-fall height, or both a leash length and a harness height above the line (the fall is the leash length plus the harness height)",
    });
    expect(refusal(rig({ leashFall: { leashLengthM: undefined, harnessHeightM: 1 } })).field).toBe("leashFall");
    expect(refusal(rig({ leashFall: { leashLengthM: 99.5, harnessHeightM: 1 } }))).toEqual({
      field: "leashFall.leashLengthM",
      allowed: "a leash length that, with the harness height of 1 m, makes a free fall of at most 100 m",
    });
    expect(evaluateRig(rig({ leashFall: { leashLengthM: 2, harnessHeightM: 1.5 } })).leashFall.fallHeightM).toBe(3.5);
    expect(evaluateRig(rig({ leashFall: { fallHeightM: 4.25, leashLengthM: undefined, harnessHeightM: undefined } })).leashFall.fallHeightM).toBe(4.25);
    for (const positionFraction of [0, 1]) {
      expect(refusal(rig({ leashFall: { positionFraction } }))).toEqual({
        field: "leashFall.positionFraction",
        allowed: "a fraction of the span strictly between 0 and 1: the line cannot deflect at an anchor",
      });
    }
  });
});

describe("evaluateRig's plain fields", () => {
  it("passes through what it was given and states its units, version and cautions", () => {
    const input = rig({ walker: { massKg: 80, positionM: 30, positionFraction: undefined } });
    const r = evaluateRig(input);
    expect(r.engineVersion).toBe(ENGINE_VERSION);
    expect(r.units).toEqual({ force: "N", length: "m", mass: "kg", energy: "J" });
    expect(r.cautions).toEqual(CAUTIONS);
    // chord = √(D² + h²) (Pythagoras); the walker's load is m·g (g = 9.806 65 m/s², NIST SP 811).
    expect(r.line.chordM).toBeCloseTo(Math.sqrt(120 ** 2 + 2.5 ** 2), 12);
    expect(r.walker.positionM).toBe(30);
    expect(r.walker.loadN).toBeCloseTo(80 * STANDARD_GRAVITY, 12);
    // No position given: the walker stands at mid-span.
    expect(evaluateRig(rig({ walker: { massKg: 75, positionFraction: undefined } })).walker.positionM).toBe(60);
    expect(r.leashFall.upperBound).toBe(true);
    expect(r.leashFall.note).toBe("No damping and no give in leash or harness: an upper bound on the peak loads, not a prediction.");
    // No hang below the tie-in was given: the schema's default.
    expect(r.leashFall.hangBelowTieInM).toBe(input.leashFall.hangBelowTieInM ?? r.leashFall.hangBelowTieInM);
    expect(r.tensioning.brakeForceAtPretensionN).toBeCloseTo(3500 / r.tensioning.brakeAdvantage, 12);
    expect(r.brake.peakLineTensionN).toBe(r.anchors.b.peakTensionN);
    expect(r.backupCatch).toBeNull();
    expect(r.backupCatchMissing).toBe("No stretch points for the backup: its catch is not worked out.");
  });

  it("with ground and a backup: the backup's catch, its note and length, and the rule of thumb beside the clearances", () => {
    const input = load("quarry-highline-ground.json");
    const r = evaluateRig(input);
    expect(r.backupCatchMissing).toBeNull();
    expect(r.backupCatch).not.toBeNull();
    expect(r.backupCatch!.note).toBe(
      "The mainline fails with the walker standing here and the backup catches alone: no damping, no give in leash or harness, an upper bound.",
    );
    expect(r.backupCatch!.upperBound).toBe(true);
    expect(r.backupCatch!.unstretchedLengthM).toBeCloseTo(r.line.unstretchedLengthM + 1.5, 12);
    expect(r.backupCatch!.extrapolated).toBe(false);
    expect(r.leashFall.hangBelowTieInM).toBe(1.2);
    expect(r.clearance.groundGiven).toBe(true);
    expect(r.clearance.minimumM).toBe(2);
    expect(r.clearance.note).toBe(
      "Clearance: the walker's lowest point (the line's unloaded height there, less the catch deflection, the leash and the body below the tie-in) above the ground; the lowest over fall positions from 1 % to 99 % of the span.",
    );
    // Swiss Slackline Association (2014): a third of the length plus 3 m; 120 m / 3 + 3 = 43 m.
    expect(r.clearance.ruleOfThumb.source).toBe("Swiss Slackline Association, “Highlining – the 10 most important points”, 2014");
    expect(r.clearance.ruleOfThumb.heightAboveGroundM).toBe(43);
    // The unloaded line at mid-span: halfway up the rise, less its sag there, above the ground at 60 m (−31 m).
    expect(r.clearance.ruleOfThumb.midSpanHeightAboveGroundM).toBeCloseTo(2.5 / 2 - r.unloaded.midSpanSagM + 31, 9);
    expect(r.clearance.leashFall!.passes).toBe(r.clearance.leashFall!.clearanceM >= 2);
    expect(r.clearance.backupCatch!.passes).toBe(r.clearance.backupCatch!.clearanceM >= 2);
    // The leash fall's lowest point and its clearance at the fall position: the line's height less deflection, leash and hang.
    expect(r.leashFall.groundClearanceM).toBeCloseTo(r.leashFall.lowestPointM! + 31, 9);
  });

  it("without ground, or without a leash length, says why there are no clearances", () => {
    const noGround = evaluateRig(rig());
    expect(noGround.clearance).toMatchObject({ groundGiven: false, leashFall: null, backupCatch: null });
    expect(noGround.clearance.note).toBe("No ground was given: the walker's lowest points are heights relative to anchor A, and there are no clearances.");
    expect(noGround.clearance.ruleOfThumb.midSpanHeightAboveGroundM).toBeNull();
    expect(noGround.leashFall.groundClearanceM).toBeNull();
    expect(noGround.leashFall.lowestPointM).not.toBeNull();
    const noLeash = evaluateRig({ ...load("quarry-highline-ground.json"), leashFall: { fallHeightM: 2.2 } } as RigInput);
    expect(noLeash.clearance).toMatchObject({ groundGiven: true, leashFall: null, backupCatch: null });
    expect(noLeash.clearance.note).toBe("No leash length was given (only a free-fall height): the walker's lowest point and the clearances need it.");
    expect(noLeash.leashFall.lowestPointM).toBeNull();
    expect(noLeash.leashFall.groundClearanceM).toBeNull();
  });
});

describe("evaluateRig's warnings", () => {
  const warningsOf = (r: RigResult, start: string) => r.warnings.filter((w) => w.startsWith(start));

  it("a peak beyond the stretch curve's last point names the peak and that point, in the crew's units", () => {
    const short = rig({
      mainline: {
        stretchPoints: [
          { tensionKN: 0, elongationPct: 0 },
          { tensionKN: 2, elongationPct: 1.6 },
          { tensionKN: 4, elongationPct: 2.6 },
        ],
      },
    });
    for (const units of ["si", "us"] as const) {
      const r = evaluateRig(short, { units });
      const peak = Math.max(r.anchors.a.peakTensionN, r.anchors.b.peakTensionN);
      expect(r.extrapolated).toBe(true);
      expect(warningsOf(r, "Peak tension")).toEqual([
        `Peak tension ${loadText(peak, units)} is beyond the stretch curve's last measured point (${forceText(4000, units === "us" ? "lbf" : "kN", "nearest")}): the curve is extrapolated with its last stiffness.`,
      ]);
    }
    expect(evaluateRig(rig()).extrapolated).toBe(false);
  });

  it("each failing safety factor, by where it sits, and nothing for those that pass", () => {
    const r = evaluateRig(rig({ minimumSafetyFactors: { webbing: 20, connector: 3, sling: 3, anchor: 10, other: 3 } }));
    const line = r.safetyFactors.find((f) => f.location === "line")!;
    const bolts = r.safetyFactors.find((f) => f.category === "anchor")!;
    expect(r.warnings).toContain(`Demo Tape 25 (invented) (line): safety factor ${line.shown} is below the crew minimum of 20.`);
    expect(r.warnings).toContain(`Demo bolt pair, tested 25 kN (invented) (anchor b): safety factor ${bolts.shown} is below the crew minimum of 10.`);
    expect(r.warnings.filter((w) => w.includes("safety factor"))).toHaveLength(2);
    const backedUp = evaluateRig({
      ...load("quarry-highline-ground.json"),
      minimumSafetyFactors: { webbing: 20, connector: 3, sling: 3, anchor: 3, other: 3 },
    } as RigInput);
    const backup = backedUp.safetyFactors.find((f) => f.location === "backup")!;
    expect(backedUp.warnings).toContain(
      `Demo Tape 25 backup (invented) (backup, catching a fall): safety factor ${backup.shown} is below the crew minimum of 20.`,
    );
  });

  it("the brake's sentence unless it simply holds", () => {
    const holds = evaluateRig(rig());
    expect(holds.brake.verdict).toBe("holds");
    expect(holds.warnings).not.toContain(holds.brake.message);
    const untested = evaluateRig(rig({ brake: { device: "Demo cam brake (invented)", ropeDiameterMm: 12 } }));
    expect(untested.brake.verdict).toBe("untested");
    expect(untested.warnings).toContain(untested.brake.message);
  });

  it("a fall that leaves less than the crew's minimum above the ground, or reaches it, with where and by how much", () => {
    const base = load("quarry-highline-ground.json");
    // The ground lowered 10 m everywhere: every fall stays clear of it, by less than a minimum of 40 m.
    const lowered = { ...base, ground: { points: base.ground!.points.map((p) => ({ ...p, heightM: p.heightM - 10 })) } } as RigInput;
    const high = evaluateRig({ ...lowered, minimumClearanceM: 40 } as RigInput);
    const leash = high.clearance.leashFall!;
    const backup = high.clearance.backupCatch!;
    expect(leash.clearanceM).toBeGreaterThan(0);
    expect(high.warnings.filter((w) => w.startsWith("A leash fall") || w.startsWith("A fall caught"))).toEqual([
      `A leash fall at ${lengthText(leash.positionM, "si", "nearest")} from A leaves ${lengthText(leash.clearanceM, "si", "down")} between the walker's lowest point and the ground; the crew's minimum clearance is 40.00 m.`,
      `A fall caught by the backup at ${lengthText(backup.positionM, "si", "nearest")} from A leaves ${lengthText(backup.clearanceM, "si", "down")} between the walker's lowest point and the ground; the crew's minimum clearance is 40.00 m.`,
    ]);
    expect(evaluateRig(lowered).warnings.filter((w) => w.startsWith("A leash fall") || w.startsWith("A fall caught"))).toEqual([]);
    // As the example's ground stands, a fall near anchor B reaches the ground (it rises to 0.5 m below A there).
    const reaching = evaluateRig(base, { units: "us" });
    const reached = reaching.clearance.leashFall!;
    expect(reached.clearanceM).toBeLessThan(0);
    expect(reaching.warnings).toContain(
      `A leash fall at ${lengthText(reached.positionM, "us", "nearest")} from A reaches the ground: the walker's lowest point would be ${lengthText(-reached.clearanceM, "us", "up")} below it; the crew's minimum clearance is ${lengthText(2, "us", "nearest")}.`,
    );
  });

  it("each anchor's own warnings, a then b", () => {
    const r = evaluateRig(
      rig({
        anchors: {
          a: { layout: { kind: "single" }, components: [] },
          b: {
            layout: { kind: "bridle", includedAngleDeg: 100 },
            components: [{ name: "Demo bolt (invented)", category: "anchor", mbsN: 60000, carries: "leg" }],
          },
        },
      }),
    );
    const anchorWarnings = r.warnings.filter((w) => w.startsWith("Anchor"));
    expect(anchorWarnings).toHaveLength(2);
    expect(anchorWarnings[0]).toMatch(/^Anchor a has no component in its load path/);
    expect(anchorWarnings[1]).toBe(
      `Anchor b: a bridle angle of 100° puts ${loadText(r.anchors.b.leg, "si")} on each leg (78 % of the line tension); past 90° the load on each leg climbs steeply, to the whole line tension at 120°.`,
    );
  });
});
