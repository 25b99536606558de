import { thresholdText } from "@/lib/figures";
import type { UnitSystem } from "@/lib/rig-form/quantities";
import { slipResultText } from "@/lib/validations/slip-tests";
import { capacityText, forceUnitOf, fromNewtons } from "@/physics";
import { axisTicks, linearScale } from "./scale";

interface TraceChartProps {
  time: number[];
  /** Newtons. */
  force: number[];
  units: UnitSystem;
  onset: { kind: "slipped" | "held"; forceN: number; timeS: number };
  /** The fall below the running maximum that counts as a slip, N: the detection's threshold, not a measured drop. */
  dropN: number;
}

const W = 720;
const H = 320;
const M = { left: 64, right: 16, top: 16, bottom: 44 };

/** Force against time of a load-cell pull in the crew's force unit, with the detected slip onset (or the held-to maximum) marked. */
export function TraceChart({ time, force, units, onset, dropN }: TraceChartProps) {
  const unit = forceUnitOf(units);
  const values = force.map((f) => fromNewtons(f, unit));
  const top = Math.max(...values, 0);
  const bottom = Math.min(...values, 0);
  const x = linearScale([time[0], time[time.length - 1]], [M.left, W - M.right]);
  const y = linearScale([bottom, top * 1.05], [H - M.bottom, M.top]);
  const path = values.map((v, i) => `${i ? "L" : "M"}${x(time[i]).toFixed(1)},${y(v).toFixed(1)}`).join("");
  const onsetValue = fromNewtons(onset.forceN, unit);
  const load = capacityText(onset.forceN, units);
  const label = `${onset.kind === "slipped" ? `Slip onset ${load}` : slipResultText("held", load, true)} at ${onset.timeS.toFixed(1)} s`;
  return (
    <figure className="rounded-panel border border-ink-200 bg-white p-2">
      <svg viewBox={`0 0 ${W} ${H}`} role="img" aria-label={`Trace chart: force against time. ${label}.`} className="h-auto w-full">
        {axisTicks(bottom, top * 1.05).map((t) => (
          <g key={`y${t.text}`}>
            <line x1={M.left} x2={W - M.right} y1={y(t.value)} y2={y(t.value)} stroke="#e6eaef" />
            <text x={M.left - 6} y={y(t.value) + 4} textAnchor="end" fontSize="12" fill="#3a485a">
              {t.text}
            </text>
          </g>
        ))}
        {axisTicks(time[0], time[time.length - 1]).map((t) => (
          <text key={`x${t.text}`} x={x(t.value)} y={H - M.bottom + 18} textAnchor="middle" fontSize="12" fill="#3a485a">
            {t.text}
          </text>
        ))}
        <text x={(M.left + W - M.right) / 2} y={H - 6} textAnchor="middle" fontSize="13" fill="#1d2632">
          Time (s)
        </text>
        <text x={14} y={(M.top + H - M.bottom) / 2} textAnchor="middle" fontSize="13" fill="#1d2632" transform={`rotate(-90 14 ${(M.top + H - M.bottom) / 2})`}>
          Force ({unit})
        </text>
        <path d={path} fill="none" stroke="#1c4e91" strokeWidth="1.5" />
        <line x1={x(onset.timeS)} x2={x(onset.timeS)} y1={M.top} y2={H - M.bottom} stroke="#b42318" strokeDasharray="5 4" strokeWidth="1.5" />
        <circle cx={x(onset.timeS)} cy={y(onsetValue)} r="6" fill={onset.kind === "slipped" ? "#b42318" : "white"} stroke="#b42318" strokeWidth="2" />
        <text
          x={x(onset.timeS) + (x(onset.timeS) > W / 2 ? -12 : 12)}
          y={Math.max(y(onsetValue) - 12, M.top + 12)}
          textAnchor={x(onset.timeS) > W / 2 ? "end" : "start"}
          fontSize="13"
          fontWeight="600"
          fill="#8f1d14"
        >
          {label}
        </text>
      </svg>
      <figcaption className="px-2 pb-1 text-sm text-ink-600">
        {label}.{" "}
        {onset.kind === "held"
          ? `No fall of more than ${thresholdText(dropN, units)} below the running maximum while the pull went on: the slip load is at least this.`
          : `The first fall of more than ${thresholdText(dropN, units)} (the set threshold) below the running maximum while the pull went on.`}
      </figcaption>
    </figure>
  );
}
