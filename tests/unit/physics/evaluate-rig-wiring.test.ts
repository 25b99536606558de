import { readFileSync } from "node:fs";
import { beforeEach, describe, expect, it } from "vitest";
import {
  catchOnLine,
  createStretchCurve,
  evaluateRig,
  lengthForPretension,
  sagAt,
  solveLine,
  STANDARD_GRAVITY,
  sweepWalker,
  type Line,
  type LineCatch,
  type RigResult,
  type RigInput,
} from "../../../physics";
import { STIFF } from "./fixtures";

// How evaluateRig composes its parts: which states feed each anchor's peak, which load each component is checked
// against, which anchor's tension the tensioning system and brake see, what weight each line carries. Each case
// recomputes the figure from the parts (the lower-level engine functions called directly in this test, on lines
// built here from the rig's own figures) and is built so that the wrong wiring gives a different figure: the check
// asserts that too, so a case that stops telling the wirings apart fails instead of passing quietly.

const load = (name: string) => JSON.parse(readFileSync(new URL(`../../../physics/examples/${name}`, import.meta.url), "utf8"));
const plain = load("quarry-highline.json");
const withGround = load("quarry-highline-ground.json");

/** The same rig with changes merged in (objects merged one level deep). */
function rigWith(base: RigInput, changes: Record<string, unknown>): RigInput {
  const rig = structuredClone(base) as Record<string, unknown>;
  for (const [key, value] of Object.entries(changes)) {
    const old = rig[key];
    rig[key] = old && typeof old === "object" && !Array.isArray(old) && value && typeof value === "object" ? { ...old, ...value } : value;
  }
  return rig as unknown as RigInput;
}

/** `actual` is `expected` (relative 1e-9), and every wrong wiring's figure is clearly not (relative 1e-6). */
function expectWiredTo(actual: number, expected: number, wrong: Record<string, number>) {
  expect(Math.abs(actual - expected)).toBeLessThanOrEqual(1e-9 * Math.abs(expected));
  for (const [what, figure] of Object.entries(wrong)) {
    expect(Math.abs(figure - expected), `the case must tell the right wiring from ${what}`).toBeGreaterThan(1e-6 * Math.abs(expected));
  }
}

/** The rig's mainline as the equations see it, built here: weight per metre = (mainline + riding backup) mass × g. */
function mainline(rig: RigInput): Line {
  const backupMass = rig.backup?.ridesAlong ? rig.backup.massPerMetreKg : 0;
  return {
    span: rig.spanM,
    rise: rig.heightDifferenceM,
    weight: (rig.mainline.massPerMetreKg + backupMass) * STANDARD_GRAVITY,
    curve: createStretchCurve(rig.mainline.stretchPoints),
  };
}

/** The states evaluateRig combines, each from the parts. */
function parts(rig: RigInput) {
  const line = mainline(rig);
  const mbs = rig.mainline.mbsN;
  const walkerLoad = rig.walker.massKg * STANDARD_GRAVITY;
  const walkerX = (rig.walker.positionFraction ?? 0.5) * rig.spanM;
  const fallX = rig.leashFall.positionFraction === undefined ? walkerX : rig.leashFall.positionFraction * rig.spanM;
  const leashFallHeight = rig.leashFall.fallHeightM ?? rig.leashFall.leashLengthM! + rig.leashFall.harnessHeightM!;
  const unloaded = lengthForPretension(line, rig.pretension.forceN, rig.pretension.readAt, mbs);
  const length = unloaded.variables.length;
  const sweep = sweepWalker(line, length, walkerLoad, mbs);
  const leash = catchOnLine(line, length, fallX, mbs, rig.walker.massKg, () => leashFallHeight);
  let backup: { line: Line; catch: LineCatch } | null = null;
  if (rig.backup?.stretchPoints && rig.backup.slackM !== undefined) {
    // The backup alone once the mainline has failed: its own weight only, its own curve, the mainline's length + slack.
    const backupLine: Line = {
      span: rig.spanM,
      rise: rig.heightDifferenceM,
      weight: rig.backup.massPerMetreKg * STANDARD_GRAVITY,
      curve: createStretchCurve(rig.backup.stretchPoints),
    };
    // The ring drops from the mainline under the standing walker to the backup, after the leash fall (backup-catch.ts).
    const mainY = solveLine(line, length, { force: walkerLoad, x: fallX }, mbs).loadY;
    const fall = (backupY: number) => leashFallHeight + Math.max(0, mainY - backupY);
    backup = { line: backupLine, catch: catchOnLine(backupLine, length + rig.backup.slackM, fallX, rig.backup.mbsN, rig.walker.massKg, fall) };
  }
  const peakA = Math.max(sweep.worstTensionA.tensionA, leash.caught.tensionA, unloaded.tensionA);
  const peakB = Math.max(sweep.worstTensionB.tensionB, leash.caught.tensionB, unloaded.tensionB);
  return { line, walkerLoad, unloaded, sweep, leash, backup, peakA, peakB };
}

