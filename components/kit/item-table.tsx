"use client";

import Link from "next/link";
import { EmptyState } from "@/components/ui/empty-state";
import { GEAR_KIND_LABELS, INSPECTION_RESULT_LABELS } from "@/lib/validations/kit";
import type { GearItemRow } from "@/db/kit";
import { SortableTable } from "@/components/ui/sortable-table";
import { StatusBadge } from "./status-badge";

export function ItemTable({ items, showModel = true }: { items: GearItemRow[]; showModel?: boolean }) {
  return (
    <SortableTable
      caption="Items"
      rows={items}
      rowKey={(i) => i.id}
      searchText={(i) => `${i.label} ${i.modelName} ${i.notes} ${i.retiredReason ?? ""}`}
      filters={[
        {
          label: "Status",
          options: [
            { value: "in", label: "In service" },
            { value: "retired", label: "Retired" },
          ],
          valueOf: (i) => (i.retiredOn ? "retired" : "in"),
        },
        {
          label: "Last inspection",
          options: [
            { value: "pass", label: "Pass" },
            { value: "watch", label: "Watch" },
            { value: "fail", label: "Fail" },
            { value: "none", label: "Never inspected" },
          ],
          valueOf: (i) => i.lastResult ?? "none",
        },
      ]}
      empty={<EmptyState title="No items match">Change the search or the filters, or add an item from its model&apos;s page.</EmptyState>}
      columns={[
        {
          key: "label",
          header: "Serial or label",
          sortBy: (i) => i.label,
          cell: (i) => (
            <Link href={`/kit/items/${i.id}`} className="font-semibold">
              {i.label}
            </Link>
          ),
        },
        ...(showModel
          ? [
              {
                key: "model",
                header: "Model",
                wrap: true,
                sortBy: (i: GearItemRow) => i.modelName,
                cell: (i: GearItemRow) => `${i.modelName} (${GEAR_KIND_LABELS[i.kind]})`,
              },
            ]
          : []),
        { key: "since", header: "In service since", sortBy: (i) => i.inServiceSince, cell: (i) => i.inServiceSince },
        {
          key: "inspected",
          header: "Last inspection",
          wrap: true,
          sortBy: (i) => i.lastInspectedOn,
          cell: (i) => (i.lastInspectedOn ? `${i.lastInspectedOn}: ${INSPECTION_RESULT_LABELS[i.lastResult!]}` : "Never inspected"),
        },
        { key: "status", header: "Status", sortBy: (i) => i.retiredOn ?? "", cell: (i) => <StatusBadge retiredOn={i.retiredOn} /> },
      ]}
    />
  );
}
