"use client";

import { changeText, loadText } from "@/physics";
import { useMemo } from "react";
import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { useForm, useWatch, type Control } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { Select } from "@/components/ui/select";
import { FormError } from "@/components/forms/form-error";
import { getJson } from "@/components/forms/call-api";
import { sendOrQueue } from "@/components/offline/outbox";
import { useQueuedWrites, useRefetchWhenSent } from "@/components/offline/use-offline";
import { useQuantityText } from "@/components/forms/use-quantity-text";
import type { TensionReading } from "@/db/readings";
import { readingSchema, type ReadingBody } from "@/lib/validations/review";
import { readingDifferencePercent } from "@/lib/review/reading-prediction";
import { formatDistance, formatQuantity } from "@/lib/rig-form/format";
import { fromShown, inputText, unitLabel, type QuantityKind, type UnitSystem } from "@/lib/rig-form/quantities";
import { when } from "@/lib/when";

type Values = Record<string, unknown>;

function QuantityBox({ control, name, label, kind, units }: { control: Control<Values>; name: string; label: string; kind: QuantityKind; units: UnitSystem }) {
  const { input, error } = useQuantityText(
    control,
    name,
    (si) => inputText(si, kind, units),
    (shown) => fromShown(shown, kind, units),
  );
  return <Field label={`${label} (${unitLabel(kind, units)})`} {...input} error={error} />;
}

/** The conditions of a reading in words: "sag 1.20 m" or "walker 80.0 kg at 40.00 m from A". */
export function readingConditions(r: TensionReading, units: UnitSystem): string {
  return r.kind === "pretension"
    ? `nobody on the line, sag ${formatDistance(r.sagM!, units)} at mid-span`
    : `walker ${formatQuantity(r.walkerMassKg!, "mass", units, "up")} at ${formatDistance(r.walkerPositionM!, units)} from A`;
}

export const differenceText = (r: TensionReading) => changeText(readingDifferencePercent(r.measuredN, r.predictedN));

/** Load-cell readings on the signed-off revision: the form, and each reading beside the engine's prediction. */
export function ReadingsPanel({
  rigId,
  rigName,
  revisionId,
  units,
  canRecord,
  readAt,
}: {
  rigId: string;
  rigName: string;
  revisionId: string;
  units: UnitSystem;
  canRecord: boolean;
  readAt: "a" | "b";
}) {
  const url = `/api/rigs/${rigId}/revisions/${revisionId}/readings`;
  const key = useMemo(() => ["rig", rigId, "revision", revisionId, "readings"], [rigId, revisionId]);
  const client = useQueryClient();
  const readings = useQuery({ queryKey: key, queryFn: () => getJson<{ readings: TensionReading[] }>(url).then((b) => b.readings) });
  const form = useForm<Values, unknown, ReadingBody>({
    resolver: zodResolver(readingSchema(units)) as never,
    defaultValues: { kind: "pretension", anchor: readAt, note: "" },
  });
  const kind = useWatch({ control: form.control, name: "kind" });
  const save = useMutation({
    mutationFn: async (values: ReadingBody) => {
      const sent = await sendOrQueue({
        url,
        body: values,
        what: `Reading of ${loadText(values.measuredN, units)} at anchor ${values.anchor.toUpperCase()} on ${rigName}`,
        rigId,
        target: { kind: "reading", revisionId, measuredN: values.measuredN, anchor: values.anchor },
      });
      if (sent.outcome === "refused") {
        for (const [field, message] of Object.entries(sent.fieldErrors)) form.setError(field, { type: "server", message });
        throw new Error(sent.error);
      }
      return sent.outcome;
    },
    onSuccess: (outcome) => {
      form.reset({ kind, anchor: form.getValues("anchor"), note: "" });
      if (outcome === "sent") return client.invalidateQueries({ queryKey: key });
    },
  });
  // Readings made offline are listed at once, marked as waiting; once sent, the server's list (with its predictions) is read again.
  const waiting = (useQueuedWrites().items ?? []).filter((w) => !w.refusal && w.target.kind === "reading" && w.target.revisionId === revisionId);
  const waitingCount = waiting.length;
  useRefetchWhenSent(waitingCount, key);

  return (
    <div className="space-y-4">
      {canRecord ? (
        <form className="space-y-3" onSubmit={form.handleSubmit((values) => save.mutate(values))}>
          <div className="grid gap-3 sm:grid-cols-2">
            <Select
              label="What was read"
              {...form.register("kind")}
              options={[
                { value: "pretension", label: "Pretension, nobody on the line" },
                { value: "walker", label: "Tension with a walker on the line" },
              ]}
            />
            <Select
              label="Read at"
              {...form.register("anchor")}
              options={[
                { value: "a", label: "Anchor A" },
                { value: "b", label: "Anchor B" },
              ]}
            />
            <QuantityBox control={form.control} name="measuredN" label="Tension read" kind="force" units={units} />
            {kind === "walker" ? (
              <>
                <QuantityBox control={form.control} name="walkerMassKg" label="Walker's mass" kind="mass" units={units} />
                <QuantityBox control={form.control} name="walkerPositionM" label="Walker's distance from anchor A" kind="length" units={units} />
              </>
            ) : (
              <QuantityBox control={form.control} name="sagM" label="Sag measured at mid-span" kind="length" units={units} />
            )}
            <Field label="Note" {...form.register("note")} error={form.formState.errors.note?.message as string | undefined} maxLength={500} />
          </div>
          <Button type="submit" disabled={save.isPending}>
            Record the reading
          </Button>
          <FormError message={save.error?.message} />
        </form>
      ) : null}
      {waiting.length ? (
        <ul className="space-y-1 rounded-panel border-2 border-caution-500 bg-caution-100 p-3 text-sm" aria-label="Readings waiting to sync">
          {waiting.map((w) => (
            <li key={w.key}>
              {w.what}, made {when(w.madeAt)}: waiting to sync; the prediction beside it is worked out when it reaches the crew.
            </li>
          ))}
        </ul>
      ) : null}
      {readings.error ? <FormError message={readings.error.message} /> : null}
      {readings.data?.length ? (
        <div className="overflow-x-auto" tabIndex={0} aria-label="Readings, scrolls sideways">
          <table className="w-full text-left text-sm">
            <caption className="sr-only">Load-cell readings on this revision, newest first</caption>
            <thead>
              <tr className="border-b border-ink-200">
                <th className="py-1 pr-2">When</th>
                <th className="py-1 pr-2">Conditions</th>
                <th className="py-1 pr-2">Read at</th>
                <th className="py-1 pr-2">Measured</th>
                <th className="py-1 pr-2">Predicted</th>
                <th className="py-1">Difference</th>
              </tr>
            </thead>
            <tbody>
              {readings.data.map((r) => (
                <tr key={r.id} className="border-b border-ink-100">
                  <td className="py-1 pr-2 whitespace-nowrap">
                    {when(r.recordedAt)}, {r.recordedByName}
                  </td>
                  <td className="py-1 pr-2">{readingConditions(r, units)}</td>
                  <td className="py-1 pr-2">anchor {r.anchor.toUpperCase()}</td>
                  <td className="py-1 pr-2 tabular-nums whitespace-nowrap">{loadText(r.measuredN, units)}</td>
                  <td className="py-1 pr-2 tabular-nums whitespace-nowrap">{loadText(r.predictedN, units)}</td>
                  <td className="py-1 tabular-nums">{differenceText(r)}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      ) : readings.data ? (
        <p>No readings on this revision yet.</p>
      ) : null}
    </div>
  );
}
