"use client";

import { capacityText, factorText, loadText } from "@/physics";
import { memo, type ReactNode } from "react";
import { formatClearance, formatDepth, formatDistance } from "@/lib/rig-form/format";
import type { UnitSystem } from "@/lib/rig-form/quantities";
import type { CatchResult, RigResult, SafetyFactor, WorstClearance } from "@/physics";
import { Table } from "@/components/ui/table";
import { SweepChart } from "./sweep-chart";
import { Verdict } from "./verdict";
import { BRAKE_VERDICTS } from "./verdict-words";
import { Panel } from "@/components/ui/panel";

/** Label and figure pairs, large enough to read at arm's length. */
function Figures({ rows }: { rows: [string, ReactNode][] }) {
  return (
    <dl className="grid gap-x-6 gap-y-3 sm:grid-cols-2">
      {rows.map(([label, value]) => (
        <div key={label} className="border-b border-ink-100 pb-2">
          <dt className="text-sm text-ink-600">{label}</dt>
          <dd className="text-xl font-semibold tabular-nums text-ink-900">{value}</dd>
        </div>
      ))}
    </dl>
  );
}

const WHERE: Record<SafetyFactor["location"], string> = { line: "Line", backup: "Backup, at its catch", a: "Anchor A", b: "Anchor B" };
const where = (f: SafetyFactor) => WHERE[f.location];

function SafetyFactorTable({ factors, units }: { factors: SafetyFactor[]; units: UnitSystem }) {
  return (
    <Table
      caption="Safety factors"
      rowKey={(f) => `${f.location}-${f.name}-${f.category}`}
      rows={factors}
      columns={[
        {
          key: "name",
          header: "Component",
          cell: (f) => (
            <>
              {f.name}
              <span className="block text-xs text-ink-600">
                {where(f)}, {f.category}
              </span>
            </>
          ),
        },
        // The engine's `shown` is already cut down, never rounded up. Verdict first: it must not scroll out of sight.
        { key: "factor", header: "Factor", align: "right", cell: (f) => f.shown },
        { key: "verdict", header: "Result", cell: (f) => <Verdict tone={f.passes ? "ok" : "danger"}>{f.passes ? "Passes" : "Fails"}</Verdict> },
        { key: "minimum", header: "Minimum", align: "right", cell: (f) => f.minimum },
        { key: "mbs", header: "MBS", align: "right", cell: (f) => <span className="whitespace-nowrap">{capacityText(f.mbs, units)}</span> },
        { key: "peak", header: "Peak load", align: "right", cell: (f) => <span className="whitespace-nowrap">{loadText(f.peakLoad, units)}</span> },
      ]}
    />
  );
}

/** Where the walker's lowest point ends up after a fall, relative to anchor A, and how far that is above the ground. */
function lowestRows(fall: CatchResult, units: UnitSystem): [string, ReactNode][] {
  return [
    ["Walker's lowest point, relative to A", fall.lowestPointM === null ? "no leash length given" : formatDistance(fall.lowestPointM, units)],
    ["Clearance above the ground there", fall.groundClearanceM === null ? "no ground given" : formatClearance(fall.groundClearanceM, units)],
  ];
}

function BackupCatchPanel({ result, units }: { result: RigResult; units: UnitSystem }) {
  const c = result.backupCatch;
  return (
    <Panel title="Backup catch: the mainline fails, upper bound" id="backup-catch-figures">
      {c ? (
        <>
          <p className="text-sm text-ink-700">{c.note}</p>
          <Figures
            rows={[
              [`Peak load on the backup at ${formatDistance(c.positionM, units)} (upper bound)`, loadText(c.peakLoadN, units)],
              ["Backup tension at A (upper bound)", loadText(c.peakTensionAN, units)],
              ["Backup tension at B (upper bound)", loadText(c.peakTensionBN, units)],
              ["Free fall onto the backup", formatDepth(c.fallHeightM, units)],
              ["Backup deflection at the catch", formatDepth(c.deflectionM, units)],
              ...lowestRows(c, units),
            ]}
          />
        </>
      ) : (
        <p className="text-ink-800">{result.backupCatchMissing}</p>
      )}
    </Panel>
  );
}

