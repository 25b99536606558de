import { forceUnitOf } from "@/physics";
import type { Metadata } from "next";
import Link from "next/link";
import { PageHeader } from "@/components/page-header";
import { buttonClasses } from "@/components/ui/button";
import { EmptyState } from "@/components/ui/empty-state";
import { Caution } from "@/components/caution-notice";
import { SlipLoadChart } from "@/components/charts/slip-load-chart";
import { ChartExport } from "@/components/charts/chart-export";
import { SlipTableMatrix } from "@/components/slip-bench/slip-table-matrix";
import { SlipTestList } from "@/components/slip-bench/slip-test-list";
import { PublishLink } from "@/components/slip-bench/publish-link";
import { authorizePage } from "@/lib/authz";
import { can } from "@/lib/roles";
import { buildSlipTable } from "@/lib/slip-table";
import { ropeDiameterText } from "@/lib/figures";
import { isUuid } from "@/lib/validations/ids";
import { listSlipTests, slipTableLinkOf } from "@/db/slip-tests";

export const metadata: Metadata = { title: "Slip bench" };

interface SearchParams {
  device?: string;
  diameter?: string;
}

export default async function SlipBenchPage({ searchParams }: { searchParams: Promise<SearchParams> }) {
  const { device, diameter } = await searchParams;
  const { crew, role } = await authorizePage("slip.read", "/slip-bench");
  const tests = await listSlipTests(crew.id);
  const table = buildSlipTable(tests);
  const cellChosen = device && isUuid(device) && diameter !== undefined && Number.isFinite(Number(diameter));
  const shownTests = cellChosen ? tests.filter((t) => t.deviceId === device && t.ropeDiameterMm === Number(diameter)) : tests;
  const chosenName = cellChosen ? table.devices.find((d) => d.id === device)?.name : null;
  const record = can(role, "slip.write") ? (
    <Link href="/slip-bench/new" className={buttonClasses()}>
      Record a slip test
    </Link>
  ) : null;
  return (
    <>
      <PageHeader
        title="Slip bench"
        lead="Slip tests of brakes and line grips on each rope diameter, with their load-cell traces. The planner's brake check reads this table."
        actions={record}
      />
      {tests.length === 0 ? (
        <EmptyState title="No slip tests yet" action={record}>
          Results your gear testers record will build the crew&apos;s slip table here.
        </EmptyState>
      ) : (
        <div className="space-y-8">
          <section aria-labelledby="table-heading" className="space-y-3">
            <div className="flex flex-wrap items-end justify-between gap-3">
              <h2 id="table-heading">Slip table</h2>
              <a href="/api/slip-table?format=csv" className={buttonClasses("secondary")} download>
                Download table as CSV ({forceUnitOf(crew.units)})
              </a>
            </div>
            <p className="max-w-prose text-ink-600">
              Each cell: the lowest load at which the device slipped on that rope, the number of tests and the spread of the slips. “Held to ≥” means no test
              slipped: the slip load is at least that, and was never measured. Loads are in {forceUnitOf(crew.units)}, cut down, never rounded up.
            </p>
            <SlipTableMatrix table={table} units={crew.units} cellHref={(id, d) => `/slip-bench?device=${id}&diameter=${d}#tests-heading`} />
          </section>
          <section aria-labelledby="chart-heading" className="space-y-3">
            <h2 id="chart-heading">Slip load against rope diameter</h2>
            <div className="rounded-panel border border-ink-200 bg-white p-2">
              <SlipLoadChart id="slip-load-chart" tests={tests} devices={table.devices} units={crew.units} />
            </div>
            <ChartExport chartId="slip-load-chart" fileName="slip-load-by-diameter" />
          </section>
          <section aria-labelledby="tests-heading" className="space-y-3">
            <h2 id="tests-heading">{chosenName ? `Tests of ${chosenName} on ${ropeDiameterText(Number(diameter))}` : "All slip tests"}</h2>
            {chosenName ? <Link href="/slip-bench#tests-heading">Show all tests</Link> : null}
            <SlipTestList key={`${device}-${diameter}`} tests={shownTests} units={crew.units} />
          </section>
          {can(role, "slip.publish") ? (
            <section aria-labelledby="share-heading" className="space-y-3">
              <h2 id="share-heading">Share the slip table</h2>
              <PublishLink published={await slipTableLinkOf(crew.id)} />
            </section>
          ) : null}
          <SlipCautions />
        </div>
      )}
    </>
  );
}

function SlipCautions() {
  return (
    <Caution>
      Slip loads vary with rope wear, diameter, sheath, temperature, wetness and pull rate. A bench result holds only for the device and rope it was measured
      on; keep a margin, back up every brake, and retest when the rope changes.
    </Caution>
  );
}
