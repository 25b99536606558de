import { fixedDigits, loadText } from "@/physics";
import type { Metadata } from "next";
import Link from "next/link";
import { PageHeader } from "@/components/page-header";
import { Panel } from "@/components/ui/panel";
import { EmptyState } from "@/components/ui/empty-state";
import { ReadingsChart } from "@/components/charts/readings-chart";
import { authorizePage } from "@/lib/authz";
import { readingDifferencePercent } from "@/lib/review/reading-prediction";

import { crewReadings, type TensionReading } from "@/db/readings";

export const metadata: Metadata = { title: "Measured tension" };

/** Every load-cell reading of the crew against the engine's prediction, a chart per mainline. */
export default async function ReadingsPage() {
  const context = await authorizePage("rig.read", "/rigs/readings");
  const readings = await crewReadings(context.crew.id);
  const byMainline = new Map<string, TensionReading[]>();
  for (const r of readings) byMainline.set(r.mainlineName, [...(byMainline.get(r.mainlineName) ?? []), r]);
  const units = context.crew.units;
  return (
    <>
      <PageHeader
        title="Measured tension"
        lead="What the crew's load cells read on site, against what the engine predicted for the same conditions, per mainline. Dots: nobody on the line; squares: with a walker. On the dashed line the two agree."
      />
      {byMainline.size === 0 ? (
        <EmptyState title="No readings yet">Readings are recorded on a signed-off rig&apos;s page, under On site.</EmptyState>
      ) : (
        <div className="grid gap-6 lg:grid-cols-2">
          {[...byMainline].map(([mainline, own]) => {
            const differences = own.map((r) => readingDifferencePercent(r.measuredN, r.predictedN));
            const mean = differences.reduce((a, b) => a + b, 0) / differences.length;
            const highest = own.reduce((a, b) => (b.measuredN > a.measuredN ? b : a));
            const rigCount = new Set(own.map((r) => r.rigId)).size;
            return (
              <Panel key={mainline} title={mainline}>
                <ReadingsChart mainline={mainline} readings={own} units={units} />
                <p className="text-sm">
                  {own.length} {own.length === 1 ? "reading" : "readings"}; measured {mean >= 0 ? "above" : "below"} predicted by{" "}
                  {fixedDigits(Math.abs(mean), 1, "nearest")} % on average, over {rigCount} {rigCount === 1 ? "rig" : "rigs"}. Highest reading{" "}
                  {loadText(highest.measuredN, units)}, on <Link href={`/rigs/${highest.rigId}`}>{highest.rigName}</Link>.
                </p>
              </Panel>
            );
          })}
        </div>
      )}
    </>
  );
}
