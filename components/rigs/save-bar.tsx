"use client";

import { when } from "@/lib/when";
import { useEffect, useState } from "react";
import { useRouter } from "next/navigation";
import type { UseFormReturn } from "react-hook-form";
import { useMutation, useQueryClient } from "@tanstack/react-query";
import { Button } from "@/components/ui/button";
import { callApi, type ApiAnswer } from "@/components/forms/call-api";
import type { UnitSystem } from "@/lib/rig-form/quantities";
import { inputDifferences, reapplyEdits } from "@/lib/planner/differences";
import { plannerValues, type KitCatalogue } from "@/lib/planner/kit";
import { savedRevision, type RevisionBody, type SavedRevision } from "@/lib/planner/saved-revision";

export type { SavedRevision };
import { REVISION_STATE_LABELS } from "@/lib/validations/rigs";
import type { Evaluation } from "./evaluation";
import { modelNamer } from "./revision-history";

type Values = Record<string, unknown>;

/** The server's field errors for the values it refused, shown until those values change. */
export interface ServerRefusal {
  valuesJson: string;
  fieldErrors: Record<string, string>;
}

/** What is sent for a save: the rig's name and site apart, the engine's input (with the Kit's ids) as it is. */
function saveBody(values: Values) {
  const { siteId, ...inputs } = values;
  return { name: String(values.name ?? ""), siteId: typeof siteId === "string" ? siteId : null, inputs };
}

function Conflict({
  current,
  mine,
  base,
  units,
  catalogue,
  onReapply,
  onDiscard,
}: {
  current: RevisionBody;
  mine: Values;
  base: Values;
  units: UnitSystem;
  catalogue: KitCatalogue;
  onReapply: (values: Values) => void;
  onDiscard: (values: Values) => void;
}) {
  const theirs = plannerValues(current);
  const differences = inputDifferences(theirs, mine, units, modelNamer(catalogue, [current.snapshot]));
  return (
    <div role="alert" className="space-y-3 rounded-panel border-2 border-caution-500 bg-caution-100 p-4 text-caution-800">
      <p className="font-semibold">
        Revision {current.number} was saved by {current.authorName ?? "someone"} ({when(current.createdAt)}) while you edited. Your edits are kept and were not
        saved.
      </p>
      {differences.length ? (
        <table className="w-full text-left text-sm">
          <caption className="text-left font-semibold">Inputs that differ between revision {current.number} and your edits</caption>
          <thead>
            <tr className="border-b border-caution-500">
              <th scope="col" className="py-1 pr-2">
                Input
              </th>
              <th scope="col" className="py-1 pr-2">
                Revision {current.number}
              </th>
              <th scope="col" className="py-1">
                Yours
              </th>
            </tr>
          </thead>
          <tbody>
            {differences.map((d) => (
              <tr key={d.path} className="border-b border-caution-500/40">
                <th scope="row" className="py-1 pr-2 font-medium">
                  {d.label}
                </th>
                <td className="py-1 pr-2 tabular-nums">{d.before}</td>
                <td className="py-1 tabular-nums">{d.after}</td>
              </tr>
            ))}
          </tbody>
        </table>
      ) : (
        <p>Your inputs are the same as revision {current.number}&apos;s.</p>
      )}
      <div className="flex flex-wrap gap-2">
        <Button onClick={() => onReapply(reapplyEdits(theirs, base, mine))}>Reapply my edits on revision {current.number}</Button>
        <Button tone="secondary" onClick={() => onDiscard(theirs)}>
          Discard my edits and load revision {current.number}
        </Button>
      </div>
    </div>
  );
}

interface SaveBarProps {
  mode: "new" | "edit" | "view";
  form: UseFormReturn<Values>;
  valuesJson: string;
  evaluation: Evaluation;
  revision?: SavedRevision & { rigId: string };
  units: UnitSystem;
  catalogue: KitCatalogue;
  onRefused: (refusal: ServerRefusal | null) => void;
}

/**
 * Saving: a new rig, or a revision on top of the one the editor started from. A save that meets a newer
 * revision keeps every edit and offers to carry them over; a refused save keeps them too.
 */
