import { capacityText, forceUnitOf } from "@/physics";
import type { Metadata } from "next";
import Link from "next/link";
import { PageHeader } from "@/components/page-header";
import { TraceChart } from "@/components/charts/trace-chart";
import { authorizePage, crewRowOrNotFound } from "@/lib/authz";
import { capacityInUnit, ropeDiameterText, thresholdText } from "@/lib/figures";
import { slipResultText } from "@/lib/validations/slip-tests";
import { isCorrection } from "@/lib/slip-table";
import type { TraceAnalysis } from "@/lib/trace-analysis";
import { findSlipTest } from "@/db/slip-tests";
import { traceAnalysis } from "@/db/uploads";

export const metadata: Metadata = { title: "Slip test" };

export default async function SlipTestPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const { crew } = await authorizePage("slip.read", `/slip-bench/tests/${id}`);
  const test = await crewRowOrNotFound(findSlipTest, crew.id, id);
  const analysis = test.traceUploadId ? await traceAnalysis<TraceAnalysis>(crew.id, test.traceUploadId) : null;
  const shown = (n: number) => capacityText(n, crew.units);
  // What the tester typed, in the unit they typed it in, when that is not the crew's.
  const asRecorded = test.forceUnit === forceUnitOf(crew.units) ? "" : ` (recorded as ${capacityInUnit(test.forceN, test.forceUnit)})`;
  const corrected = analysis ? isCorrection(analysis.onset, test.result, test.forceN) : false;
  return (
    <>
      <PageHeader
        title={`${test.deviceName} on ${ropeDiameterText(test.ropeDiameterMm)}`}
        lead={`${slipResultText(test.result, shown(test.forceN), true)} · tested on ${test.testedOn} by ${test.testerName}`}
      />
      <div className="space-y-6">
        <dl className="grid max-w-2xl grid-cols-[auto_1fr] gap-x-6 gap-y-2 rounded-panel border border-ink-200 bg-white p-4">
          <dt className="font-semibold">Rope</dt>
          <dd>
            {test.ropeModelName ?? "Not in the Kit"}, {ropeDiameterText(test.ropeDiameterMm)}
          </dd>
          <dt className="font-semibold">Result</dt>
          <dd>
            {slipResultText(test.result, shown(test.forceN), true)}
            {asRecorded}
            {test.result === "held" ? ": no slip, the slip load is at least this" : ""}
          </dd>
          {analysis ? (
            <>
              <dt className="font-semibold">Trace</dt>
              <dd>
                From the trace the engine found: {slipResultText(analysis.onset.kind, shown(analysis.onset.forceN))}, counting as a slip any fall of more than{" "}
                {thresholdText(analysis.dropN, crew.units)} below the running maximum
                {analysis.pullEndS ? ` before the pull ended at ${analysis.pullEndS} s` : ""} (engine {analysis.engineVersion});{" "}
                {corrected ? "the tester corrected it (see the notes)" : "the tester confirmed it"}.{" "}
                <a href={`/api/uploads/${test.traceUploadId}`}>Download the trace</a>
              </dd>
            </>
          ) : null}
          <dt className="font-semibold">Notes</dt>
          <dd className="whitespace-pre-line">{test.notes || "—"}</dd>
        </dl>
        {analysis ? (
          <TraceChart time={analysis.chart.time} force={analysis.chart.force} units={crew.units} onset={analysis.onset} dropN={analysis.dropN} />
        ) : null}
        <Link href={`/slip-bench?device=${test.deviceId}&diameter=${test.ropeDiameterMm}#tests-heading`}>Other tests of this device on this rope</Link>
      </div>
    </>
  );
}
