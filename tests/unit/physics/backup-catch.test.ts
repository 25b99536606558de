import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import {
  backupCatchMissing,
  backupFreeFall,
  backupLine,
  createStretchCurve,
  fixedDigits,
  evaluateRig,
  leashFallPeak,
  lineForceDeflection,
  parseRigInput,
  shortestLength,
  solveLine,
  STANDARD_GRAVITY,
} from "../../../physics";
import { refusalOf, relative } from "./fixtures";
import { manyNodeLine, solveManyNodeLine } from "./reference/many-node-line";

const withGround = JSON.parse(readFileSync(new URL("../../../physics/examples/quarry-highline-ground.json", import.meta.url), "utf8"));
const withSlack = (slackM: number) => ({ ...withGround, backup: { ...withGround.backup, slackM } });

/** The mainline before it fails, carrying the backup that rides along (45 g/m each). Built in each test that needs it:
 * engine code run at import or in a describe body would count as covered by no test (mutation testing, DEVELOPERS.md). */
const mainline = () => ({
  span: withGround.spanM,
  rise: withGround.heightDifferenceM,
  weight: (withGround.mainline.massPerMetreKg + withGround.backup.massPerMetreKg) * STANDARD_GRAVITY,
  curve: createStretchCurve(withGround.mainline.stretchPoints),
});
const walkerLoad = withGround.walker.massKg * STANDARD_GRAVITY;

/** The backup alone after the mainline has failed, as the engine sets it up, and the mainline's unstretched length. */
function backupOf(rig: unknown) {
  const result = evaluateRig(rig);
  const backup = backupLine(parseRigInput(rig), result.line.unstretchedLengthM)!;
  return { result, backup };
}

