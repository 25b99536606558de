"use client";

import Link from "next/link";
import { EmptyState } from "@/components/ui/empty-state";
import { GEAR_KINDS, GEAR_KIND_LABELS } from "@/lib/validations/kit";
import type { GearModelRow } from "@/db/kit";
import { SortableTable } from "@/components/ui/sortable-table";
import type { UnitSystem } from "@/lib/rig-form/quantities";
import { specSummary, specText } from "./spec-summary";
import { StatusBadge } from "./status-badge";

const mbsOf = (m: GearModelRow) => ("mbsKN" in m.specs ? m.specs.mbsKN : undefined);

export function ModelTable({ models, units }: { models: GearModelRow[]; units: UnitSystem }) {
  return (
    <SortableTable
      caption="Gear models"
      rows={models}
      rowKey={(m) => m.id}
      searchText={(m) => `${m.name} ${GEAR_KIND_LABELS[m.kind]} ${m.notes} ${specSummary(m.kind, m.specs, units)}`}
      filters={[
        { label: "Kind", options: GEAR_KINDS.map((k) => ({ value: k, label: GEAR_KIND_LABELS[k] })), valueOf: (m) => m.kind },
        {
          label: "Status",
          options: [
            { value: "in", label: "In service" },
            { value: "retired", label: "Retired" },
          ],
          valueOf: (m) => (m.retiredOn ? "retired" : "in"),
        },
      ]}
      empty={<EmptyState title="No gear models match">Change the search or the filters, or add a model.</EmptyState>}
      columns={[
        {
          key: "name",
          header: "Model",
          wrap: true,
          sortBy: (m) => m.name,
          cell: (m) => (
            <Link href={`/kit/models/${m.id}`} className="font-semibold">
              {m.name}
            </Link>
          ),
        },
        { key: "kind", header: "Kind", sortBy: (m) => GEAR_KIND_LABELS[m.kind], cell: (m) => GEAR_KIND_LABELS[m.kind] },
        { key: "specs", header: "Specs", wrap: true, cell: (m) => specSummary(m.kind, m.specs, units) },
        {
          key: "mbs",
          header: "MBS",
          align: "right",
          sortBy: (m) => mbsOf(m) ?? null,
          cell: (m) => {
            const mbs = mbsOf(m);
            return mbs === undefined ? "—" : <span className="whitespace-nowrap">{specText("mbsKN", mbs, units)}</span>;
          },
        },
        { key: "items", header: "Items in service", align: "right", sortBy: (m) => m.inServiceCount, cell: (m) => `${m.inServiceCount} of ${m.itemCount}` },
        { key: "status", header: "Status", sortBy: (m) => m.retiredOn ?? "", cell: (m) => <StatusBadge retiredOn={m.retiredOn} /> },
      ]}
    />
  );
}
