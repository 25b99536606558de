import { capacityText } from "@/physics";
import Link from "next/link";
import { ScrollFrame } from "@/components/ui/scroll-frame";
import { cellKey, type SlipTable } from "@/lib/slip-table";
import { ropeDiameterDigits, ropeDiameterText } from "@/lib/figures";
import type { UnitSystem } from "@/lib/rig-form/quantities";

/**
 * Devices down, rope diameters across. A cell gives the lowest slip load with the number of tests and
 * the spread of the slips; a cell with only held-to results gives "held to ≥ F", a lower bound, never a slip.
 * Loads are in the crew's unit, cut down at the shown precision, never rounded up.
 */
export function SlipTableMatrix({
  table,
  units,
  cellHref,
}: {
  table: SlipTable;
  units: UnitSystem;
  cellHref?: (deviceId: string, diameter: number) => string;
}) {
  const load = (newtons: number) => capacityText(newtons, units);
  const cells = new Map(table.cells.map((c) => [cellKey(c.deviceId, c.ropeDiameterMm), c]));
  return (
    <ScrollFrame label="Slip table">
      <table className="min-w-full text-sm">
        <caption className="sr-only">Slip table: lowest slip load by device and rope diameter</caption>
        <thead className="bg-ink-100 text-ink-700">
          <tr>
            <th scope="col" className="px-4 py-2 text-left">
              Device
            </th>
            {table.diameters.map((d) => (
              <th key={d} scope="col" className="whitespace-nowrap px-4 py-2 text-right">
                {ropeDiameterText(d)}
              </th>
            ))}
          </tr>
        </thead>
        <tbody className="divide-y divide-ink-100">
          {table.devices.map((device) => (
            <tr key={device.id}>
              <th scope="row" className="px-4 py-3 text-left font-semibold">
                {device.name}
              </th>
              {table.diameters.map((d) => {
                const cell = cells.get(cellKey(device.id, d));
                const name = `${device.name} ${ropeDiameterDigits(d)}`;
                if (!cell) {
                  return (
                    <td key={d} className="whitespace-nowrap px-4 py-3 text-right text-ink-600" data-cell={name}>
                      untested
                    </td>
                  );
                }
                const main =
                  cell.lowestSlipN !== null ? (
                    <span className="font-semibold">{load(cell.lowestSlipN)}</span>
                  ) : (
                    <span className="font-semibold text-caution-800">held to ≥ {load(cell.highestHeldN!)}</span>
                  );
                const detail = [
                  `${cell.tests} test${cell.tests === 1 ? "" : "s"}`,
                  cell.spreadN !== null ? `spread ${load(cell.spreadN)}` : null,
                  cell.lowestSlipN !== null && cell.highestHeldN !== null ? `held to ${load(cell.highestHeldN)}` : null,
                ]
                  .filter(Boolean)
                  .join(" · ");
                const content = (
                  <>
                    {main}
                    <span className="block text-xs text-ink-500">{detail}</span>
                  </>
                );
                return (
                  <td key={d} className="whitespace-nowrap px-4 py-3 text-right tabular-nums" data-cell={name}>
                    {cellHref ? (
                      <Link
                        href={cellHref(device.id, d)}
                        aria-label={`${device.name} on ${ropeDiameterText(d)}: ${cell.lowestSlipN !== null ? `lowest slip ${load(cell.lowestSlipN)}` : `held to at least ${load(cell.highestHeldN!)}`}, ${detail}`}
                        className="block no-underline"
                      >
                        {content}
                      </Link>
                    ) : (
                      content
                    )}
                  </td>
                );
              })}
            </tr>
          ))}
        </tbody>
      </table>
    </ScrollFrame>
  );
}
