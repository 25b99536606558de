"use client";

import { useMemo, useState } from "react";
import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { Button } from "@/components/ui/button";
import { FormError } from "@/components/forms/form-error";
import { callApi, getJson } from "@/components/forms/call-api";
import { sendOrQueue } from "@/components/offline/outbox";
import { useOnline, useQueuedWrites, useRefetchWhenSent } from "@/components/offline/use-offline";
import type { ChecklistRun } from "@/db/checklists";
import { when } from "@/lib/when";

/** The crew's checklist run on the signed-off revision: start one for the day, tick items, see who ticked what and when. */
export function ChecklistRuns({
  rigId,
  rigName,
  revisionId,
  canRun,
  hasTemplate,
}: {
  rigId: string;
  rigName: string;
  revisionId: string;
  canRun: boolean;
  hasTemplate: boolean;
}) {
  const base = `/api/rigs/${rigId}/revisions/${revisionId}/checklists`;
  const key = useMemo(() => ["rig", rigId, "revision", revisionId, "checklists"], [rigId, revisionId]);
  const client = useQueryClient();
  const online = useOnline();
  const runs = useQuery({ queryKey: key, queryFn: () => getJson<{ runs: ChecklistRun[] }>(base).then((b) => b.runs) });
  const [error, setError] = useState<string | null>(null);
  const refresh = () => client.invalidateQueries({ queryKey: key });
  const start = useMutation({
    mutationFn: async () => {
      // The run's items come from the server as they read now, so a run is started with a connection.
      const answer = await callApi("POST", base, { idempotencyKey: crypto.randomUUID() });
      if (!answer.ok) throw new Error(answer.error);
    },
    onSuccess: refresh,
    onError: (e) => setError(e.message),
  });
  const tick = useMutation({
    mutationFn: async (t: { runId: string; itemId: string; text: string; checked: boolean }) => {
      const sent = await sendOrQueue({
        url: `${base}/${t.runId}/ticks`,
        body: { itemId: t.itemId, checked: t.checked },
        what: `${t.checked ? "Tick" : "Untick"} “${t.text}” on ${rigName}`,
        rigId,
        target: { kind: "tick", runId: t.runId, itemId: t.itemId, checked: t.checked },
      });
      if (sent.outcome === "refused") throw new Error(sent.error);
      return sent.outcome;
    },
    onSuccess: (outcome) => {
      setError(null);
      if (outcome === "sent") return refresh();
    },
    onError: (e) => setError(e.message),
  });
  // Ticks made offline show at once, marked as waiting; when they have been sent the server's record is read again.
  const queued = useQueuedWrites().items ?? [];
  const waitingTicks = queued.flatMap((w) => (!w.refusal && w.target.kind === "tick" && w.target.runId === runs.data?.[0]?.id ? [w.target] : []));
  const waitingCount = waitingTicks.length;
  useRefetchWhenSent(waitingCount, key);

  if (runs.error) return <FormError message={runs.error.message} />;
  if (!runs.data) return <p className="text-ink-600">Loading the checklist…</p>;
  const [latest, ...earlier] = runs.data;
  // The latest waiting tick of an item is what the member last did to it.
  const shown = (latest?.items ?? []).map((item) => {
    const last = waitingTicks.findLast((t) => t.itemId === item.id);
    return last ? { ...item, checked: last.checked, waiting: true } : { ...item, waiting: false };
  });
  return (
    <div className="space-y-4">
      {canRun && hasTemplate ? (
        <div>
          <Button tone={latest ? "secondary" : "primary"} onClick={() => start.mutate()} disabled={start.isPending || !online}>
            {latest ? "Start a new run for today" : "Start the checklist"}
          </Button>
          {online ? null : (
            <p className="mt-1 text-sm text-ink-600">Starting a run needs a connection; the items of a run already started can be ticked now.</p>
          )}
        </div>
      ) : null}
      {!hasTemplate ? <p>The crew has no checklist yet: a lead writes it on the Crew → Checklist page.</p> : null}
      {latest ? (
        <fieldset className="space-y-2">
          <legend className="font-semibold">
            Run started by {latest.startedByName}, {when(latest.startedAt)}: {shown.filter((i) => i.checked).length} of {shown.length} done
          </legend>
          <ul className="space-y-2">
            {shown.map((item) => (
              <li key={item.id}>
                <label className="flex min-h-target items-start gap-3">
                  <input
                    type="checkbox"
                    className="mt-1 h-6 w-6 shrink-0"
                    checked={item.checked}
                    disabled={!canRun || tick.isPending}
                    onChange={(e) => tick.mutate({ runId: latest.id, itemId: item.id, text: item.text, checked: e.target.checked })}
                  />
                  <span>
                    {item.text}
                    {item.waiting ? (
                      <span className="block text-sm font-semibold text-caution-800">
                        {item.checked ? "Ticked" : "Unticked"} on this phone, waiting to sync
                      </span>
                    ) : item.tickedBy ? (
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