function WorstClearanceFigure({ worst, minimum, units }: { worst: WorstClearance | null; minimum: number; units: UnitSystem }) {
  if (!worst) return <>not worked out</>;
  return (
    <>
      <Verdict tone={worst.passes ? "ok" : "danger"}>{formatClearance(worst.clearanceM, units)}</Verdict>
      <span className="block text-sm font-normal text-ink-700">
        at {formatDistance(worst.positionM, units)} from A; {worst.passes ? "meets" : "below"} the crew&apos;s {formatClearance(minimum, units)}
      </span>
    </>
  );
}

function ClearancePanel({ result, units }: { result: RigResult; units: UnitSystem }) {
  const { clearance } = result;
  const rule = clearance.ruleOfThumb;
  return (
    <Panel title="Ground clearance after a fall" id="clearance-figures">
      <p className="text-sm text-ink-700">{clearance.note}</p>
      {clearance.groundGiven ? (
        <Figures
          rows={[
            [
              "Lowest clearance, leash fall anywhere on the span",
              <WorstClearanceFigure key="leash" worst={clearance.leashFall} minimum={clearance.minimumM} units={units} />,
            ],
            [
              "Lowest clearance, backup catch anywhere on the span",
              clearance.backupCatch || result.backupCatch ? (
                <WorstClearanceFigure key="backup" worst={clearance.backupCatch} minimum={clearance.minimumM} units={units} />
              ) : (
                <span className="text-base font-normal">{result.backupCatchMissing}</span>
              ),
            ],
            ["Crew minimum clearance", formatClearance(clearance.minimumM, units)],
            [
              "This line at mid-span, above the ground (unloaded)",
              rule.midSpanHeightAboveGroundM === null ? "–" : formatClearance(rule.midSpanHeightAboveGroundM, units),
            ],
          ]}
        />
      ) : null}
      <p className="text-ink-800">
        <span className="font-semibold">Rule of thumb:</span> rig a highline at least a third of its length plus {formatDistance(3, units)} above the ground,
        here {formatDepth(rule.heightAboveGroundM, units)}, or a fall held only by the backup may reach it.{" "}
        <span className="text-sm text-ink-600">Source: {rule.source}.</span>
      </p>
    </Panel>
  );
}

