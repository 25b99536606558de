"use client";

import { useState } from "react";
import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { Button } from "@/components/ui/button";
import { FormError } from "@/components/forms/form-error";
import { callApi, getJson } from "@/components/forms/call-api";
import type { ChecklistRun } from "@/db/checklists";
import { when } from "@/lib/when";

async function write(url: string, body: Record<string, unknown>) {
  // Each write carries its own key, so a resent request lands once.
  const answer = await callApi("POST", url, { ...body, idempotencyKey: crypto.randomUUID() });
  if (!answer.ok) throw new Error(answer.error);
  return answer.body;
}

/** The crew's checklist run on the signed-off revision: start one for the day, tick items, see who ticked what and when. */
export function ChecklistRuns({ rigId, revisionId, canRun, hasTemplate }: { rigId: string; revisionId: string; canRun: boolean; hasTemplate: boolean }) {
  const base = `/api/rigs/${rigId}/revisions/${revisionId}/checklists`;
  const key = ["rig", rigId, "revision", revisionId, "checklists"];
  const client = useQueryClient();
  const runs = useQuery({ queryKey: key, queryFn: () => getJson<{ runs: ChecklistRun[] }>(base).then((b) => b.runs) });
  const [error, setError] = useState<string | null>(null);
  const refresh = () => client.invalidateQueries({ queryKey: key });
  const start = useMutation({ mutationFn: () => write(base, {}), onSuccess: refresh, onError: (e) => setError(e.message) });
  const tick = useMutation({
    mutationFn: (t: { runId: string; itemId: string; checked: boolean }) => write(`${base}/${t.runId}/ticks`, { itemId: t.itemId, checked: t.checked }),
    onSuccess: () => {
      setError(null);
      return refresh();
    },
    onError: (e) => setError(e.message),
  });

  if (runs.error) return <FormError message={runs.error.message} />;
  if (!runs.data) return <p className="text-ink-600">Loading the checklist…</p>;
  const [latest, ...earlier] = runs.data;
  return (
    <div className="space-y-4">
      {canRun && hasTemplate ? (
        <Button tone={latest ? "secondary" : "primary"} onClick={() => start.mutate()} disabled={start.isPending}>
          {latest ? "Start a new run for today" : "Start the checklist"}
        </Button>
      ) : null}
      {!hasTemplate ? <p>The crew has no checklist yet: a lead writes it on the Crew → Checklist page.</p> : null}
      {latest ? (
        <fieldset className="space-y-2">
          <legend className="font-semibold">
            Run started by {latest.startedByName}, {when(latest.startedAt)}: {latest.items.filter((i) => i.checked).length} of {latest.items.length} done
          </legend>
          <ul className="space-y-2">
            {latest.items.map((item) => (
              <li key={item.id}>
                <label className="flex min-h-target items-start gap-3">
                  <input
                    type="checkbox"
                    className="mt-1 h-6 w-6 shrink-0"
                    checked={item.checked}
                    disabled={!canRun || tick.isPending}
                    onChange={(e) => tick.mutate({ runId: latest.id, itemId: item.id, checked: e.target.checked })}
                  />
                  <span>
                    {item.text}
                    {item.tickedBy ? (
                      <span className="block text-sm text-ink-500">
                        {item.checked ? "Ticked" : "Unticked"} by {item.tickedBy}, {when(item.tickedAt!)}
                      </span>
                    ) : null}
                  </span>
                </label>
              </li>
            ))}
          </ul>
        </fieldset>
      ) : hasTemplate ? (
        <p>No run of the checklist on this revision yet.</p>
      ) : null}
      {earlier.length ? (
        <p className="text-sm text-ink-600">
          Earlier runs: {earlier.map((r) => `${when(r.startedAt)} (${r.items.filter((i) => i.checked).length} of ${r.items.length})`).join("; ")}.
        </p>
      ) : null}
      <FormError message={error} />
    </div>
  );
}
