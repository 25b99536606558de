import { roundUp } from "./display";
import { anchorLoads, type AnchorLoads } from "./bridle";
import { checkBrake, type BrakeCheck } from "./brake-check";
import { CAUTIONS } from "./cautions";
import { leashFallPeak } from "./leash-fall";
import { lineForceDeflection } from "./line-force-deflection";
import type { Line } from "./line-equations";
import { lineProfile, sagAt } from "./line-profile";
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

/** Everything evaluateRig returns; plain JSON (no functions, no Infinity, null where a value does not apply). */
export interface RigResult {
  engineVersion: string;
  units: { force: "N"; length: "m"; mass: "kg"; energy: "J" };
  line: { unstretchedLengthM: number; weightPerMetreN: number; chordM: number };
  unloaded: LineState;
  walker: LineState & { positionM: number; loadN: number; sagAtWalkerM: number };
  sweep: Sweep;
  leashFall: {
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
  };
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
      "fallHeightM, or both leashLengthM and harnessHeightM (the fall is leash length + harness height above the line)",
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

/** Evaluates a rig: tensions, sag, sweep, leash fall, pulley system, brake, anchors and safety factors. */
export function evaluateRig(input: unknown): RigResult {
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

  const forceDeflection = lineForceDeflection(line, length, fallX, mbs);
  const fallPeak = leashFallPeak(rig.walker.massKg, fall, forceDeflection.load, forceDeflection.kinkBetween);
  const caught = solveLine(line, length, { force: fallPeak.peakLoad, x: fallX }, mbs);

  const peakA = Math.max(sweep.worstTensionA.tensionA, caught.tensionA, unloaded.tensionA);
  const peakB = Math.max(sweep.worstTensionB.tensionB, caught.tensionB, unloaded.tensionB);
  const peakLine = Math.max(peakA, peakB);

  const tensioning = analysePulleySystem(
    { stages: rig.tensioning.stages.map((s) => s.ratio), sheaveEfficiency: rig.tensioning.sheaveEfficiency, brake: rig.tensioning.brake },
    rig.pretension.forceN,
    rig.tensioning.pullPerPersonN,
  );
  const peakAtTensioner = rig.pretension.readAt === "a" ? peakA : peakB;
  const brake = checkBrake(rig.brake.device, rig.brake.ropeDiameterMm, rig.slipBench, peakAtTensioner, tensioning.brakeAdvantage);

  const anchors = {
    a: { ...anchorLoads(rig.anchors.a.layout, peakA, "anchors.a.layout"), peakTensionN: peakA },
    b: { ...anchorLoads(rig.anchors.b.layout, peakB, "anchors.b.layout"), peakTensionN: peakB },
  };
  const components: LoadedComponent[] = [
    { name: rig.mainline.name, category: "webbing", location: "line", mbs, peakLoad: peakLine },
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

  const extrapolated = peakLine > line.curve.lastMeasuredTension;
  if (extrapolated) {
    warnings.push(
      `Peak tension ${roundUp(peakLine / 1000)} kN is beyond the stretch curve's last measured point (${(line.curve.lastMeasuredTension / 1000).toFixed(2)} kN): the curve is extrapolated with its last stiffness.`,
    );
  }
  for (const f of factors.filter((f) => !f.passes)) {
    warnings.push(
      `${f.name} (${f.location === "line" ? "line" : `anchor ${f.location}`}): safety factor ${f.shown} is below the crew minimum of ${f.minimum}.`,
    );
  }
  if (brake.verdict !== "holds") warnings.push(brake.message);
  for (const side of ["a", "b"] as const) {
    const layout = rig.anchors[side].layout;
    if (layout.kind === "bridle" && layout.includedAngleDeg > 120) {
      warnings.push(`Anchor ${side}: a bridle angle of ${layout.includedAngleDeg}° puts more than the line tension on each leg.`);
    }
  }

  return {
    engineVersion: ENGINE_VERSION,
    units: { force: "N", length: "m", mass: "kg", energy: "J" },
    line: { unstretchedLengthM: length, weightPerMetreN: line.weight, chordM: Math.hypot(line.span, line.rise) },
    unloaded: lineState(line, unloaded),
    walker: { ...lineState(line, walker), positionM: walkerX, loadN: walkerLoad, sagAtWalkerM: walker.loadSag },
    sweep,
    leashFall: {
      upperBound: true,
      note: "No damping and no give in leash or harness: an upper bound on the peak loads, not a prediction.",
      positionM: fallX,
      fallHeightM: fall,
      peakLoadN: fallPeak.peakLoad,
      deflectionM: fallPeak.deflection,
      peakTensionAN: caught.tensionA,
      peakTensionBN: caught.tensionB,
      peakAnchorLoadN: caught.maxTension,
      energyInJ: fallPeak.energyIn,
      energyStoredJ: fallPeak.energyStored,
    },
    tensioning: { ...tensioning, brakeForceAtPretensionN: rig.pretension.forceN / tensioning.brakeAdvantage },
    brake: { ...brake, peakLineTensionN: peakAtTensioner },
    anchors,
    safetyFactors: factors,
    extrapolated,
    warnings,
    cautions: CAUTIONS,
  };
}
