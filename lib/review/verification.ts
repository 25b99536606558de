import { ENGINE_VERSION, RigInputError, SolveError, evaluateRig, factorText, loadText, type RigResult } from "@/physics";
import { formatDepth } from "@/lib/rig-form/format";
import type { UnitSystem } from "@/lib/rig-form/quantities";
import { contentHash, type SignedContent } from "./content-hash";

// What the rig's page says of a sign-off: whether the stored content still hashes to what was signed,
// and whether today's engine gives the same figures for the signed inputs.

interface Figure {
  label: string;
  value: (r: RigResult) => number | null;
  shown: (value: number, units: UnitSystem) => string;
}

const load = (label: string, value: Figure["value"]): Figure => ({ label, value, shown: loadText });

const HEADLINE_FIGURES: Figure[] = [
  load("Pretension at anchor A", (r) => r.unloaded.tensionAN),
  load("Pretension at anchor B", (r) => r.unloaded.tensionBN),
  { label: "Sag at mid-span, nobody on the line", value: (r) => r.unloaded.midSpanSagM, shown: formatDepth },
  load("Walking tension at anchor A", (r) => r.walker.tensionAN),
  load("Walking tension at anchor B", (r) => r.walker.tensionBN),
  { label: "Sag under the walker", value: (r) => r.walker.sagAtWalkerM, shown: formatDepth },
  load("Leash-fall peak load", (r) => r.leashFall.peakLoadN),
  load("Peak tension at anchor A", (r) => r.anchors.a.peakTensionN),
  load("Peak tension at anchor B", (r) => r.anchors.b.peakTensionN),
  load("Force on the brake at peak tension", (r) => r.brake.brakeForce),
  { label: "Brake margin", value: (r) => r.brake.margin, shown: (v) => factorText(v) },
];

/** Every figure compared: the headline ones and each component's safety factor, matched by name and place. */
function figuresOf(result: RigResult): Figure[] {
  const factors = result.safetyFactors.map((f, i): Figure => {
    const place = f.location === "line" ? "line" : `anchor ${f.location.toUpperCase()}`;
    return { label: `Safety factor of ${f.name} (${place})`, value: (r) => r.safetyFactors[i]?.factor ?? null, shown: (v) => factorText(v) };
  });
  return [...HEADLINE_FIGURES, ...factors];
}

export interface MovedFigure {
  label: string;
  then: string;
  now: string;
  /** Change from the signed figure, percent of it. */
  changePercent: number;
}

export type Reevaluation =
  | { kind: "same"; engineThen: string; engineNow: string }
  | { kind: "moved"; engineThen: string; engineNow: string; moved: MovedFigure[] }
  | { kind: "refused"; engineThen: string; engineNow: string; reason: string };

export interface Verification {
  hashMatches: boolean;
  reevaluation: Reevaluation;
}

// Browser and server engines, or two V8 versions, may differ in the last bits (about 1e-12 relative):
// that is not a figure moving.
const SAME = 1e-9;

/** Re-evaluates signed inputs with today's engine and lists the figures that moved, in the crew's units. */
export function reevaluate(signed: SignedContent & { result: RigResult }, units: UnitSystem): Reevaluation {
  const versions = { engineThen: signed.engineVersion, engineNow: ENGINE_VERSION };
  let now: RigResult;
  try {
    now = evaluateRig(signed.inputs);
  } catch (error) {
    if (error instanceof RigInputError || error instanceof SolveError) return { kind: "refused", ...versions, reason: error.message };
    throw error;
  }
  const moved: MovedFigure[] = [];
  for (const figure of figuresOf(signed.result)) {
    const then = figure.value(signed.result);
    const today = figure.value(now);
    if (then === null && today === null) continue;
    if (then === null || today === null || Math.abs(today - then) > SAME * Math.max(Math.abs(then), 1e-300)) {
      moved.push({
        label: figure.label,
        then: then === null ? "—" : figure.shown(then, units),
        now: today === null ? "—" : figure.shown(today, units),
        changePercent: then && today !== null ? ((today - then) / then) * 100 : Number.NaN,
      });
    }
  }
  return moved.length ? { kind: "moved", ...versions, moved } : { kind: "same", ...versions };
}

/** Checks a sign-off against the revision as stored now. */
export function verifySignOff(revision: SignedContent & { result: RigResult }, signedHash: string, units: UnitSystem): Verification {
  return { hashMatches: contentHash(revision) === signedHash, reevaluation: reevaluate(revision, units) };
}
