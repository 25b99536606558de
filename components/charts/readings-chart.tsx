import type { TensionReading } from "@/db/readings";

import type { UnitSystem } from "@/lib/rig-form/quantities";
import { forceUnitOf, fromNewtons } from "@/physics";
import { axisTicks, linearScale } from "./scale";

const S = 360;
const M = { left: 56, right: 16, top: 16, bottom: 44 };

/**
 * Measured against predicted tension for one mainline across the crew's rigs: a dot for each reading
 * with nobody on the line, a hollow square for each with a walker, and the line where the two agree.
 */
export function ReadingsChart({ mainline, readings, units }: { mainline: string; readings: TensionReading[]; units: UnitSystem }) {
  const unit = forceUnitOf(units);
  const shown = (n: number) => fromNewtons(n, unit);
  const top = Math.max(...readings.flatMap((r) => [shown(r.measuredN), shown(r.predictedN)])) * 1.1;
  const ticks = axisTicks(0, top);
  const x = linearScale([0, top], [M.left, S - M.right]);
  const y = linearScale([0, top], [S - M.bottom, M.top]);
  return (
    <svg viewBox={`0 0 ${S} ${S}`} role="img" aria-label={`Measured against predicted tension for ${mainline}`} className="h-auto w-full max-w-md bg-white">
      {ticks.map((t) => (
        <g key={t.text}>
          <line x1={M.left} x2={S - M.right} y1={y(t.value)} y2={y(t.value)} stroke="#e6eaef" />
          <text x={M.left - 6} y={y(t.value) + 4} textAnchor="end" fontSize="12" fill="#3a485a">
            {t.text}
          </text>
          <text x={x(t.value)} y={S - M.bottom + 16} textAnchor="middle" fontSize="12" fill="#3a485a">
            {t.text}
          </text>
        </g>
      ))}
      <line x1={x(0)} y1={y(0)} x2={x(top)} y2={y(top)} stroke="#9eabb9" strokeDasharray="6 4" />
      <text x={S / 2} y={S - 6} textAnchor="middle" fontSize="13" fill="#1d2632">
        Predicted ({unit})
      </text>
      <text x={14} y={S / 2} textAnchor="middle" fontSize="13" fill="#1d2632" transform={`rotate(-90 14 ${S / 2})`}>
        Measured ({unit})
      </text>
      {readings.map((r) =>
        r.kind === "pretension" ? (
          <circle key={r.id} cx={x(shown(r.predictedN))} cy={y(shown(r.measuredN))} r="5" fill="#1c4e91" />
        ) : (
          <rect key={r.id} x={x(shown(r.predictedN)) - 5} y={y(shown(r.measuredN)) - 5} width="10" height="10" fill="white" stroke="#b42318" strokeWidth="2" />
        ),
      )}
    </svg>
  );
}
