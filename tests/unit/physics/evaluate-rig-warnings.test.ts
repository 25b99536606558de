import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { evaluateRig, forceText, forceUnitOf, lengthText, loadText, type RigInput } from "../../../physics";

// When evaluateRig warns and when it stays silent: each warning is checked absent where its condition does not hold
// (the condition read from the result's own figures in this test) and present, word for word, where it does; the
// figures in a sentence are rebuilt here from the display helpers, as the crew reads them. And where the clearance
// search draws its line: a clearance at the crew's minimum, one of exactly nothing, and a ledge next to an anchor.

const load = (name: string) => JSON.parse(readFileSync(new URL(`../../../physics/examples/${name}`, import.meta.url), "utf8")) as RigInput;
const plain = load("quarry-highline.json");
const withGround = load("quarry-highline-ground.json");

const clearanceWarnings = (warnings: string[]) => warnings.filter((w) => w.startsWith("A leash fall") || w.startsWith("A fall caught"));

describe("evaluateRig's warnings where nothing calls for one", () => {
  it("says nothing about a rig within its curve, its factors and its brake, with no ground and narrow, equipped anchors", () => {
    const r = evaluateRig(plain);
    // Every condition of a warning, read from the result: none holds, so there is nothing to say.
    expect(Math.max(r.anchors.a.peakTensionN, r.anchors.b.peakTensionN)).toBeLessThan(10000); // the curve's last point, 10 kN
    expect(r.safetyFactors.every((f) => f.factor >= f.minimum)).toBe(true);
    expect(r.brake.verdict).toBe("holds");
    expect(r.clearance.groundGiven).toBe(false);
    expect([plain.anchors.a.components.length, plain.anchors.b.components.length].every((n) => n > 0)).toBe(true);
    for (const { layout } of [plain.anchors.a, plain.anchors.b]) expect(layout.kind === "single" || layout.includedAngleDeg <= 90).toBe(true);
    expect(r.warnings).toEqual([]);
  });

  it("gives no stretch-curve warning for a mainline or a backup whose peaks stay within their measured curves", () => {
    // The ground example: the mainline's curve and the backup's both run to 10 kN, above every peak on them.
    const r = evaluateRig(withGround);
    expect(Math.max(r.anchors.a.peakTensionN, r.anchors.b.peakTensionN)).toBeLessThan(10000);
    expect(r.backupCatch!.peakAnchorLoadN).toBeLessThan(10000);
    expect(r.extrapolated).toBe(false);
    expect(r.warnings.filter((w) => w.includes("stretch curve"))).toEqual([]);
  });
});

describe("evaluateRig's warning for a backup caught beyond its stretch curve", () => {
  // The ground example's backup measured only to 4 kN: its catch of a 75 kg walker goes beyond that point.
  const shortBackup: RigInput = {
    ...withGround,
    backup: {
      ...withGround.backup!,
      stretchPoints: [
        { tensionKN: 0, elongationPct: 0 },
        { tensionKN: 2, elongationPct: 1.9 },
        { tensionKN: 4, elongationPct: 3 },
      ],
    },
  };

  it.each(["si", "us"] as const)("names the backup's peak and its curve's last measured point, in the crew's units (%s)", (units) => {
    const r = evaluateRig(shortBackup, { units });
    const peak = r.backupCatch!.peakAnchorLoadN;
    expect(peak).toBeGreaterThan(4000); // beyond the last measured point: the warning's condition holds
    expect(r.backupCatch!.extrapolated).toBe(true);
    expect(r.extrapolated).toBe(true);
    // A stretch point is a measurement, shown to the nearest step; the peak is a load, rounded up.
    expect(r.warnings.filter((w) => w.includes("stretch curve"))).toEqual([
      `The backup's peak tension at the catch, ${loadText(peak, units)}, is beyond its stretch curve's last measured point (${forceText(4000, forceUnitOf(units), "nearest")}): the curve is extrapolated with its last stiffness.`,
    ]);
  });
});

describe("evaluateRig's clearance against the crew's minimum", () => {
  // The ground example's ground lowered 10 m: every fall stays clear of it.
  const lowered: RigInput = { ...withGround, ground: { points: withGround.ground!.points.map((p) => ({ ...p, heightM: p.heightM - 10 })) } };

  it.each(["leashFall", "backupCatch"] as const)("passes a %s clearance exactly at the minimum: at least the minimum is enough", (fall) => {
    const clearance = evaluateRig(lowered).clearance[fall]!.clearanceM;
    expect(clearance).toBeGreaterThan(0);
    // The minimum does not move the figure, only the verdict: set it to the clearance itself.
    const atMinimum = evaluateRig({ ...lowered, minimumClearanceM: clearance });
    expect(atMinimum.clearance[fall]!.clearanceM).toBe(clearance);
    expect(atMinimum.clearance[fall]!.passes).toBe(true);
    const what = fall === "leashFall" ? "A leash fall" : "A fall caught by the backup";
    expect(clearanceWarnings(atMinimum.warnings).filter((w) => w.startsWith(what))).toEqual([]);
  });

  it("says a fall whose lowest point comes exactly to the ground leaves nothing, not that it is 0 m below the ground", () => {
    // Level ground at A's height: the clearance is the walker's lowest point itself, relative to A.
    const level = (heightM: number): RigInput => ({
      ...withGround,
      ground: {
        points: [
          { xM: 0, heightM },
          { xM: 120, heightM },
        ],
      },
    });
    const lowestPoint = evaluateRig(level(0)).clearance.leashFall!.clearanceM;
    // The ground raised to that point: the lowest point touches it, a clearance of exactly 0 m.
    const r = evaluateRig(level(lowestPoint));
    const touching = r.clearance.leashFall!;
    expect(touching.clearanceM).toBe(0);
    expect(touching.passes).toBe(false);
    expect(clearanceWarnings(r.warnings)[0]).toBe(
      `A leash fall at ${lengthText(touching.positionM, "si", "nearest")} from A leaves 0.00 m between the walker's lowest point and the ground; the crew's minimum clearance is 2.00 m.`,
    );
  });

  it("finds a ledge 1.5 m from anchor B, where the walker hangs leash and body below a line that barely deflects", () => {
    // Ground 30 m down, with a ridge at mid-span and a narrow ledge at 118.5 m: a fall onto the ledge clears it by
    // less than a fall onto the ridge, so a search that misjudged the lowest point near the anchor would pick the ridge.
    const ledge: RigInput = {
      ...withGround,
      ground: {
        points: [
          { xM: 0, heightM: -30 },
          { xM: 55, heightM: -30 },
          { xM: 60, heightM: -12.5 },
          { xM: 65, heightM: -30 },
          { xM: 118, heightM: -30 },
          { xM: 118.5, heightM: -1.8 },
          { xM: 119, heightM: -30 },
          { xM: 120, heightM: -30 },
        ],
      },
    };
    // A leash fall placed at the ledge and at the ridge: each one's clearance at its own fall position (its lowest point
    // above the ground there, checked against a hand-worked case in ground-clearance.test.ts).
    const fallAt = (x: number) => evaluateRig({ ...ledge, leashFall: { ...ledge.leashFall, positionFraction: x / 120 } }).leashFall.groundClearanceM!;
    const atLedge = fallAt(118.5);
    const atRidge = fallAt(60);
    expect(atLedge).toBeLessThan(atRidge - 0.3); // the ledge is clearly the worse of the two
    const worst = evaluateRig(ledge).clearance.leashFall!;
    expect(worst.positionM).toBe(118.5);
    expect(worst.clearanceM).toBeCloseTo(atLedge, 6);
  });
});
