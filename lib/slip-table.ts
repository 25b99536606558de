import { capacityDigits, forceUnitOf } from "@/physics";
import type { SlipResult } from "@/physics";
import { ropeDiameterDigits } from "./figures";
import type { UnitSystem } from "./rig-form/quantities";
import { csvText } from "./csv";

// The slip table: for each device and rope diameter, what the crew's bench has shown. A held-to result
// is a lower bound and never counts as a slip load.

export interface SlipTableTest {
  id: string;
  deviceId: string;
  deviceName: string;
  ropeDiameterMm: number;
  result: "slipped" | "held";
  forceN: number;
}

export interface SlipTableCell {
  deviceId: string;
  ropeDiameterMm: number;
  tests: number;
  slips: number;
  /** The lowest slip load, N: the value a brake check relies on. Null when nothing slipped. */
  lowestSlipN: number | null;
  /** Highest slip minus lowest slip, N, over two or more slips. */
  spreadN: number | null;
  /** The highest held-to force, N: the slip load is at least this when nothing slipped. */
  highestHeldN: number | null;
}

export interface SlipTable {
  devices: { id: string; name: string }[];
  diameters: number[];
  cells: SlipTableCell[];
}

export const cellKey = (deviceId: string, ropeDiameterMm: number) => `${deviceId}@${ropeDiameterMm.toFixed(1)}`;

export function buildSlipTable(tests: readonly SlipTableTest[]): SlipTable {
  const devices = new Map<string, string>();
  const cells = new Map<string, SlipTableCell>();
  for (const test of tests) {
    devices.set(test.deviceId, test.deviceName);
    const key = cellKey(test.deviceId, test.ropeDiameterMm);
    const cell = cells.get(key) ?? {
      deviceId: test.deviceId,
      ropeDiameterMm: test.ropeDiameterMm,
      tests: 0,
      slips: 0,
      lowestSlipN: null,
      spreadN: null,
      highestHeldN: null,
    };
    cell.tests++;
    if (test.result === "slipped") {
      const highest = cell.lowestSlipN === null ? test.forceN : Math.max(cell.lowestSlipN + (cell.spreadN ?? 0), test.forceN);
      cell.lowestSlipN = cell.lowestSlipN === null ? test.forceN : Math.min(cell.lowestSlipN, test.forceN);
      cell.slips++;
      cell.spreadN = cell.slips > 1 ? highest - cell.lowestSlipN : null;
    } else {
      cell.highestHeldN = Math.max(cell.highestHeldN ?? 0, test.forceN);
    }
    cells.set(key, cell);
  }
  return {
    devices: [...devices].map(([id, name]) => ({ id, name })).sort((a, b) => a.name.localeCompare(b.name)),
    diameters: [...new Set(tests.map((t) => t.ropeDiameterMm))].sort((a, b) => a - b),
    cells: [...cells.values()],
  };
}

/** The bench's results in the form the engine's brake check reads. */
export const toSlipResults = (tests: readonly SlipTableTest[]): SlipResult[] =>
  tests.map((t) => ({ device: t.deviceName, ropeDiameterMm: t.ropeDiameterMm, result: t.result, forceN: t.forceN }));

/**
 * The table as CSV, one row per cell, forces in the crew's unit (kN or lbf) cut down at the shown precision, the
 * unit named in each force column's header; held-only cells give their bound, never a slip load.
 */
export function slipTableCsv(table: SlipTable, units: UnitSystem): string {
  const names = new Map(table.devices.map((d) => [d.id, d.name]));
  const force = (n: number | null) => (n === null ? "" : capacityDigits(n, units));
  const unit = forceUnitOf(units);
  const rows = [...table.cells]
    .sort((a, b) => names.get(a.deviceId)!.localeCompare(names.get(b.deviceId)!) || a.ropeDiameterMm - b.ropeDiameterMm)
    .map((c) =>
      [
        csvText(names.get(c.deviceId)!),
        ropeDiameterDigits(c.ropeDiameterMm),
        c.tests,
        c.slips,
        force(c.lowestSlipN),
        force(c.spreadN),
        force(c.highestHeldN),
      ].join(","),
    );
  return [`device,rope_diameter_mm,tests,slips,lowest_slip_${unit},slip_spread_${unit},held_to_at_least_${unit}`, ...rows].join("\r\n") + "\r\n";
}

/**
 * True when what the tester saved differs from what the engine detected in the trace: another result, or a
 * force more than 0.5 % (at least 1 N) away, beyond the rounding of a unit conversion.
 */
export function isCorrection(detected: { kind: "slipped" | "held"; forceN: number } | null, result: "slipped" | "held", forceN: number): boolean {
  if (!detected) return false;
  return detected.kind !== result || Math.abs(detected.forceN - forceN) > Math.max(1, detected.forceN * 0.005);
}
