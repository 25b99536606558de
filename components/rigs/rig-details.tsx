"use client";

import { memo, type ReactNode } from "react";
import { formatCapacity, formatDepth, formatDistance, formatLoad, truncateRatio } from "@/lib/rig-form/format";
import type { UnitSystem } from "@/lib/rig-form/quantities";
import type { RigResult, SafetyFactor } from "@/physics";
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
        { key: "mbs", header: "MBS", align: "right", cell: (f) => <span className="whitespace-nowrap">{formatCapacity(f.mbs, units)}</span> },
        { key: "peak", header: "Peak load", align: "right", cell: (f) => <span className="whitespace-nowrap">{formatLoad(f.peakLoad, units)}</span> },
      ]}
    />
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
          [`${name} master point, peak`, formatLoad(a.masterPoint, units)],
          [`${name} each bridle leg, peak`, formatLoad(a.leg, units)],
        ]
      : [[`${name} single point, peak`, formatLoad(a.masterPoint, units)]];
  });
  return (
    <>
      <Panel title={`With the walker at ${formatDistance(walker.positionM, units)} from A`} id="walker-figures">
        <Figures
          rows={[
            ["Tension at anchor A", formatLoad(walker.tensionAN, units)],
            ["Tension at anchor B", formatLoad(walker.tensionBN, units)],
            ["Walker sag below the chord", formatDepth(walker.sagAtWalkerM, units)],
            ["Mid-span sag, nobody on the line", formatDepth(unloaded.midSpanSagM, units)],
          ]}
        />
      </Panel>
      <Panel title="Leash fall: upper bound, no damping" id="leash-fall-figures">
        <p className="text-sm text-ink-700">{leashFall.note}</p>
        <Figures
          rows={[
            ["Peak load on the line (upper bound)", formatLoad(leashFall.peakLoadN, units)],
            ["Peak tension at A (upper bound)", formatLoad(leashFall.peakTensionAN, units)],
            ["Peak tension at B (upper bound)", formatLoad(leashFall.peakTensionBN, units)],
            ["Peak anchor load (upper bound)", formatLoad(leashFall.peakAnchorLoadN, units)],
            ["Free fall before the line takes the load", formatDepth(leashFall.fallHeightM, units)],
            ["Line deflection at the catch", formatDepth(leashFall.deflectionM, units)],
          ]}
        />
      </Panel>
      <Panel title="Tensioning" id="tensioning-figures">
        <Figures
          rows={[
            ["Haul force to reach the pretension", formatLoad(tensioning.haulForce, units)],
            ["People needed on the haul", String(tensioning.peopleNeeded)],
            ["Mechanical advantage, ideal", `${tensioning.idealAdvantage}:1`],
            ["Mechanical advantage while hauling", `${truncateRatio(tensioning.haulingAdvantage)}:1`],
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
            ["Force at the brake at peak tension", formatLoad(brake.brakeForce, units)],
            ["Margin (lowest slip ÷ force at the brake)", brake.margin === null ? "no slip results" : `${atLeast}${truncateRatio(brake.margin)}`],
            [
              "Highest line tension the brake holds",
              brake.highestLineTensionHeld === null ? "unknown: untested" : `${atLeast}${formatCapacity(brake.highestLineTensionHeld, units)}`,
            ],
            ["Peak line tension at the tensioning anchor", formatLoad(brake.peakLineTensionN, units)],
          ]}
        />
      </Panel>
      <Panel title="Anchors (peak loads: walker anywhere or leash fall)" id="anchor-figures">
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
