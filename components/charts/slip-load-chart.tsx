import type { SlipTableTest } from "@/lib/slip-table";
import { ropeDiameterDigits } from "@/lib/figures";
import type { UnitSystem } from "@/lib/rig-form/quantities";
import { SLIP_RESULT_WORDS } from "@/lib/validations/slip-tests";
import { forceUnitOf, fromNewtons } from "@/physics";
import { axisTicks, linearScale } from "./scale";

const W = 720;
const H = 360;
const M = { left: 60, right: 180, top: 16, bottom: 44 };
// Distinct, print-safe series colours; each series is also named in the legend beside its marks.
const SERIES = ["#1c4e91", "#b42318", "#17704f", "#5c3d00", "#6d3a9c", "#0e6b78", "#3a485a"];

/**
 * Slip load against rope diameter, one series per device: a filled dot for each slip, a hollow
 * up-pointing triangle for each held-to result (the slip load is above it), a line through the lowest slips.
 */
export function SlipLoadChart({
  id,
  tests,
  devices,
  units,
}: {
  id: string;
  tests: SlipTableTest[];
  devices: { id: string; name: string }[];
  units: UnitSystem;
}) {
  const unit = forceUnitOf(units);
  const shown = (newtons: number) => fromNewtons(newtons, unit);
  const diameters = tests.map((t) => t.ropeDiameterMm);
  const forces = tests.map((t) => shown(t.forceN));
  const x = linearScale([Math.min(...diameters) - 0.5, Math.max(...diameters) + 0.5], [M.left, W - M.right]);
  const y = linearScale([0, Math.max(...forces) * 1.1], [H - M.bottom, M.top]);
  return (
    <svg
      id={id}
      xmlns="http://www.w3.org/2000/svg"
      viewBox={`0 0 ${W} ${H}`}
      role="img"
      aria-label="Chart of slip load against rope diameter for each device"
      className="h-auto w-full bg-white"
    >
      <rect width={W} height={H} fill="white" />
      {axisTicks(0, Math.max(...forces) * 1.1).map((t) => (
        <g key={`y${t.text}`}>
          <line x1={M.left} x2={W - M.right} y1={y(t.value)} y2={y(t.value)} stroke="#e6eaef" />
          <text x={M.left - 6} y={y(t.value) + 4} textAnchor="end" fontSize="12" fill="#3a485a">
            {t.text}
          </text>
        </g>
      ))}
      {[...new Set(diameters)].map((d) => (
        <text key={`x${d}`} x={x(d)} y={H - M.bottom + 18} textAnchor="middle" fontSize="12" fill="#3a485a">
          {ropeDiameterDigits(d)}
        </text>
      ))}
      <text x={(M.left + W - M.right) / 2} y={H - 6} textAnchor="middle" fontSize="13" fill="#1d2632">
        Rope diameter (mm)
      </text>
      <text x={14} y={(M.top + H - M.bottom) / 2} textAnchor="middle" fontSize="13" fill="#1d2632" transform={`rotate(-90 14 ${(M.top + H - M.bottom) / 2})`}>
        Slip load ({unit})
      </text>
      {devices.map((device, i) => {
        const colour = SERIES[i % SERIES.length];
        const own = tests.filter((t) => t.deviceId === device.id);
        const lowest = [...new Set(own.filter((t) => t.result === "slipped").map((t) => t.ropeDiameterMm))]
          .sort((a, b) => a - b)
          .map((d) => [d, Math.min(...own.filter((t) => t.result === "slipped" && t.ropeDiameterMm === d).map((t) => shown(t.forceN)))] as const);
        return (
          <g key={device.id}>
            {lowest.length > 1 ? (
              <path d={lowest.map(([d, f], j) => `${j ? "L" : "M"}${x(d)},${y(f)}`).join("")} fill="none" stroke={colour} strokeWidth="1.5" />
            ) : null}
            {own.map((t) =>
              t.result === "slipped" ? (
                <circle key={t.id} cx={x(t.ropeDiameterMm)} cy={y(shown(t.forceN))} r="5" fill={colour} />
              ) : (
                <path key={t.id} d={`M${x(t.ropeDiameterMm)},${y(shown(t.forceN)) - 7}l6,10h-12z`} fill="white" stroke={colour} strokeWidth="2" />
              ),
            )}
            <circle cx={W - M.right + 20} cy={M.top + 10 + i * 22} r="5" fill={colour} />
            <text x={W - M.right + 32} y={M.top + 14 + i * 22} fontSize="12" fill="#1d2632">
              {device.name}
            </text>
          </g>
        );
      })}
      <g transform={`translate(${W - M.right + 14} ${H - M.bottom - 40})`} fontSize="12" fill="#1d2632">
        <circle cx="6" cy="0" r="5" fill="#3a485a" />
        <text x="18" y="4">
          {SLIP_RESULT_WORDS.slipped}
        </text>
        <path d="M6,14l6,10h-12z" fill="white" stroke="#3a485a" strokeWidth="2" />
        <text x="18" y="24">
          {SLIP_RESULT_WORDS.held} (at least)
        </text>
      </g>
    </svg>
  );
}
