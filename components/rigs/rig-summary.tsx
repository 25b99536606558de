import { factorText, loadText } from "@/physics";
import { formatClearance, formatDepth, formatDistance } from "@/lib/rig-form/format";
import type { UnitSystem } from "@/lib/rig-form/quantities";
import type { RigResult, SafetyFactor } from "@/physics";
import { classNames } from "@/lib/class-names";
import type { Evaluation } from "./evaluation";
import { BRAKE_VERDICTS } from "./verdict-words";
import { Verdict } from "./verdict";

/** The lowest safety factor of the rig; on a tie, the failing one first. */
export function lowestFactor(factors: readonly SafetyFactor[]): SafetyFactor | null {
  return factors.reduce<SafetyFactor | null>((low, f) => (low === null || f.factor < low.factor ? f : low), null);
}

interface Headline {
  label: string;
  value: string;
  tone?: "ok" | "danger" | "caution";
}

/** The lower of the two worst clearances over the span (leash fall, backup catch), named by the fall that gives it. */
export function lowestClearanceOf(result: RigResult): { what: string; clearanceM: number; positionM: number; passes: boolean } | null {
  const { leashFall, backupCatch } = result.clearance;
  const falls = [...(leashFall ? [{ what: "leash fall", ...leashFall }] : []), ...(backupCatch ? [{ what: "backup catch", ...backupCatch }] : [])];
  return falls.reduce<(typeof falls)[number] | null>((low, f) => (low === null || f.clearanceM < low.clearanceM ? f : low), null);
}

function clearanceHeadline(result: RigResult, units: UnitSystem): Headline {
  const label = "Lowest clearance after a fall";
  const lowest = lowestClearanceOf(result);
  if (!lowest) return { label, value: result.clearance.groundGiven ? "no leash length" : "no ground given" };
  return {
    label,
    value: `${formatClearance(lowest.clearanceM, units)} (min ${formatClearance(result.clearance.minimumM, units)}), ${lowest.what} at ${formatDistance(lowest.positionM, units)}`,
    tone: lowest.passes ? "ok" : "danger",
  };
}

/** The figures that answer "will it hold" and "will a fall reach the ground", in the order a rigger asks them. */
function headlines(result: RigResult, units: UnitSystem): Headline[] {
  const { sweep, leashFall, brake, safetyFactors, walker } = result;
  const worstWalking = Math.max(sweep.worstTensionA.tensionA, sweep.worstTensionB.tensionB);
  const lowest = lowestFactor(safetyFactors);
  const brakeWord = BRAKE_VERDICTS[brake.verdict];
  return [
    { label: "Worst walking tension", value: loadText(worstWalking, units) },
    { label: "Deepest walker sag", value: formatDepth(sweep.deepestSag.sag, units) },
    {
      label: `Walker at ${formatDistance(walker.positionM, units)}: tension A / B`,
      value: `${loadText(walker.tensionAN, units)} / ${loadText(walker.tensionBN, units)}`,
    },
    { label: `Walker at ${formatDistance(walker.positionM, units)}: sag`, value: formatDepth(walker.sagAtWalkerM, units) },
    { label: "Leash-fall peak at an anchor (upper bound)", value: loadText(leashFall.peakAnchorLoadN, units) },
    clearanceHeadline(result, units),
    lowest
      ? { label: "Lowest safety factor", value: `${lowest.shown} (min ${lowest.minimum}), ${lowest.name}`, tone: lowest.passes ? "ok" : "danger" }
      : { label: "Lowest safety factor", value: "no components" },
    {
      label: "Brake",
      value: brake.margin === null ? brakeWord.word : `${brakeWord.word}, margin ${brake.lowerBoundOnly ? "at least " : ""}${factorText(brake.margin)}`,
      tone: brakeWord.tone,
    },
  ];
}

function NoFigures({ evaluation, compact }: { evaluation: Exclude<Evaluation, { kind: "figures" }>; compact: boolean }) {
  return (
    <div role="status" className={classNames("rounded-panel border-2 border-danger-600 bg-danger-100 text-danger-700", compact ? "p-2 text-sm" : "p-4")}>
      {compact ? <p className="font-semibold">No figures for this input.</p> : <h2 className="text-lg text-danger-700">No figures for this input</h2>}
      <p>
        {evaluation.kind === "input"
          ? evaluation.sentence
          : `The engine could not solve this rig and gives no figures rather than unsure ones: ${evaluation.message}`}
      </p>
    </div>
  );
}

/**
 * The headline figures: a panel beside the diagram on a desk, a strip that stays at the top of the
 * screen on a phone, so the effect of an input deep in the form is seen without scrolling.
 */
export function RigSummary({ evaluation, units, variant }: { evaluation: Evaluation; units: UnitSystem; variant: "panel" | "strip" }) {
  if (evaluation.kind !== "figures") return <NoFigures evaluation={evaluation} compact={variant === "strip"} />;
  const rows = headlines(evaluation.result, units);
  const warnings = evaluation.result.warnings.length + evaluation.gearProblems.length;
  if (variant === "strip") {
    const [worst, sag, , , fall, clearance, lowest, brake] = rows;
    return (
      <dl
        aria-label="Headline figures"
        className="grid grid-cols-2 gap-x-3 gap-y-1 rounded-b-panel border-b-2 border-ink-300 bg-white px-3 py-2 text-sm shadow-panel"
      >
        {[worst, sag, fall, clearance, lowest, brake].map((h) => (
          <div key={h.label} className="min-w-0">
            <dt className="truncate text-xs text-ink-600">{h.label}</dt>
            <dd className={classNames("truncate font-semibold tabular-nums", h.tone === "danger" ? "text-danger-700" : "text-ink-900")}>{h.value}</dd>
          </div>
        ))}
        <div className="min-w-0">
          <dt className="text-xs text-ink-600">Warnings</dt>
          <dd className={classNames("font-semibold", warnings ? "text-danger-700" : "text-ink-900")}>{warnings ? `${warnings}, see below` : "none"}</dd>
        </div>
      </dl>
    );
  }
  return (
    <section aria-labelledby="headline-figures" className="space-y-3 rounded-panel border border-ink-200 bg-white p-4 shadow-panel">
      <h2 id="headline-figures" className="text-lg">
        Headline figures
      </h2>
      <dl className="grid gap-x-6 gap-y-2 sm:grid-cols-2">
        {rows.map((h) => (
          <div key={h.label} className="border-b border-ink-100 pb-1">
            <dt className="text-sm text-ink-600">{h.label}</dt>
            <dd className="text-xl font-semibold tabular-nums text-ink-900">{h.tone ? <Verdict tone={h.tone}>{h.value}</Verdict> : h.value}</dd>
          </div>
        ))}
      </dl>
      {warnings ? (
        <p className="font-semibold text-danger-700">
          {warnings} warning{warnings === 1 ? "" : "s"}: see the list below the figures.
        </p>
      ) : (
        <p className="text-ink-700">No warnings from the engine.</p>
      )}
    </section>
  );
}
