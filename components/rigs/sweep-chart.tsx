import { loadText } from "@/physics";
import { formatDepth, formatDistance } from "@/lib/rig-form/format";
import { fromShown, toShown, unitLabel, type UnitSystem } from "@/lib/rig-form/quantities";
import type { Sweep, SweepPoint } from "@/physics";
import { axisTicks, linearScale } from "@/components/charts/scale";

const WIDTH = 640;
const PANEL = 210;
const PAD = { left: 84, right: 24, top: 40, bottom: 44 };

interface Series {
  label: string;
  value: (p: SweepPoint) => number;
  dash?: string;
  worst: SweepPoint;
  worstText: string;
}

/** One panel of the chart: lines over the walker's position, the worst point of each marked and named. */
function SweepPanel({
  title,
  kind,
  series,
  sweep,
  units,
  offset,
  walkerX,
}: {
  title: string;
  kind: "force" | "length";
  series: Series[];
  sweep: Sweep;
  units: UnitSystem;
  offset: number;
  walkerX?: number;
}) {
  const unit = unitLabel(kind, units);
  const span = sweep.points[sweep.points.length - 1].x;
  const values = series.flatMap((s) => sweep.points.map(s.value));
  const low = Math.min(...values);
  const high = Math.max(...values);
  const bottom = offset + PANEL - PAD.bottom;
  const x = linearScale([0, span], [PAD.left, WIDTH - PAD.right]);
  const y = linearScale([low, high], [bottom, offset + PAD.top]);
  return (
    <g>
      <text x={8} y={offset + 22} className="fill-ink-800 text-[22px] font-semibold">
        {title} ({unit})
      </text>
      <line x1={PAD.left} x2={WIDTH - PAD.right} y1={bottom} y2={bottom} className="stroke-ink-400" />
      <line x1={PAD.left} x2={PAD.left} y1={offset + PAD.top} y2={bottom} className="stroke-ink-400" />
      {/* Ticks at round values in the crew's units: never the extreme itself, which the figures below state, rounded the safe way. */}
      {axisTicks(toShown(low, kind, units), toShown(high, kind, units), 3).map((t) => (
        <text key={t.text} x={PAD.left - 6} y={y(fromShown(t.value, kind, units)) + 4} textAnchor="end" className="fill-ink-700 text-[20px] tabular-nums">
          {t.text}
        </text>
      ))}
      {axisTicks(0, toShown(span, "length", units), 4).map((t) => (
        <text key={t.text} x={x(fromShown(t.value, "length", units))} y={bottom + 26} textAnchor="middle" className="fill-ink-700 text-[20px] tabular-nums">
          {t.text}
        </text>
      ))}
      {walkerX === undefined ? null : (
        <line
          x1={x(walkerX)}
          x2={x(walkerX)}
          y1={offset + PAD.top}
          y2={bottom}
          strokeWidth={2}
          strokeDasharray="3 4"
          className="stroke-ink-500"
          data-walker-marker
        />
      )}
      {series.map((s) => (
        <g key={s.label}>
          <polyline
            fill="none"
            strokeWidth={3.5}
            strokeDasharray={s.dash}
            className="stroke-spruce-700"
            points={sweep.points.map((p) => `${x(p.x)},${y(s.value(p))}`).join(" ")}
          />
          <circle cx={x(s.worst.x)} cy={y(s.value(s.worst))} r={8} className="fill-danger-600 stroke-white" strokeWidth={2} />
        </g>
      ))}
    </g>
  );
}

/** Anchor tensions and walker sag with the walker at every point of the sweep, worst cases marked. */
export function SweepChart({ sweep, units, walkerX }: { sweep: Sweep; units: UnitSystem; walkerX?: number }) {
  const at = (p: SweepPoint) => formatDistance(p.x, units);
  const tension: Series[] = [
    {
      label: "A",
      value: (p) => p.tensionA,
      worst: sweep.worstTensionA,
      worstText: `Highest at A: ${loadText(sweep.worstTensionA.tensionA, units)}, walker at ${at(sweep.worstTensionA)} (solid)`,
    },
    {
      label: "B",
      value: (p) => p.tensionB,
      dash: "8 5",
      worst: sweep.worstTensionB,
      worstText: `Highest at B: ${loadText(sweep.worstTensionB.tensionB, units)}, walker at ${at(sweep.worstTensionB)} (dashed)`,
    },
  ];
  const sag: Series[] = [
    {
      label: "sag",
      value: (p) => p.sag,
      worst: sweep.deepestSag,
      worstText: `Deepest: ${formatDepth(sweep.deepestSag.sag, units)}, walker at ${at(sweep.deepestSag)}`,
    },
  ];
  return (
    <figure>
      <svg viewBox={`0 0 ${WIDTH} ${PANEL * 2}`} className="h-auto w-full" role="img" aria-labelledby="sweep-chart-title">
        <title id="sweep-chart-title">
          {`Walker at ${sweep.points.length} positions from A to B. ${tension.map((s) => s.worstText).join(". ")}. ${sag[0].worstText}.`}
        </title>
        <SweepPanel title="Anchor tension" kind="force" series={tension} sweep={sweep} units={units} offset={0} walkerX={walkerX} />
        <SweepPanel title="Walker sag below the chord" kind="length" series={sag} sweep={sweep} units={units} offset={PANEL} walkerX={walkerX} />
      </svg>
      <figcaption className="mt-2 space-y-1 text-sm text-ink-700">
        <p>
          Across: the walker&apos;s distance from A ({unitLabel("length", units)}); the dashed upright is where the walker is now. Red dots mark the worst case
          of each line:
        </p>
        <ul className="list-disc pl-5 font-medium text-ink-900">
          {[...tension, ...sag].map((s) => (
            <li key={s.label}>{s.worstText}</li>
          ))}
        </ul>
      </figcaption>
    </figure>
  );
}
