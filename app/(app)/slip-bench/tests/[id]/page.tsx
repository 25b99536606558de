import type { Metadata } from "next";
import Link from "next/link";
import { PageHeader } from "@/components/page-header";
import { TraceChart } from "@/components/charts/trace-chart";
import { authorizePage, crewRowOrNotFound } from "@/lib/authz";
import { formatForce } from "@/lib/force-format";
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
  const shown = (n: number) => formatForce(n, test.forceUnit);
  const corrected = analysis ? isCorrection(analysis.onset, test.result, test.forceN) : false;
  return (
    <>
      <PageHeader
        title={`${test.deviceName} on ${test.ropeDiameterMm.toFixed(1)} mm`}
        lead={`${test.result === "slipped" ? "Slipped at" : "Held to"} ${shown(test.forceN)} · tested on ${test.testedOn} by ${test.testerName}`}
      />
      <div className="space-y-6">
        <dl className="grid max-w-2xl grid-cols-[auto_1fr] gap-x-6 gap-y-2 rounded-panel border border-ink-200 bg-white p-4">
          <dt className="font-semibold">Rope</dt>
          <dd>
            {test.ropeModelName ?? "Not in the Kit"}, {test.ropeDiameterMm.toFixed(1)} mm
          </dd>
          <dt className="font-semibold">Result</dt>
          <dd>{test.result === "slipped" ? `Slipped at ${shown(test.forceN)}` : `Held to ${shown(test.forceN)}: no slip, the slip load is at least this`}</dd>
          {analysis ? (
            <>
              <dt className="font-semibold">Trace</dt>
              <dd>
                Detected {analysis.onset.kind === "slipped" ? "slipped at" : "held to"} {shown(analysis.onset.forceN)} (drop {shown(analysis.dropN)}
                {analysis.pullEndS ? `, pull ended at ${analysis.pullEndS} s` : ""}, engine {analysis.engineVersion});{" "}
                {corrected ? "corrected by the tester (see notes)" : "confirmed by the tester"}.{" "}
                <a href={`/api/uploads/${test.traceUploadId}`}>Download the trace</a>
              </dd>
            </>
          ) : null}
          <dt className="font-semibold">Notes</dt>
          <dd className="whitespace-pre-line">{test.notes || "—"}</dd>
        </dl>
        {analysis ? <TraceChart time={analysis.chart.time} force={analysis.chart.force} unit={analysis.unit} onset={analysis.onset} /> : null}
        <Link href={`/slip-bench?device=${test.deviceId}&diameter=${test.ropeDiameterMm}#tests-heading`}>Other tests of this device on this rope</Link>
      </div>
    </>
  );
}
