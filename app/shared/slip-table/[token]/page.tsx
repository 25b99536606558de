import { forceUnitOf } from "@/physics";
import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { Caution } from "@/components/caution-notice";
import { SlipLoadChart } from "@/components/charts/slip-load-chart";
import { SlipTableMatrix } from "@/components/slip-bench/slip-table-matrix";
import { buildSlipTable } from "@/lib/slip-table";

import { hashToken } from "@/lib/tokens";
import { crewOfSlipTableLink, listSlipTests } from "@/db/slip-tests";

export const metadata: Metadata = { title: "Shared slip table", robots: { index: false, follow: false } };

// Read-only and public: the slip table and its chart, and nothing else of the crew (no people, notes or traces).
export default async function SharedSlipTablePage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const crew = /^[\w-]{20,64}$/.test(token) ? await crewOfSlipTableLink(hashToken(token)) : null;
  if (!crew) notFound();
  const tests = (await listSlipTests(crew.id)).map(({ id, deviceId, deviceName, ropeDiameterMm, result, forceN }) => ({
    id,
    deviceId,
    deviceName,
    ropeDiameterMm,
    result,
    forceN,
  }));
  const table = buildSlipTable(tests);
  return (
    <main className="mx-auto max-w-page space-y-6 px-gutter py-8">
      <header>
        <p className="font-bold text-spruce-800">Spanwright</p>
        <h1>Slip table of {crew.name}</h1>
        <p className="mt-1 max-w-prose text-ink-600">
          Shared read-only by the crew. Each cell gives the lowest load at which the device slipped on that rope diameter; “held to ≥” is a lower bound: no test
          slipped. Loads are in {forceUnitOf(crew.units)}, cut down, never rounded up.
        </p>
      </header>
      {tests.length === 0 ? (
        <p>No slip tests yet.</p>
      ) : (
        <>
          <SlipTableMatrix table={table} units={crew.units} />
          <div className="rounded-panel border border-ink-200 bg-white p-2">
            <SlipLoadChart id="shared-slip-load-chart" tests={tests} devices={table.devices} units={crew.units} />
          </div>
        </>
      )}
      <Caution>
        These are one crew&apos;s bench results on its own gear. Slip loads vary with rope wear, diameter, sheath, temperature, wetness and pull rate: test your
        own device on your own rope.
      </Caution>
    </main>
  );
}
