"use client";

import { useState } from "react";
import { useRouter } from "next/navigation";
import { useQueryClient } from "@tanstack/react-query";
import { Button } from "@/components/ui/button";
import { TextArea } from "@/components/ui/field";
import { FormError } from "@/components/forms/form-error";
import { callApi } from "@/components/forms/call-api";

/** One review step sent to the rig's review route; the page reloads its figures from the server after. */
export function useReviewStep(rigId: string, revisionId: string) {
  const router = useRouter();
  const client = useQueryClient();
  const [error, setError] = useState<string | null>(null);
  const [fieldError, setFieldError] = useState<string | undefined>();
  const [busy, setBusy] = useState(false);
  const send = async (body: Record<string, unknown>, then?: (answer: Record<string, unknown>) => void) => {
    setBusy(true);
    const answer = await callApi("POST", `/api/rigs/${rigId}/revisions/${revisionId}/review`, body);
    setBusy(false);
    if (!answer.ok) {
      setFieldError(Object.values(answer.fieldErrors)[0]);
      return setError(answer.error);
    }
    setError(null);
    setFieldError(undefined);
    then?.(answer.body);
    // The revision's state shows in the history list too, which the client fetched itself.
    void client.invalidateQueries({ queryKey: ["rig", rigId] });
    router.refresh();
  };
  return { send, error, fieldError, busy };
}

/** A rigger submits the latest draft for review, with a note for the lead. */
export function SubmitForReview({ rigId, revisionId, revisionNumber }: { rigId: string; revisionId: string; revisionNumber: number }) {
  const { send, error, fieldError, busy } = useReviewStep(rigId, revisionId);
  const [note, setNote] = useState("");
  const [sent, setSent] = useState<string | null>(null);
  return (
    <form
      className="space-y-3"
      onSubmit={(e) => {
        e.preventDefault();
        void send({ step: "submit", note }, (body) =>
          setSent(`Submitted. ${body.notified === 1 ? "One lead or owner was" : `${body.notified} leads and owners were`} sent a link to review it.`),
        );
      }}
    >
      <TextArea
        label={`Note for the reviewer on revision ${revisionNumber}`}
        hint="What to look at, what you measured on site, what you are unsure of."
        value={note}
        onChange={(e) => setNote(e.target.value)}
        error={fieldError}
        maxLength={2000}
      />
      <Button type="submit" disabled={busy}>
        Submit for review
      </Button>
      {sent ? <p role="status">{sent}</p> : null}
      <FormError message={error} />
    </form>
  );
}
