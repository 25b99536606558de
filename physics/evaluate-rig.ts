import { forceText, forceUnitOf, lengthText, loadText, type DisplayUnits } from "./display";
import { anchorLoads, anchorWarnings, type AnchorLoads } from "./bridle";
import { backupCatchMissing, backupFreeFall, backupLine } from "./backup-catch";
import { checkBrake, type BrakeCheck } from "./brake-check";
import { CAUTIONS } from "./cautions";
import { lowestClearance, RULE_OF_THUMB, type LowestClearance } from "./clearance";
import { checkGround, groundHeightAt, type GroundPoint } from "./ground";
import { catchOnLine, type CatchHint, type LineCatch } from "./line-catch";
import type { Line, LineVariables } from "./line-equations";
import { lineProfile, sagAt } from "./line-profile";
import { nearestHints } from "./nearest-hint";
import { parseRigInput } from "./parse-rig-input";
import { analysePulleySystem, type PulleyAnalysis } from "./pulley-system";
import { RigInputError } from "./rig-input-error";
import type { RigInput } from "./rig-schema";
import { safetyFactors, type LoadedComponent, type SafetyFactor } from "./safety-factors";
import { solveLine, type LineSolution } from "./solve-line";
import { sweepWalker, type Sweep } from "./sweep";
import { lengthForPretension } from "./unstretched-length";
import { rigLine } from "./rig-line";
import { STANDARD_GRAVITY } from "./units";
import { ENGINE_VERSION } from "./version";

/** One equilibrium, as reported. Forces N, lengths m. */
export interface LineState {
  tensionAN: number;
  tensionBN: number;
  horizontalTensionN: number;
  midSpanSagM: number;
  /** Elongation of the mainline over its unstretched length, fraction. */
  elongation: number;
  iterations: number;
  profile: { x: number; y: number }[];
}

export interface AnchorResult extends AnchorLoads {
  /** Highest line tension at this anchor: walker anywhere on the line, or the leash fall. */
  peakTensionN: number;
}

/** A fall caught by a line: the leash fall on the mainline, or the backup's catch. An upper bound (no damping). */
export interface CatchResult {
  upperBound: true;
  note: string;
  positionM: number;
  fallHeightM: number;
  peakLoadN: number;
  deflectionM: number;
  peakTensionAN: number;
  peakTensionBN: number;
  peakAnchorLoadN: number;
  energyInJ: number;
  energyStoredJ: number;
  /** The walker's lowest point, height relative to A (m); null without a leash length. */
  lowestPointM: number | null;
  /** Lowest point above the ground there (m); null without ground or leash length. */
  groundClearanceM: number | null;
}

export interface WorstClearance extends LowestClearance {
  /** At least the crew's minimum clearance. */
  passes: boolean;
}

export interface ClearanceResult {
  groundGiven: boolean;
  /** What the clearance figures rest on, or why there are none. */
  note: string;
  /** The crew's minimum between the walker's lowest point and the ground, m. */
  minimumM: number;
  /** The lowest clearance over fall positions along the span, and where; null without ground (or leash length, or backup curve). */
  leashFall: WorstClearance | null;
  backupCatch: WorstClearance | null;
  /** The trade's rule of thumb, shown beside the computed figures. */
  ruleOfThumb: {
    source: string;
    heightAboveGroundM: number;
    /** The unloaded line's height above the ground at mid-span, m; null without ground. */
    midSpanHeightAboveGroundM: number | null;
  };
}

