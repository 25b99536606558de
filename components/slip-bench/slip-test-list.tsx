"use client";

import { capacityText } from "@/physics";
import Link from "next/link";
import { EmptyState } from "@/components/ui/empty-state";
import { SortableTable } from "@/components/ui/sortable-table";
import { ropeDiameterText } from "@/lib/figures";
import type { UnitSystem } from "@/lib/rig-form/quantities";
import { slipResultText } from "@/lib/validations/slip-tests";
import { isCorrection } from "@/lib/slip-table";
import type { SlipTestRow } from "@/db/slip-tests";

const detectedOf = (t: SlipTestRow) => (t.detectedResult ? { kind: t.detectedResult, forceN: t.detectedForceN! } : null);

export function SlipTestList({ tests, units }: { tests: SlipTestRow[]; units: UnitSystem }) {
  const devices = [...new Map(tests.map((t) => [t.deviceId, t.deviceName]))].map(([value, label]) => ({ value, label }));
  return (
    <SortableTable
      caption="Slip tests"
      rows={tests}
      rowKey={(t) => t.id}
      searchText={(t) => `${t.deviceName} ${t.ropeModelName ?? ""} ${t.testerName} ${t.notes}`}
      filters={[
        { label: "Device", options: devices, valueOf: (t) => t.deviceId },
        {
          label: "Result",
          options: [
            { value: "slipped", label: "Slipped" },
            { value: "held", label: "Held" },
          ],
          valueOf: (t) => t.result,
        },
      ]}
      empty={<EmptyState title="No slip tests match" />}
      columns={[
        { key: "date", header: "Tested on", sortBy: (t) => t.testedOn, cell: (t) => <Link href={`/slip-bench/tests/${t.id}`}>{t.testedOn}</Link> },
        { key: "device", header: "Device", sortBy: (t) => t.deviceName, cell: (t) => t.deviceName },
        {
          key: "rope",
          header: "Rope",
          wrap: true,
          sortBy: (t) => t.ropeDiameterMm,
          cell: (t) => `${ropeDiameterText(t.ropeDiameterMm)}${t.ropeModelName ? ` (${t.ropeModelName})` : ""}`,
        },
        {
          key: "result",
          header: "Result",
          sortBy: (t) => t.forceN,
          align: "right",
          cell: (t) => slipResultText(t.result, capacityText(t.forceN, units)),
        },
        { key: "trace", header: "Trace", cell: (t) => (t.traceUploadId ? (isCorrection(detectedOf(t), t.result, t.forceN) ? "corrected" : "confirmed") : "—") },
        { key: "who", header: "Who", sortBy: (t) => t.testerName, cell: (t) => t.testerName },
      ]}
    />
  );
}