/** Leg load of a symmetric two-leg bridle: T / (2 cos(α/2)) (statics; the sling-angle tables of rigging practice). */
const bridleLeg = (tension: number, includedAngleDeg: number) => tension / (2 * Math.cos((includedAngleDeg * Math.PI) / 360));

// B 30 m above A, so every tension at B exceeds the one at A by about the weight of 30 m of line (w·h, catenary statics).
const steep = rigWith(plain, { heightDifferenceM: 30 });
// The same with the ground example's backup made stiff and given 5 m of slack: the ring drops onto it after the leash
// fall, and its catch loads the anchors more than anything on the mainline does (checked in each case).
const steepBackup = rigWith(withGround, { heightDifferenceM: 30, backup: { ...withGround.backup, stretchPoints: STIFF, slackM: 5 } });

describe("evaluateRig: which states feed each anchor's peak", () => {
  it("takes each anchor's own tension in the leash fall when the fall governs (the plain example, B 30 m higher)", () => {
    const r = evaluateRig(steep);
    const p = parts(steep);
    expect(p.leash.caught.tensionA).toBeGreaterThan(p.sweep.worstTensionA.tensionA); // the fall governs in this case
    expectWiredTo(r.anchors.a.peakTensionN, p.leash.caught.tensionA, {
      "B's tension": p.leash.caught.tensionB,
      "the walker standing": p.sweep.worstTensionA.tensionA,
      "the unloaded line": p.unloaded.tensionA,
    });
    expectWiredTo(r.anchors.b.peakTensionN, p.leash.caught.tensionB, {
      "A's tension": p.leash.caught.tensionA,
      "the walker standing": p.sweep.worstTensionB.tensionB,
      "the peak load itself": p.leash.peakLoad,
    });
    expectWiredTo(r.leashFall.peakTensionAN, p.leash.caught.tensionA, { "B's": p.leash.caught.tensionB });
    expectWiredTo(r.leashFall.peakTensionBN, p.leash.caught.tensionB, { "A's": p.leash.caught.tensionA });
    expectWiredTo(r.leashFall.peakAnchorLoadN, p.leash.caught.maxTension, { "A's": p.leash.caught.tensionA });
    expectWiredTo(r.leashFall.peakLoadN, p.leash.peakLoad, { "the walker's weight": p.walkerLoad });
  });

  it("takes the sweep's worst position for each anchor when the walker standing governs (a short fall near A)", () => {
    // A 5 cm fall at 3 % of the span barely loads the line; the walker standing mid-span loads it more (checked below).
    const rig = rigWith(steep, { leashFall: { fallHeightM: 0.05, positionFraction: 0.03 } });
    const r = evaluateRig(rig);
    const p = parts(rig);
    expect(p.sweep.worstTensionA.tensionA).toBeGreaterThan(p.leash.caught.tensionA);
    expect(p.sweep.worstTensionB.tensionB).toBeGreaterThan(p.leash.caught.tensionB);
    expectWiredTo(r.anchors.a.peakTensionN, p.sweep.worstTensionA.tensionA, {
      "the leash fall": p.leash.caught.tensionA,
      "B's tension at A's worst position": p.sweep.worstTensionA.tensionB,
      "B's worst position": p.sweep.worstTensionB.tensionB,
    });
    expectWiredTo(r.anchors.b.peakTensionN, p.sweep.worstTensionB.tensionB, {
      "the leash fall": p.leash.caught.tensionB,
      "A's worst position": p.sweep.worstTensionA.tensionA,
    });
    // The sweep's worst points are the highest of its points (independent scan in this test).
    expect(r.sweep.worstTensionA.tensionA).toBe(Math.max(...r.sweep.points.map((q) => q.tensionA)));
    expect(r.sweep.worstTensionB.tensionB).toBe(Math.max(...r.sweep.points.map((q) => q.tensionB)));
    expect(r.sweep.deepestSag.sag).toBe(Math.max(...r.sweep.points.map((q) => q.sag)));
  });

  it("adds the backup's catch to the anchors when it loads them more, but not to the mainline or the brake", () => {
    const rig = steepBackup;
    const r = evaluateRig(rig);
    const p = parts(rig);
    const backup = p.backup!.catch;
    expect(backup.caught.tensionA).toBeGreaterThan(p.peakA); // the backup's catch governs the anchors in this case
    expectWiredTo(r.anchors.a.peakTensionN, backup.caught.tensionA, { "the mainline's peak": p.peakA, "B's": backup.caught.tensionB });
    expectWiredTo(r.anchors.b.peakTensionN, backup.caught.tensionB, { "the mainline's peak": p.peakB, "A's": backup.caught.tensionA });
    const line = r.safetyFactors.find((f) => f.location === "line")!;
    expectWiredTo(line.peakLoad, Math.max(p.peakA, p.peakB), { "the backup's catch": backup.caught.maxTension });
    expectWiredTo(r.brake.peakLineTensionN, p.peakB, { "the anchor's peak with the backup": backup.caught.tensionB });
    const onBackup = r.safetyFactors.find((f) => f.location === "backup")!;
    expectWiredTo(onBackup.peakLoad, backup.caught.maxTension, { "the mainline's peak": Math.max(p.peakA, p.peakB), "A's": backup.caught.tensionA });
    expect(onBackup.mbs).toBe(rig.backup!.mbsN);
    expectWiredTo(r.backupCatch!.peakLoadN, backup.peakLoad, { "the leash fall's": p.leash.peakLoad });
    expectWiredTo(r.backupCatch!.peakTensionAN, backup.caught.tensionA, { "B's": backup.caught.tensionB });
    expectWiredTo(r.backupCatch!.peakTensionBN, backup.caught.tensionB, { "A's": backup.caught.tensionA });
    expectWiredTo(r.backupCatch!.unstretchedLengthM, p.unloaded.variables.length + rig.backup!.slackM!, { "the mainline's": p.unloaded.variables.length });
  });
});

