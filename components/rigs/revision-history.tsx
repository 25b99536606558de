"use client";

import { when } from "@/lib/when";
import { useState } from "react";
import Link from "next/link";
import { useQuery } from "@tanstack/react-query";
import { getJson } from "@/components/forms/call-api";
import { Select } from "@/components/ui/select";
import type { UnitSystem } from "@/lib/rig-form/quantities";
import { inputDifferences } from "@/lib/planner/differences";
import { plannerValues, type KitCatalogue, type RevisionSnapshot } from "@/lib/planner/kit";
import { REVISION_STATE_LABELS, type RevisionMeta } from "@/lib/validations/rigs";
import type { RevisionBody } from "@/lib/planner/saved-revision";

/** Names a Kit model by its id: from the Kit as it is, else as the revisions recorded it (the model may be gone). */
export function modelNamer(catalogue: KitCatalogue, snapshots: readonly RevisionSnapshot[]) {
  return (id: string) => catalogue.models.find((m) => m.id === id)?.name ?? snapshots.flatMap((s) => s.gear).find((g) => g.modelId === id)?.name;
}

function useRevision(rigId: string, id: string | undefined) {
  return useQuery({
    queryKey: ["rig", rigId, "revision", id],
    queryFn: () => getJson<{ revision: RevisionBody }>(`/api/rigs/${rigId}/revisions/${id}`).then((b) => b.revision),
    enabled: id !== undefined,
    staleTime: Infinity,
  });
}

function Comparison({ rigId, fromId, toId, units, catalogue }: { rigId: string; fromId: string; toId: string; units: UnitSystem; catalogue: KitCatalogue }) {
  const from = useRevision(rigId, fromId);
  const to = useRevision(rigId, toId);
  if (from.error || to.error)
    return (
      <p role="alert" className="text-danger-700">
        {(from.error ?? to.error)!.message}
      </p>
    );
  if (!from.data || !to.data) return <p className="text-ink-600">Loading both revisions…</p>;
  return <RevisionDifferences from={from.data} to={to.data} units={units} catalogue={catalogue} />;
}

/** The inputs that differ between two revisions, the site and the bench's slip tests among them, in the crew's units. */
export function RevisionDifferences({ from, to, units, catalogue }: { from: RevisionBody; to: RevisionBody; units: UnitSystem; catalogue: KitCatalogue }) {
  const differences = inputDifferences(plannerValues(from), plannerValues(to), units, modelNamer(catalogue, [from.snapshot, to.snapshot]));
  const site = (s: RevisionSnapshot) => s.site?.name ?? "no site (free span)";
  const siteChanged = from.snapshot.site?.id !== to.snapshot.site?.id;
  const benchChanged = from.snapshot.slipTestIds.length !== to.snapshot.slipTestIds.length;
  if (!differences.length && !benchChanged)
    return (
      <p>
        Revisions {from.number} and {to.number} have the same inputs.
      </p>
    );
  return (
    <table className="w-full text-left text-sm">
      <caption className="pb-1 text-left font-semibold">
        What changed from revision {from.number} to revision {to.number}
      </caption>
      <thead>
        <tr className="border-b border-ink-200">
          <th scope="col" className="py-1 pr-2">
            Input
          </th>
          <th scope="col" className="py-1 pr-2">
            Revision {from.number}
          </th>
          <th scope="col" className="py-1">
            Revision {to.number}
          </th>
        </tr>
      </thead>
      <tbody>
        {siteChanged ? (
          <tr className="border-b border-ink-100">
            <th scope="row" className="py-1 pr-2 font-medium">
              Site
            </th>
            <td className="py-1 pr-2">{site(from.snapshot)}</td>
            <td className="py-1">{site(to.snapshot)}</td>
          </tr>
        ) : null}
        {differences.map((d) => (
          <tr key={d.path} className="border-b border-ink-100">
            <th scope="row" className="py-1 pr-2 font-medium">
              {d.label}
            </th>
            <td className="py-1 pr-2 tabular-nums">{d.before}</td>
            <td className="py-1 tabular-nums">{d.after}</td>
          </tr>
        ))}
        {benchChanged ? (
          <tr className="border-b border-ink-100">
            <th scope="row" className="py-1 pr-2 font-medium">
              Slip tests of the brake from the bench
            </th>
            <td className="py-1 pr-2 tabular-nums">{from.snapshot.slipTestIds.length}</td>
            <td className="py-1 tabular-nums">{to.snapshot.slipTestIds.length}</td>
          </tr>
        ) : null}
      </tbody>
    </table>
  );
}

/** A rig's revisions, newest first, and what changed between any two of them, in the crew's units. */
export function RevisionHistory({ rigId, units, catalogue }: { rigId: string; units: UnitSystem; catalogue: KitCatalogue }) {
  const revisions = useQuery({
    queryKey: ["rig", rigId, "revisions"],
    queryFn: () => getJson<{ revisions: RevisionMeta[] }>(`/api/rigs/${rigId}/revisions`).then((b) => b.revisions),
  });
  const [chosen, setChosen] = useState<{ from?: string; to?: string }>({});
  if (revisions.error)
    return (
      <p role="alert" className="text-danger-700">
        {revisions.error.message}
      </p>
    );
  if (!revisions.data) return <p className="text-ink-600">Loading the revisions…</p>;
  const list = revisions.data;
  const to = chosen.to ?? list[0]?.id;
  const from = chosen.from ?? list[1]?.id;
  const options = list.map((r) => ({ value: r.id, label: `Revision ${r.number} (${when(r.createdAt)})` }));
  return (
    <div className="space-y-4">
      <div className="overflow-x-auto" tabIndex={0} aria-label="Revisions, scrolls sideways">
        <table className="w-full text-left text-sm">
          <caption className="sr-only">Revisions of this rig, newest first</caption>
          <thead>
            <tr className="border-b border-ink-200">
              <th scope="col" className="py-1 pr-3">
                Revision
              </th>
              <th scope="col" className="py-1 pr-3">
                State
              </th>
              <th scope="col" className="py-1 pr-3">
                Saved by
              </th>
              <th scope="col" className="py-1 pr-3">
                When
              </th>
              <th scope="col" className="py-1">
                Engine
              </th>
            </tr>
          </thead>
          <tbody>
            {list.map((r) => (
              <tr key={r.id} className="border-b border-ink-100">
                <td className="py-1 pr-3">
                  <Link href={`/rigs/${rigId}?revision=${r.id}`}>Revision {r.number}</Link>
                </td>
                <td className="py-1 pr-3">{REVISION_STATE_LABELS[r.state]}</td>
                <td className="py-1 pr-3">{r.authorName ?? "—"}</td>
                <td className="py-1 pr-3">{when(r.createdAt)}</td>
                <td className="py-1 tabular-nums">{r.engineVersion}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      {list.length > 1 && from && to ? (
        <>
          <div className="grid gap-4 sm:grid-cols-2">
            <Select label="Compare revision" options={options} value={from} onChange={(e) => setChosen({ from: e.target.value, to })} />
            <Select label="with revision" options={options} value={to} onChange={(e) => setChosen({ from, to: e.target.value })} />
          </div>
          <Comparison rigId={rigId} fromId={from} toId={to} units={units} catalogue={catalogue} />
        </>
      ) : (
        <p className="text-ink-600">One revision so far: save again to compare.</p>
      )}
    </div>
  );
}
