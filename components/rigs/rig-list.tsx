"use client";

import { day } from "@/lib/when";
import { useDeferredValue, useState } from "react";
import Link from "next/link";
import { keepPreviousData, useQuery } from "@tanstack/react-query";
import { getJson } from "@/components/forms/call-api";
import { Field } from "@/components/ui/field";
import { Select } from "@/components/ui/select";
import { Table } from "@/components/ui/table";
import { Button } from "@/components/ui/button";
import { EmptyState } from "@/components/ui/empty-state";
import { formatDistance } from "@/lib/rig-form/format";
import { fromShown, unitLabel, type UnitSystem } from "@/lib/rig-form/quantities";
import { REVISION_STATE_LABELS, REVISION_STATES, RIG_SORT_LABELS, RIG_SORTS } from "@/lib/validations/rigs";
import type { RigRow } from "@/db/rigs";

interface Filters {
  q: string;
  siteId: string;
  state: string;
  mainline: string;
  spanMin: string;
  spanMax: string;
  startedBy: string;
  sort: string;
  page: number;
}

const NO_FILTERS: Filters = { q: "", siteId: "", state: "", mainline: "", spanMin: "", spanMax: "", startedBy: "", sort: "updated", page: 1 };

/** The list's query string; spans typed in the crew's units go to the server in metres. */
function queryString(filters: Filters, units: UnitSystem): string {
  const params = new URLSearchParams();
  const metres = (typed: string) => {
    const value = Number(typed.replace(",", "."));
    return typed.trim() === "" || !Number.isFinite(value) ? null : String(fromShown(value, "length", units));
  };
  for (const key of ["q", "siteId", "state", "mainline", "startedBy", "sort"] as const) if (filters[key]) params.set(key, filters[key]);
  const min = metres(filters.spanMin);
  const max = metres(filters.spanMax);
  if (min) params.set("spanMinM", min);
  if (max) params.set("spanMaxM", max);
  params.set("page", String(filters.page));
  return params.toString();
}

const choice = (all: string, options: { value: string; label: string }[]) => [{ value: "", label: all }, ...options];

/** The crew's rigs: searched, filtered and sorted on the server, a page at a time. */
export function RigList({
  units,
  sites,
  mainlines,
  starters,
}: {
  units: UnitSystem;
  sites: { id: string; name: string }[];
  mainlines: string[];
  starters: { id: string; name: string }[];
}) {
  const [filters, setFilters] = useState(NO_FILTERS);
  const query = queryString(useDeferredValue(filters), units);
  const rigs = useQuery({
    queryKey: ["rigs", query],
    queryFn: () => getJson<{ rigs: RigRow[]; total: number; page: number; pageSize: number }>(`/api/rigs?${query}`),
    placeholderData: keepPreviousData,
  });
  const set = (change: Partial<Filters>) => setFilters((f) => ({ ...f, page: 1, ...change }));
  const unit = unitLabel("length", units);
  const pages = rigs.data ? Math.max(1, Math.ceil(rigs.data.total / rigs.data.pageSize)) : 1;
  return (
    <div className="space-y-4">
      <form
        role="search"
        aria-label="Find rigs"
        onSubmit={(e) => e.preventDefault()}
        className="grid gap-4 rounded-panel border border-ink-200 bg-white p-4 shadow-panel sm:grid-cols-2 lg:grid-cols-4"
      >
        <Field label="Search by name" type="search" value={filters.q} onChange={(e) => set({ q: e.target.value })} />
        <Select
          label="Site"
          value={filters.siteId}
          onChange={(e) => set({ siteId: e.target.value })}
          options={choice(
            "Any site",
            sites.map((s) => ({ value: s.id, label: s.name })),
          )}
        />
        <Select
          label="State"
          value={filters.state}
          onChange={(e) => set({ state: e.target.value })}
          options={choice(
            "Any state",
            REVISION_STATES.map((s) => ({ value: s, label: REVISION_STATE_LABELS[s] })),
          )}
        />
        <Select
          label="Mainline"
          value={filters.mainline}
          onChange={(e) => set({ mainline: e.target.value })}
          options={choice(
            "Any mainline",
            mainlines.map((m) => ({ value: m, label: m })),
          )}
        />
        <Field label={`Shortest span (${unit})`} inputMode="decimal" value={filters.spanMin} onChange={(e) => set({ spanMin: e.target.value })} />
        <Field label={`Longest span (${unit})`} inputMode="decimal" value={filters.spanMax} onChange={(e) => set({ spanMax: e.target.value })} />
        <Select
          label="Started by"
          value={filters.startedBy}
          onChange={(e) => set({ startedBy: e.target.value })}
          options={choice(
            "Anyone",
            starters.map((s) => ({ value: s.id, label: s.name })),
          )}
        />
        <Select
          label="Sort"
          value={filters.sort}
          onChange={(e) => set({ sort: e.target.value })}
          options={RIG_SORTS.map((s) => ({ value: s, label: RIG_SORT_LABELS[s] }))}
        />
      </form>
      {rigs.error ? (
        <p role="alert" className="font-semibold text-danger-700">
          {rigs.error.message}
        </p>
      ) : null}
      {rigs.data ? (
        <>
          <p role="status" className="text-ink-700">
            {rigs.data.total === 0 ? "No rigs match." : `${rigs.data.total} rig${rigs.data.total === 1 ? "" : "s"}, page ${rigs.data.page} of ${pages}.`}
            {rigs.isFetching ? " Updating…" : ""}
          </p>
          {rigs.data.rigs.length ? (
            <Table
              caption="Rigs"
              rowKey={(r) => r.id}
              rows={rigs.data.rigs}
              columns={[
                {
                  key: "name",
                  header: "Rig",
                  cell: (r) => (
                    <Link href={`/rigs/${r.id}`} className="font-semibold">
                      {r.name}
                    </Link>
                  ),
                },
                { key: "state", header: "State", cell: (r) => `${REVISION_STATE_LABELS[r.head.state]}, rev. ${r.head.number}` },
                { key: "site", header: "Site", cell: (r) => r.siteName ?? "Free span" },
                { key: "span", header: "Span", align: "right", cell: (r) => <span className="whitespace-nowrap">{formatDistance(r.head.spanM, units)}</span> },
                { key: "mainline", header: "Mainline", cell: (r) => r.head.mainlineName },
                { key: "saved", header: "Last saved", cell: (r) => `${day(r.head.createdAt)}${r.head.authorName ? `, ${r.head.authorName}` : ""}` },
              ]}
            />
          ) : (
            <EmptyState title="No rigs match these filters">Clear a filter or search for another name.</EmptyState>
          )}
          {pages > 1 ? (
            <nav aria-label="Pages" className="flex items-center gap-3">
              <Button tone="secondary" disabled={filters.page <= 1} onClick={() => setFilters((f) => ({ ...f, page: f.page - 1 }))}>
                Previous page
              </Button>
              <Button tone="secondary" disabled={filters.page >= pages} onClick={() => setFilters((f) => ({ ...f, page: f.page + 1 }))}>
                Next page
              </Button>
            </nav>
          ) : null}
        </>
      ) : rigs.isPending ? (
        <p className="text-ink-600">Loading the rigs…</p>
      ) : null}
    </div>
  );
}