/** Everything evaluateRig returns; plain JSON (no functions, no Infinity, null where a value does not apply). */
export interface RigResult {
  engineVersion: string;
  units: { force: "N"; length: "m"; mass: "kg"; energy: "J" };
  line: { unstretchedLengthM: number; weightPerMetreN: number; chordM: number };
  unloaded: LineState;
  walker: LineState & { positionM: number; loadN: number; sagAtWalkerM: number };
  sweep: Sweep;
  leashFall: CatchResult & {
    /** How far the walker's lowest point hangs below the harness tie-in. */
    hangBelowTieInM: number;
  };
  /** The mainline fails with the walker standing at the fall position and the backup catches alone; null without a backup stretch curve. */
  backupCatch: (CatchResult & { unstretchedLengthM: number; extrapolated: boolean }) | null;
  /** Why there is no backup catch, or null when there is one. */
  backupCatchMissing: string | null;
  clearance: ClearanceResult;
  tensioning: PulleyAnalysis & { brakeForceAtPretensionN: number };
  brake: BrakeCheck & { peakLineTensionN: number };
  anchors: { a: AnchorResult; b: AnchorResult };
  safetyFactors: SafetyFactor[];
  /** True when some tension is beyond the last measured point of the stretch curve. */
  extrapolated: boolean;
  warnings: string[];
  cautions: readonly string[];
}

function lineState(line: Line, s: LineSolution): LineState {
  return {
    tensionAN: s.tensionA,
    tensionBN: s.tensionB,
    horizontalTensionN: s.variables.H,
    midSpanSagM: sagAt(line, s.variables, line.span / 2),
    elongation: s.elongation,
    iterations: s.iterations,
    profile: lineProfile(line, s.variables),
  };
}

function walkerPosition(rig: RigInput): number {
  const { positionFraction, positionM } = rig.walker;
  if (positionFraction !== undefined && positionM !== undefined) {
    throw new RigInputError("walker", rig.walker, "either positionFraction or positionM, not both");
  }
  if (positionM !== undefined) {
    if (positionM > rig.spanM) throw new RigInputError("walker.positionM", positionM, `a distance from anchor A from 0 m to the span, ${rig.spanM} m`);
    return positionM;
  }
  return (positionFraction ?? 0.5) * rig.spanM;
}

function fallHeight(rig: RigInput): number {
  const { fallHeightM, leashLengthM, harnessHeightM } = rig.leashFall;
  if (fallHeightM !== undefined) return fallHeightM;
  if (leashLengthM === undefined || harnessHeightM === undefined) {
    throw new RigInputError(
      "leashFall",
      rig.leashFall,
      "a free-fall height, or both a leash length and a harness height above the line (the fall is the leash length plus the harness height)",
    );
  }
  if (leashLengthM + harnessHeightM > 100) {
    throw new RigInputError(
      "leashFall.leashLengthM",
      leashLengthM,
      `a leash length that, with the harness height of ${harnessHeightM} m, makes a free fall of at most 100 m`,
    );
  }
  return leashLengthM + harnessHeightM;
}

/** Where the leash fall happens; the line cannot deflect at an anchor, so the fall must be between them. */
function fallPosition(rig: RigInput, walkerX: number): number {
  const given = rig.leashFall.positionFraction;
  const x = given === undefined ? walkerX : given * rig.spanM;
  if (x > 0 && x < rig.spanM) return x;
  if (given !== undefined)
    throw new RigInputError("leashFall.positionFraction", given, "a fraction of the span strictly between 0 and 1: the line cannot deflect at an anchor");
  const field = rig.walker.positionM === undefined ? "walker.positionFraction" : "walker.positionM";
  throw new RigInputError(
    field,
    rig.walker.positionM ?? rig.walker.positionFraction,
    "a position between the anchors, or a leash-fall position (leashFall.positionFraction, between 0 and 1) when the walker stands at an anchor",
  );
}

/** The unloaded line's height above the ground at mid-span: what the rule of thumb speaks of. */
function midSpanHeightAboveGround(line: Line, unloaded: LineVariables, ground: readonly GroundPoint[]): number {
  const x = line.span / 2;
  return line.rise / 2 - sagAt(line, unloaded, x) - groundHeightAt(ground, x);
}

const LEASH_FALL_NOTE = "No damping and no give in leash or harness: an upper bound on the peak loads, not a prediction.";