describe("the backup catch", () => {
  it("on a linear backup reduces to the textbook drop onto a spring, F = mg(1 + √(1 + 2k·h_f/(mg))) (dynamics texts), h_f as defined", () => {
    // The ring drops 1.5 m from the loaded mainline (−5 m) to the backup (−6.5 m), after the 2.2 m of harness and leash.
    const h = backupFreeFall(2.2, -5, -6.5, 3);
    expect(h).toBeCloseTo(3.7, 12);
    const k = 900;
    const mg = 80 * STANDARD_GRAVITY;
    const peak = leashFallPeak(80, h, (u) => ({ u, load: k * u, work: (k * u * u) / 2 }));
    expect(relative(peak.peakLoad, mg * (1 + Math.sqrt(1 + (2 * k * h) / mg)))).toBeLessThan(1e-6);
  });

  it("balances the energy at the catch, and matches a dense quadrature of the backup's own P(u) within 0.1 % (independent model in the test)", () => {
    const { result, backup } = backupOf(withGround);
    const c = result.backupCatch!;
    expect(c.upperBound).toBe(true);
    expect(relative(c.energyStoredJ, c.energyInJ)).toBeLessThan(1e-9);
    expect(c.energyInJ).toBeCloseTo(withGround.walker.massKg * STANDARD_GRAVITY * (c.fallHeightM + c.deflectionM), 6);
    // m·g·(h_f + δ) = ∫₀^δ P du with the work summed by the trapezoid rule over 4000 steps.
    const load = lineForceDeflection(backup.line, backup.length, c.positionM, backup.mbs).load;
    const weight = withGround.walker.massKg * STANDARD_GRAVITY;
    const steps = 4000;
    const du = (1.5 * c.deflectionM) / steps;
    let work = 0;
    let previous = 0;
    let deflection = NaN;
    for (let i = 1; i <= steps && Number.isNaN(deflection); i++) {
      const current = load(i * du);
      const next = work + (du * (previous + current)) / 2;
      const before = work - weight * (c.fallHeightM + (i - 1) * du);
      const after = next - weight * (c.fallHeightM + i * du);
      if (before <= 0 && after > 0) deflection = (i - 1) * du - (du * before) / (after - before);
      work = next;
      previous = current;
    }
    expect(relative(c.deflectionM, deflection)).toBeLessThan(1e-3);
    expect(relative(c.peakLoadN, load(deflection))).toBeLessThan(1e-3);
  });

  it("clamps the drop: a backup hanging above the ring catches at once (free fall = harness + leash only)", () => {
    // No slack: the backup, carrying only its own weight, hangs above the mainline under the walker.
    const { result, backup } = backupOf(withSlack(0));
    const x = result.backupCatch!.positionM;
    const mainlineY = solveLine(mainline(), result.line.unstretchedLengthM, { force: walkerLoad, x }, withGround.mainline.mbsN).loadY;
    const backupY = solveLine(backup.line, backup.length, { force: 0, x }, backup.mbs).loadY;
    expect(backupY).toBeGreaterThan(mainlineY);
    expect(result.backupCatch!.fallHeightM).toBe(2.2);
  });

  it("with slack, adds the ring's drop from the loaded mainline to the unloaded backup (each solved on its own here)", () => {
    const { result, backup } = backupOf(withSlack(4));
    const x = result.backupCatch!.positionM;
    const mainlineY = solveLine(mainline(), result.line.unstretchedLengthM, { force: walkerLoad, x }, withGround.mainline.mbsN).loadY;
    const backupY = solveLine(backup.line, backup.length, { force: 0, x }, backup.mbs).loadY;
    expect(mainlineY).toBeGreaterThan(backupY);
    expect(result.backupCatch!.fallHeightM).toBeCloseTo(2.2 + mainlineY - backupY, 9);
    expect(result.backupCatch!.lowestPointM).toBeCloseTo(backupY - result.backupCatch!.deflectionM - 1.2 - 1.2, 9);
  });

  it("loads the anchors and joins the safety-factor table", () => {
    const result = evaluateRig(withGround);
    const c = result.backupCatch!;
    expect(result.anchors.a.peakTensionN).toBe(
      Math.max(result.sweep.worstTensionA.tensionA, result.leashFall.peakTensionAN, result.unloaded.tensionAN, c.peakTensionAN),
    );
    expect(result.anchors.b.peakTensionN).toBe(
      Math.max(result.sweep.worstTensionB.tensionB, result.leashFall.peakTensionBN, result.unloaded.tensionBN, c.peakTensionBN),
    );
    const factor = result.safetyFactors.find((f) => f.location === "backup")!;
    expect(factor.mbs).toBe(withGround.backup.mbsN);
    expect(factor.peakLoad).toBe(c.peakAnchorLoadN);
  });

  it("is null without a backup stretch curve, and says so", () => {
    const result = evaluateRig({ ...withGround, backup: { ...withGround.backup, stretchPoints: undefined } });
    expect(result.backupCatch).toBeNull();
    expect(result.clearance.backupCatch).toBeNull();
    expect(result.backupCatchMissing).toMatch(/No stretch points for the backup/);
    expect(result.safetyFactors.some((f) => f.location === "backup")).toBe(false);
  });

  it("is not worked out with no backup at all, and says so", () => {
    expect(backupCatchMissing(parseRigInput({ ...withGround, backup: undefined }))).toBe("No backup given: its catch is not worked out.");
    expect(backupCatchMissing(parseRigInput(withGround))).toBeNull();
  });

  // The backup must reach the anchors without passing its MBS: at its shortest length it hangs at exactly that
  // (shortestLength, checked in solve-line's tests). Equal is allowed, shorter is refused with the least slack.
  it("refuses a slack that leaves the backup shorter than its shortest length, stating the least slack", () => {
    const rig = parseRigInput(withGround);
    const line = {
      span: rig.spanM,
      rise: rig.heightDifferenceM,
      weight: rig.backup!.massPerMetreKg * STANDARD_GRAVITY,
      curve: createStretchCurve(rig.backup!.stretchPoints!),
    };
    const shortest = shortestLength(line, rig.backup!.mbsN);
    const slackM = rig.backup!.slackM!;
    expect(backupLine(rig, shortest - slackM)!.length).toBe(shortest);
    const mainLength = shortest - slackM - 0.01;
    expect(refusalOf(() => backupLine(rig, mainLength))).toMatchObject({
      field: "backup.slackM",
      given: String(slackM),
      allowed: `a slack of at least ${fixedDigits(shortest - mainLength, 3, "up")} m: any less and the backup alone would stretch past its MBS to reach the anchors`,
    });
  });

  it("refuses a fall onto the backup of more than 100 m, naming the slack; 100 m itself is taken", () => {
    expect(backupFreeFall(2, 0, -98, 3)).toBe(100);
    expect(refusalOf(() => backupFreeFall(2, 0, -98.5, 3))).toMatchObject({
      field: "backup.slackM",
      given: "3",
      allowed: "a slack that keeps the fall onto the backup within 100 m",
    });
  });

  it("is null without the backup's slack, and says so (a rig saved before the slack was asked for still evaluates)", () => {
    const result = evaluateRig({ ...withGround, backup: { ...withGround.backup, slackM: undefined } });
    expect(result.backupCatch).toBeNull();
    expect(result.backupCatchMissing).toMatch(/No slack given for the backup/);
  });

  it.each([
    ["a negative slack", { slackM: -0.5 }, "backup.slackM"],
    [
      "a curve that is not increasing",
      {
        stretchPoints: [
          { tensionKN: 0, elongationPct: 0 },
          { tensionKN: 2, elongationPct: 2 },
          { tensionKN: 1.5, elongationPct: 3 },
        ],
      },
      "backup.stretchPoints.2.tensionKN",
    ],
  ])("rejects %s with a typed error naming the field", (_, change, field) => {
    expect(() => evaluateRig({ ...withGround, backup: { ...withGround.backup, ...change } })).toThrow(
      expect.objectContaining({ name: "RigInputError", field }),
    );
  });
});

describe("the backup's static states against the independent many-node model (400 elements, Newton on node positions)", () => {
  for (const [what, loaded] of [
    ["hanging under its own weight", false],
    ["holding the catch's peak load", true],
  ] as const) {
    it(`${what}: anchor tensions and the height at the load within 0.2 %`, () => {
      const { result, backup } = backupOf(withSlack(2));
      const force = loaded ? result.backupCatch!.peakLoadN : 0;
      const model = solveManyNodeLine(manyNodeLine(backup.line, backup.length, withGround.backup.stretchPoints, force, 0.5, 400));
      const s = solveLine(backup.line, backup.length, { force, x: model.walkerX }, backup.mbs);
      expect(relative(s.tensionA, model.tensionA)).toBeLessThan(2e-3);
      expect(relative(s.tensionB, model.tensionB)).toBeLessThan(2e-3);
      expect(relative(s.loadY, model.walkerY)).toBeLessThan(2e-3);
    });
  }
});

describe("a backup with an empty list of stretch points", () => {
  it("has no curve: its catch is not worked out, and it is not an error", () => {
    const result = evaluateRig({ ...withGround, backup: { ...withGround.backup, stretchPoints: [] } });
    expect(result.backupCatch).toBeNull();
    expect(result.backupCatchMissing).toMatch(/No stretch points/);
  });
});