describe("evaluateRig: which load each component is checked against", () => {
  // Bridles of different angles at each end, and a component of each kind at each end.
  const rig = rigWith(steep, {
    anchors: {
      a: {
        layout: { kind: "bridle", includedAngleDeg: 60 },
        components: [
          { name: "A leg sling", category: "sling", mbsN: 60000, carries: "leg" },
          { name: "A master ring", category: "connector", mbsN: 50000, carries: "line" },
        ],
      },
      b: {
        layout: { kind: "bridle", includedAngleDeg: 100 },
        components: [
          { name: "B leg sling", category: "sling", mbsN: 45000, carries: "leg" },
          { name: "B line grip", category: "connector", mbsN: 40000, carries: "line" },
        ],
      },
    },
  });
  // Evaluated in each test (not in the describe body), so mutation testing sees which tests run the engine.
  let r: RigResult;
  let p: ReturnType<typeof parts>;
  beforeEach(() => {
    r = evaluateRig(rig);
    p = parts(rig);
  });
  const factor = (name: string) => r.safetyFactors.find((f) => f.name === name)!;

  it("loads a leg component with its own anchor's bridle leg and a line component with its own anchor's line tension", () => {
    const legA = bridleLeg(p.peakA, 60);
    const legB = bridleLeg(p.peakB, 100);
    expectWiredTo(factor("A leg sling").peakLoad, legA, { "A's line tension": p.peakA, "B's leg": legB });
    expectWiredTo(factor("A master ring").peakLoad, p.peakA, { "A's leg": legA, "B's line tension": p.peakB });
    expectWiredTo(factor("B leg sling").peakLoad, legB, { "B's line tension": p.peakB, "A's leg": legA, "B's tension on A's angle": bridleLeg(p.peakB, 60) });
    expectWiredTo(factor("B line grip").peakLoad, p.peakB, { "B's leg": legB, "A's line tension": p.peakA });
    expectWiredTo(r.anchors.a.leg, legA, { "the master point": p.peakA });
    expectWiredTo(r.anchors.b.masterPoint, p.peakB, { "the leg": legB });
    expect([r.anchors.a.legs, r.anchors.b.legs]).toEqual([2, 2]);
  });

  it("puts each component at its own anchor, with its own strength and category, and the factor is MBS over its load", () => {
    expect(r.safetyFactors.map((f) => [f.name, f.location, f.category, f.mbs])).toEqual([
      [rig.mainline.name, "line", "webbing", rig.mainline.mbsN],
      ["A leg sling", "a", "sling", 60000],
      ["A master ring", "a", "connector", 50000],
      ["B leg sling", "b", "sling", 45000],
      ["B line grip", "b", "connector", 40000],
    ]);
    for (const f of r.safetyFactors) expectWiredTo(f.factor, f.mbs / f.peakLoad, {});
    // The mainline itself carries the higher anchor's tension: at B, 30 m up.
    expectWiredTo(factor(rig.mainline.name).peakLoad, p.peakB, { "A's": p.peakA });
  });

  it("checks a single-point anchor's every component against the line tension", () => {
    const single = rigWith(rig, {
      anchors: { ...rig.anchors, b: { layout: { kind: "single" }, components: [{ name: "B bolt pair", category: "anchor", mbsN: 25000, carries: "leg" }] } },
    });
    const s = evaluateRig(single);
    expectWiredTo(s.safetyFactors.find((f) => f.name === "B bolt pair")!.peakLoad, parts(single).peakB, { "A's": p.peakA });
    expect(s.anchors.b.legs).toBe(1);
  });
});