function RigFigures({ result, units }: { result: RigResult; units: UnitSystem }) {
  const { walker, unloaded, leashFall, tensioning, brake, anchors } = result;
  const brakeVerdict = BRAKE_VERDICTS[brake.verdict];
  const atLeast = brake.lowerBoundOnly ? "at least " : "";
  const anchorRows = (["a", "b"] as const).flatMap((side): [string, ReactNode][] => {
    const a = anchors[side];
    const name = `Anchor ${side.toUpperCase()}`;
    return a.legs === 2
      ? [
          [`${name} master point, peak`, loadText(a.masterPoint, units)],
          [`${name} each bridle leg, peak`, loadText(a.leg, units)],
        ]
      : [[`${name} single point, peak`, loadText(a.masterPoint, units)]];
  });
  return (
    <>
      <Panel title={`With the walker at ${formatDistance(walker.positionM, units)} from A`} id="walker-figures">
        <Figures
          rows={[
            ["Tension at anchor A", loadText(walker.tensionAN, units)],
            ["Tension at anchor B", loadText(walker.tensionBN, units)],
            ["Walker sag below the chord", formatDepth(walker.sagAtWalkerM, units)],
            ["Mid-span sag, nobody on the line", formatDepth(unloaded.midSpanSagM, units)],
          ]}
        />
      </Panel>
      <Panel title="Leash fall: upper bound, no damping" id="leash-fall-figures">
        <p className="text-sm text-ink-700">{leashFall.note}</p>
        <Figures
          rows={[
            ["Peak load on the line (upper bound)", loadText(leashFall.peakLoadN, units)],
            ["Peak tension at A (upper bound)", loadText(leashFall.peakTensionAN, units)],
            ["Peak tension at B (upper bound)", loadText(leashFall.peakTensionBN, units)],
            ["Peak anchor load (upper bound)", loadText(leashFall.peakAnchorLoadN, units)],
            ["Free fall before the line takes the load", formatDepth(leashFall.fallHeightM, units)],
            ["Line deflection at the catch", formatDepth(leashFall.deflectionM, units)],
            ...lowestRows(leashFall, units),
          ]}
        />
      </Panel>
      <BackupCatchPanel result={result} units={units} />
      <ClearancePanel result={result} units={units} />
      <Panel title="Tensioning" id="tensioning-figures">
        <Figures
          rows={[
            ["Haul force to reach the pretension", loadText(tensioning.haulForce, units)],
            ["People needed on the haul", String(tensioning.peopleNeeded)],
            ["Mechanical advantage, ideal", `${tensioning.idealAdvantage}:1`],
            ["Mechanical advantage while hauling", `${factorText(tensioning.haulingAdvantage)}:1`],
          ]}
        />
      </Panel>
      <Panel title="Brake" id="brake-figures">
        <p>
          <Verdict tone={brakeVerdict.tone}>{brakeVerdict.word}</Verdict>
        </p>
        <p className="text-ink-800">{brake.message}</p>
        <Figures
          rows={[
            ["Force at the brake at peak tension", loadText(brake.brakeForce, units)],
            ["Margin (lowest slip ÷ force at the brake)", brake.margin === null ? "no slip results" : `${atLeast}${factorText(brake.margin)}`],
            ["Crew minimum margin", String(brake.minimumMargin)],
            [
              "Highest line tension the brake holds",
              brake.highestLineTensionHeld === null ? "unknown: untested" : `${atLeast}${capacityText(brake.highestLineTensionHeld, units)}`,
            ],
            ["Peak line tension at the tensioning anchor", loadText(brake.peakLineTensionN, units)],
          ]}
        />
      </Panel>
      <Panel title="Anchors (peak loads: walker anywhere, leash fall or backup catch)" id="anchor-figures">
        <Figures rows={anchorRows} />
      </Panel>
    </>
  );
}

/** Every figure of the rig below the headline: walker, leash fall, tensioning, brake, anchors, the sweep, safety factors, warnings and cautions. */
export const RigDetails = memo(function RigDetails({
  result,
  units,
  gearProblems,
}: {
  result: RigResult;
  units: UnitSystem;
  gearProblems: readonly { message: string }[];
}) {
  const warnings = [...gearProblems.map((p) => p.message), ...result.warnings];
  return (
    <div className="space-y-6">
      <p role="status" className="rounded-control bg-info-100 p-3 text-info-700">
        Figures for the inputs as they are now, computed in your browser by engine {result.engineVersion}
        {result.extrapolated ? "; some tensions are beyond the last measured stretch point" : ""}. Loads and sags are rounded up; safety factors, margins and
        capacities are cut down, never rounded up. A saved revision keeps the server&apos;s figures, the ones of record.
      </p>
      <Panel title="Warnings" id="warnings">
        {warnings.length === 0 ? (
          <p>No warnings from the engine for this rig.</p>
        ) : (
          <ul className="list-disc space-y-1 pl-5 text-danger-700">
            {warnings.map((w) => (
              <li key={w}>{w}</li>
            ))}
          </ul>
        )}
      </Panel>
      <div className="grid gap-6 xl:grid-cols-2">
        <RigFigures result={result} units={units} />
      </div>
      <Panel title="Walker along the line" id="sweep-chart">
        <SweepChart sweep={result.sweep} units={units} walkerX={result.walker.positionM} />
      </Panel>
      <Panel title="Safety factors" id="safety-factors">
        <SafetyFactorTable factors={result.safetyFactors} units={units} />
      </Panel>
      <Panel title="Cautions" id="engine-cautions">
        <ul className="list-disc space-y-1 pl-5">
          {result.cautions.map((c) => (
            <li key={c}>{c}</li>
          ))}
        </ul>
      </Panel>
    </div>
  );
});