function catchResult(c: LineCatch, lowestPointM: number | null, groundClearanceM: number | null): CatchResult {
  return {
    upperBound: true,
    note: LEASH_FALL_NOTE,
    positionM: c.x,
    fallHeightM: c.fallHeight,
    peakLoadN: c.peakLoad,
    deflectionM: c.deflection,
    peakTensionAN: c.caught.tensionA,
    peakTensionBN: c.caught.tensionB,
    peakAnchorLoadN: c.caught.maxTension,
    energyInJ: c.energyIn,
    energyStoredJ: c.energyStored,
    lowestPointM,
    groundClearanceM,
  };
}

/** Evaluates a rig: tensions, sag, sweep, leash fall, pulley system, brake, anchors and safety factors. */
/**
 * Evaluates a rig. `wording.units` chooses only the units its sentences (warnings, the brake's verdict) are
 * written in, for the crew reading them; every figure of the result stays in SI.
 */
export function evaluateRig(input: unknown, wording: { units: DisplayUnits } = { units: "si" }): RigResult {
  const { units } = wording;
  const rig = parseRigInput(input);
  const warnings: string[] = [];
  const mbs = rig.mainline.mbsN;
  if (Math.abs(rig.heightDifferenceM) > rig.spanM) {
    throw new RigInputError("heightDifferenceM", rig.heightDifferenceM, `a height difference no larger than the span (|h| ≤ ${rig.spanM} m)`);
  }
  if (rig.pretension.forceN >= mbs) {
    throw new RigInputError("pretension.forceN", rig.pretension.forceN, `a pretension > 0 N and below the mainline's MBS, ${mbs} N`);
  }
  const line = rigLine(rig);
  const walkerX = walkerPosition(rig);
  const walkerLoad = rig.walker.massKg * STANDARD_GRAVITY;
  const fall = fallHeight(rig);
  const fallX = fallPosition(rig, walkerX);

  const unloaded = lengthForPretension(line, rig.pretension.forceN, rig.pretension.readAt, mbs);
  const length = unloaded.variables.length;
  const walker = solveLine(line, length, { force: walkerLoad, x: walkerX }, mbs);
  const sweep = sweepWalker(line, length, walkerLoad, mbs);

  const ground = rig.ground ? checkGround(rig.ground.points, rig.spanM) : null;
  const leash = rig.leashFall.leashLengthM;
  const hang = rig.leashFall.hangBelowTieInM;
  // The walker's lowest point hangs the leash and the body below the line where it stopped.
  const lowestPoint = (c: LineCatch) => (leash === undefined ? null : c.unloadedY - c.deflection - leash - hang);
  const clearanceOf = (c: LineCatch) => {
    const lowest = lowestPoint(c);
    return lowest === null || ground === null ? null : lowest - groundHeightAt(ground, c.x);
  };
  const mass = rig.walker.massKg;
  const leashFallAt = (x: number, hint?: CatchHint) => catchOnLine(line, length, x, mbs, mass, () => fall, hint);
  const leashCatch = leashFallAt(fallX);

  const backup = backupLine(rig, length);
  const backupAt = backup
    ? (x: number, hint?: { main?: LineVariables; catch?: CatchHint }) => {
        const mainlineY = solveLine(line, length, { force: walkerLoad, x }, mbs, hint?.main);
        const fallOntoBackup = (backupY: number) => backupFreeFall(fall, mainlineY.loadY, backupY, backup.slack);
        const c = catchOnLine(backup.line, backup.length, x, backup.mbs, mass, fallOntoBackup, hint?.catch);
        return { catch: c, main: mainlineY.variables };
      }
    : null;
  const backupAtFall = backupAt ? backupAt(fallX) : null;
  const backupCatch = backupAtFall?.catch ?? null;

  const peakA = Math.max(sweep.worstTensionA.tensionA, leashCatch.caught.tensionA, unloaded.tensionA);
  const peakB = Math.max(sweep.worstTensionB.tensionB, leashCatch.caught.tensionB, unloaded.tensionB);
  const peakLine = Math.max(peakA, peakB);
  // The anchors carry the backup too when it catches.
  const anchorPeakA = Math.max(peakA, backupCatch?.caught.tensionA ?? 0);
  const anchorPeakB = Math.max(peakB, backupCatch?.caught.tensionB ?? 0);

  const tensioning = analysePulleySystem(
    { stages: rig.tensioning.stages.map((s) => s.ratio), sheaveEfficiency: rig.tensioning.sheaveEfficiency, brake: rig.tensioning.brake },
    rig.pretension.forceN,
    rig.tensioning.pullPerPersonN,
  );
  const peakAtTensioner = rig.pretension.readAt === "a" ? peakA : peakB;
  const brake = checkBrake(
    rig.brake.device,
    rig.brake.ropeDiameterMm,
    rig.slipBench,
    peakAtTensioner,
    tensioning.brakeAdvantage,
    rig.minimumBrakeMargin,
    units,
  );

  const anchors = {
    a: { ...anchorLoads(rig.anchors.a.layout, anchorPeakA, "anchors.a.layout"), peakTensionN: anchorPeakA },
    b: { ...anchorLoads(rig.anchors.b.layout, anchorPeakB, "anchors.b.layout"), peakTensionN: anchorPeakB },
  };
  const components: LoadedComponent[] = [
    { name: rig.mainline.name, category: "webbing", location: "line", mbs, peakLoad: peakLine },
    ...(backup && backupCatch
      ? [{ name: backup.name, category: "webbing" as const, location: "backup" as const, mbs: backup.mbs, peakLoad: backupCatch.caught.maxTension }]
      : []),
    ...(["a", "b"] as const).flatMap((side) =>
      rig.anchors[side].components.map((c) => ({
        name: c.name,
        category: c.category,
        location: side,
        mbs: c.mbsN,
        peakLoad: c.carries === "line" ? anchors[side].masterPoint : anchors[side].leg,
      })),
    ),
  ];
  const factors = safetyFactors(components, rig.minimumSafetyFactors);

  // A stretch point is a measurement, neither a load nor a capacity: to the nearest shown step.
  const measured = (newtons: number) => forceText(newtons, forceUnitOf(units), "nearest");
  const extrapolated = peakLine > line.curve.lastMeasuredTension;
  if (extrapolated) {
    warnings.push(
      `Peak tension ${loadText(peakLine, units)} is beyond the stretch curve's last measured point (${measured(line.curve.lastMeasuredTension)}): the curve is extrapolated with its last stiffness.`,
    );
  }
  for (const f of factors.filter((f) => !f.passes)) {
    warnings.push(
      `${f.name} (${f.location === "line" ? "line" : f.location === "backup" ? "backup, catching a fall" : `anchor ${f.location}`}): safety factor ${f.shown} is below the crew minimum of ${f.minimum}.`,
    );
  }
  if (brake.verdict !== "holds") warnings.push(brake.message);
  if (backupCatch?.caught.extrapolated) {
    warnings.push(
      `The backup's peak tension at the catch, ${loadText(backupCatch.caught.maxTension, units)}, is beyond its stretch curve's last measured point (${measured(backup!.line.curve.lastMeasuredTension)}): the curve is extrapolated with its last stiffness.`,
    );
  }

  const leashHints = nearestHints<CatchHint>();
  leashHints.add(fallX, leashCatch.hint);
  const backupHints = nearestHints<{ main: LineVariables; catch: CatchHint }>();
  const canClear = ground !== null && leash !== undefined;
  const worst = (lowestPointAt: (x: number) => number): WorstClearance => {
    const lowest = lowestClearance(
      rig.spanM,
      rig.heightDifferenceM,
      leash! + hang,
      (x) => groundHeightAt(ground!, x),
      ground!.map((p) => p.xM),
      lowestPointAt,
    );
    return { ...lowest, passes: lowest.clearanceM >= rig.minimumClearanceM };
  };
  const clearance: ClearanceResult = {
    groundGiven: ground !== null,
    note:
      ground === null
        ? "No ground was given: the walker's lowest points are heights relative to anchor A, and there are no clearances."
        : leash === undefined
          ? "No leash length was given (only a free-fall height): the walker's lowest point and the clearances need it."
          : "Clearance: the walker's lowest point (the line's unloaded height there, less the catch deflection, the leash and the body below the tie-in) above the ground; the lowest over fall positions from 1 % to 99 % of the span.",
    minimumM: rig.minimumClearanceM,
    leashFall: canClear
      ? worst((x) => {
          // The search may come back to the fall position itself: that catch is already worked out.
          const c = x === fallX ? leashCatch : leashFallAt(x, leashHints.nearest(x));
          leashHints.add(x, c.hint);
          return lowestPoint(c)!;
        })
      : null,
    backupCatch:
      canClear && backupAt
        ? worst((x) => {
            const c = x === fallX ? backupAtFall! : backupAt(x, backupHints.nearest(x));
            backupHints.add(x, { main: c.main, catch: c.catch.hint });
            return lowestPoint(c.catch)!;
          })
        : null,
    ruleOfThumb: {
      source: RULE_OF_THUMB.source,
      heightAboveGroundM: RULE_OF_THUMB.heightAboveGroundM(rig.spanM),
      midSpanHeightAboveGroundM: ground ? midSpanHeightAboveGround(line, unloaded.variables, ground) : null,
    },
  };
  for (const [what, worst] of [
    ["A leash fall", clearance.leashFall],
    ["A fall caught by the backup", clearance.backupCatch],
  ] as const) {
    if (worst && !worst.passes) {
      const gap =
        worst.clearanceM >= 0
          ? `leaves ${lengthText(worst.clearanceM, units, "down")} between the walker's lowest point and the ground`
          : `reaches the ground: the walker's lowest point would be ${lengthText(-worst.clearanceM, units, "up")} below it`;
      warnings.push(
        `${what} at ${lengthText(worst.positionM, units, "nearest")} from A ${gap}; the crew's minimum clearance is ${lengthText(clearance.minimumM, units, "nearest")}.`,
      );
    }
  }
  for (const side of ["a", "b"] as const)
    warnings.push(...anchorWarnings(side, rig.anchors[side].layout, rig.anchors[side].components.length, anchors[side], units));

  return {
    engineVersion: ENGINE_VERSION,
    units: { force: "N", length: "m", mass: "kg", energy: "J" },
    line: { unstretchedLengthM: length, weightPerMetreN: line.weight, chordM: Math.hypot(line.span, line.rise) },
    unloaded: lineState(line, unloaded),
    walker: { ...lineState(line, walker), positionM: walkerX, loadN: walkerLoad, sagAtWalkerM: walker.loadSag },
    sweep,
    leashFall: { ...catchResult(leashCatch, lowestPoint(leashCatch), clearanceOf(leashCatch)), hangBelowTieInM: hang },
    backupCatch:
      backup && backupCatch
        ? {
            ...catchResult(backupCatch, lowestPoint(backupCatch), clearanceOf(backupCatch)),
            note: "The mainline fails with the walker standing here and the backup catches alone: no damping, no give in leash or harness, an upper bound.",
            unstretchedLengthM: backup.length,
            extrapolated: backupCatch.caught.extrapolated,
          }
        : null,
    backupCatchMissing: backupCatchMissing(rig),
    clearance,
    tensioning: { ...tensioning, brakeForceAtPretensionN: rig.pretension.forceN / tensioning.brakeAdvantage },
    brake: { ...brake, peakLineTensionN: peakAtTensioner },
    anchors,
    safetyFactors: factors,
    extrapolated: extrapolated || (backupCatch?.caught.extrapolated ?? false),
    warnings,
    cautions: CAUTIONS,
  };
}