describe("evaluateRig: which anchor the tensioning system and the brake see", () => {
  it.each(["a", "b"] as const)("with the pretension read at %s, the brake sees that anchor's peak over the brake's advantage", (readAt) => {
    const rig = rigWith(steep, { pretension: { forceN: 3500, readAt } });
    const r = evaluateRig(rig);
    const p = parts(rig);
    const [own, other] = readAt === "a" ? [p.peakA, p.peakB] : [p.peakB, p.peakA];
    // The pretension is met at the anchor it was read at (the length is solved for it).
    expectWiredTo(readAt === "a" ? r.unloaded.tensionAN : r.unloaded.tensionBN, 3500, {
      "the other anchor": readAt === "a" ? p.unloaded.tensionB : p.unloaded.tensionA,
    });
    expectWiredTo(r.brake.peakLineTensionN, own, { "the other anchor's peak": other });
    // The brake holds the tail of a 3:1 on a 2:1 (the example): ideal advantage 6 between brake and line (pulley statics).
    expect(r.tensioning.brakeAdvantage).toBe(6);
    expectWiredTo(r.brake.brakeForce, own / 6, { "the other anchor's peak": other / 6, "the peak on the line": own });
    expectWiredTo(r.tensioning.brakeForceAtPretensionN, 3500 / 6, { "the pretension itself": 3500 });
    // The lowest slip on the bench for this device and rope, 3900 N (the example's slip bench), over the brake force.
    expectWiredTo(r.brake.margin!, 3900 / (own / 6), { "the other anchor's": 3900 / (other / 6) });
    // The haul: the pretension over the hauling advantage, sheave friction included (1 + e + e²)(1 + e), e = 0.92.
    const hauling = (1 + 0.92 + 0.92 ** 2) * (1 + 0.92);
    expectWiredTo(r.tensioning.haulForce, 3500 / hauling, { "the peak": own / hauling, "no friction": 3500 / 6 });
    expect(r.tensioning.peopleNeeded).toBe(Math.ceil(3500 / hauling / 300));
  });

  it("with the brake on the stage at the line, the brake's advantage is that stage's alone", () => {
    const rig = rigWith(steep, { tensioning: { ...plain.tensioning, brake: { on: "stage", stage: 0 } } });
    const r = evaluateRig(rig);
    expect(r.tensioning.brakeAdvantage).toBe(3); // the 3:1 on the line (pulley statics)
    expectWiredTo(r.brake.brakeForce, parts(rig).peakB / 3, { "the whole system's advantage": parts(rig).peakB / 6 });
  });
});

