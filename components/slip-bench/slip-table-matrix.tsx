import Link from "next/link";
import { cellKey, type SlipTable } from "@/lib/slip-table";
import { formatForce } from "@/lib/force-format";

/**
 * Devices down, rope diameters across. A cell gives the lowest slip load with the number of tests and
 * the spread of the slips; a cell with only held-to results gives "held to ≥ F", a lower bound, never a slip.
 * Loads are cut down to 0.01 kN, never rounded up.
 */
export function SlipTableMatrix({ table, cellHref }: { table: SlipTable; cellHref?: (deviceId: string, diameter: number) => string }) {
  const cells = new Map(table.cells.map((c) => [cellKey(c.deviceId, c.ropeDiameterMm), c]));
  return (
    // Focusable so that a keyboard can scroll the matrix when it is wider than the screen.
    <div tabIndex={0} role="region" aria-label="Slip table" className="overflow-x-auto rounded-panel border border-ink-200 bg-white shadow-panel">
      <table className="min-w-full text-sm">
        <caption className="sr-only">Slip table: lowest slip load by device and rope diameter</caption>
        <thead className="bg-ink-100 text-ink-700">
          <tr>
            <th scope="col" className="px-4 py-2 text-left">
              Device
            </th>
            {table.diameters.map((d) => (
              <th key={d} scope="col" className="px-4 py-2 text-right">
                {d.toFixed(1)} mm
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
                const name = `${device.name} ${d.toFixed(1)}`;
                if (!cell) {
                  return (
                    <td key={d} className="px-4 py-3 text-right text-ink-600" data-cell={name}>
                      untested
                    </td>
                  );
                }
                const main =
                  cell.lowestSlipN !== null ? (
                    <span className="font-semibold">{formatForce(cell.lowestSlipN, "kN")}</span>
                  ) : (
                    <span className="font-semibold text-caution-800">held to ≥ {formatForce(cell.highestHeldN!, "kN")}</span>
                  );
                const detail = [
                  `${cell.tests} test${cell.tests === 1 ? "" : "s"}`,
                  cell.spreadN !== null ? `spread ${formatForce(cell.spreadN, "kN")}` : null,
                  cell.lowestSlipN !== null && cell.highestHeldN !== null ? `held to ${formatForce(cell.highestHeldN, "kN")}` : null,
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
                  <td key={d} className="px-4 py-3 text-right tabular-nums" data-cell={name}>
                    {cellHref ? (
                      <Link
                        href={cellHref(device.id, d)}
                        aria-label={`${device.name} on ${d.toFixed(1)} mm: ${cell.lowestSlipN !== null ? `lowest slip ${formatForce(cell.lowestSlipN, "kN")}` : `held to at least ${formatForce(cell.highestHeldN!, "kN")}`}, ${detail}`}
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
    </div>
  );
}