export function SaveBar({ mode, form, valuesJson, evaluation, revision, units, catalogue, onRefused }: SaveBarProps) {
  const router = useRouter();
  const queryClient = useQueryClient();
  const [base, setBase] = useState(revision ? { ...revision, json: valuesJson } : null);
  const [conflict, setConflict] = useState<RevisionBody | null>(null);
  const [message, setMessage] = useState<{ tone: "ok" | "error"; text: string } | null>(null);
  const dirty = mode === "new" || (base !== null && base.json !== valuesJson);

  useEffect(() => {
    if (!dirty || mode === "view") return;
    const warn = (event: BeforeUnloadEvent) => event.preventDefault();
    window.addEventListener("beforeunload", warn);
    return () => window.removeEventListener("beforeunload", warn);
  }, [dirty, mode]);

  const save = useMutation({
    mutationFn: async (values: Values): Promise<{ answer: ApiAnswer; json: string }> => {
      const body = saveBody(values);
      const answer =
        mode === "new"
          ? await callApi("POST", "/api/rigs", body)
          : await callApi("POST", `/api/rigs/${revision!.rigId}/revisions`, { ...body, basedOnRevisionId: base!.id });
      return { answer, json: JSON.stringify(values) };
    },
    onSuccess: ({ answer, json }) => {
      if (answer.ok) {
        onRefused(null);
        const saved = answer.body.revision as RevisionBody;
        if (mode === "new") {
          router.push(`/rigs/${(answer.body.rig as { id: string }).id}`);
          return;
        }
        setBase({ ...savedRevision(saved), rigId: saved.rigId, json });
        setConflict(null);
        setMessage({
          tone: "ok",
          text: `Saved as revision ${saved.number} (${REVISION_STATE_LABELS[saved.state].toLowerCase()}), with the server's figures of record.`,
        });
        void queryClient.invalidateQueries({ queryKey: ["rig", saved.rigId] });
        return;
      }
      if (answer.status === 409 && answer.body.current) {
        setConflict(answer.body.current as RevisionBody);
        setMessage(null);
        return;
      }
      onRefused({ valuesJson: json, fieldErrors: answer.fieldErrors });
      setMessage({ tone: "error", text: `${answer.error} Nothing you typed is lost.` });
    },
  });

  if (mode === "view") {
    return revision ? (
      <p className="rounded-panel border border-ink-200 bg-white p-3 text-sm text-ink-700 shadow-panel">
        Revision {revision.number}, {REVISION_STATE_LABELS[revision.state].toLowerCase()}, saved by {revision.authorName ?? "someone"} on{" "}
        {when(revision.createdAt)}. Read only: moving the walker shows other positions but changes nothing.
      </p>
    ) : null;
  }
  const blocked = evaluation.kind !== "figures" || evaluation.gearProblems.length > 0;
  return (
    <div className="space-y-3 rounded-panel border border-ink-200 bg-white p-3 shadow-panel">
      <div className="flex flex-wrap items-center gap-3">
        <Button onClick={() => save.mutate(form.getValues())} disabled={save.isPending || blocked || !dirty}>
          {save.isPending ? "Saving…" : mode === "new" ? "Save the rig" : "Save as a new revision"}
        </Button>
        <p className="text-sm text-ink-700" aria-live="polite">
          {base ? `Editing from revision ${base.number} (${REVISION_STATE_LABELS[base.state].toLowerCase()}). ` : "Not saved yet. "}
          {blocked ? "Mend the marked fields to save." : dirty ? "Unsaved edits." : "No edits since it was saved."}
        </p>
      </div>
      {message ? (
        <p
          role={message.tone === "error" ? "alert" : "status"}
          className={message.tone === "error" ? "font-semibold text-danger-700" : "font-semibold text-ok-700"}
        >
          {message.text}
        </p>
      ) : null}
      {conflict && base ? (
        <Conflict
          current={conflict}
          mine={JSON.parse(valuesJson)}
          base={base.values}
          units={units}
          catalogue={catalogue}
          onReapply={(values) => {
            setBase({ ...savedRevision(conflict), rigId: conflict.rigId, json: JSON.stringify(plannerValues(conflict)) });
            form.reset(values);
            setConflict(null);
            setMessage({ tone: "ok", text: `Your edits now stand on revision ${conflict.number}. Check the figures, then save.` });
          }}
          onDiscard={(values) => {
            setBase({ ...savedRevision(conflict), rigId: conflict.rigId, json: JSON.stringify(values) });
            form.reset(values);
            setConflict(null);
            setMessage(null);
          }}
        />
      ) : null}
    </div>
  );
}