describe("evaluateRig: what weight each line carries", () => {
  it.each([true, false])("the mainline carries its own weight plus the backup's only when the backup rides along (%s)", (ridesAlong) => {
    const rig = rigWith(steep, { backup: { ...plain.backup, ridesAlong } });
    const r = evaluateRig(rig);
    const own = rig.mainline.massPerMetreKg * STANDARD_GRAVITY;
    const both = (rig.mainline.massPerMetreKg + rig.backup!.massPerMetreKg) * STANDARD_GRAVITY;
    const [expected, wrong] = ridesAlong ? [both, own] : [own, both];
    expectWiredTo(r.line.weightPerMetreN, expected, { "the other weight": wrong });
    // The unloaded line and its length follow from that weight: the same pretension solved here on a line of that weight.
    const p = parts(rig);
    const wrongLine = lengthForPretension({ ...mainline(rig), weight: wrong }, 3500, "b", rig.mainline.mbsN);
    expectWiredTo(r.line.unstretchedLengthM, p.unloaded.variables.length, { "the other weight's length": wrongLine.variables.length });
    expectWiredTo(r.unloaded.midSpanSagM, sagAt(p.line, p.unloaded.variables, 60), {
      "the other weight's": sagAt({ ...p.line, weight: wrong }, wrongLine.variables, 60),
    });
    expectWiredTo(r.unloaded.tensionAN, p.unloaded.tensionA, { "the other weight's": wrongLine.tensionA });
  });

  it("the walker weighs mass × g, stands where the input says, and the leash fall drops that mass", () => {
    const rig = rigWith(steep, { walker: { massKg: 90, positionFraction: 0.3 } });
    const r = evaluateRig(rig);
    const p = parts(rig);
    expectWiredTo(r.walker.loadN, 90 * STANDARD_GRAVITY, { "the mass itself": 90 });
    expect(r.walker.positionM).toBe(36); // 0.3 × 120 m
    const standing = solveLine(p.line, p.unloaded.variables.length, { force: 90 * STANDARD_GRAVITY, x: 36 }, rig.mainline.mbsN);
    expectWiredTo(r.walker.tensionAN, standing.tensionA, { "B's": standing.tensionB, "the unloaded line": p.unloaded.tensionA });
    expectWiredTo(r.walker.sagAtWalkerM, standing.loadSag, { "mid-span sag": r.walker.midSpanSagM });
    const light = catchOnLine(p.line, p.unloaded.variables.length, 36, rig.mainline.mbsN, 75, () => 2.2);
    expectWiredTo(r.leashFall.peakLoadN, p.leash.peakLoad, { "a 75 kg walker's": light.peakLoad });
    expect(r.leashFall.positionM).toBe(36); // the fall happens where the walker stands
    expect(r.leashFall.fallHeightM).toBeCloseTo(2.2, 12); // leash 1.2 m + harness 1.0 m above the line
  });

  it("the backup catches with its own weight, not the mainline's nor both", () => {
    const rig = steepBackup;
    const r = evaluateRig(rig);
    const p = parts(rig);
    const { line: backupLine, catch: backup } = p.backup!;
    const heavier = catchOnLine(
      { ...backupLine, weight: p.line.weight },
      backup.caught.variables.length,
      backup.x,
      rig.backup!.mbsN,
      75,
      () => backup.fallHeight,
    );
    expectWiredTo(r.backupCatch!.peakTensionBN, backup.caught.tensionB, { "a backup weighing both lines": heavier.caught.tensionB });
    // The free fall is the leash fall's 2.2 m and the ring's drop onto the slack backup (backup-catch.ts).
    expectWiredTo(r.backupCatch!.fallHeightM, backup.fallHeight, { "the leash fall alone": 2.2 });
  });
});
