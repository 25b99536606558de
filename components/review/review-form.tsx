"use client";

import { useState } from "react";
import { useRouter } from "next/navigation";
import { Button } from "@/components/ui/button";
import { TextArea } from "@/components/ui/field";
import { FormError } from "@/components/forms/form-error";
import { useReviewStep } from "./review-actions";

/** The lead's two answers to a revision in review: sign it off with the statement confirmed, or return it with comments. */
export function ReviewForm({ rigId, revisionId, statement, refusal }: { rigId: string; revisionId: string; statement: string; refusal: string | null }) {
  const router = useRouter();
  const toRig = () => router.push(`/rigs/${rigId}`);
  const sign = useReviewStep(rigId, revisionId);
  const back = useReviewStep(rigId, revisionId);
  const [confirmed, setConfirmed] = useState(false);
  const [comments, setComments] = useState("");
  return (
    <div className="grid gap-6 lg:grid-cols-2">
      <form
        className="space-y-3"
        onSubmit={(e) => {
          e.preventDefault();
          void sign.send({ step: "sign", confirm: confirmed }, toRig);
        }}
      >
        <h3 className="font-semibold">Sign off</h3>
        {refusal ? <p className="text-caution-800">{refusal}</p> : null}
        <label className="flex items-start gap-3">
          <input type="checkbox" className="mt-1 h-6 w-6 shrink-0" checked={confirmed} onChange={(e) => setConfirmed(e.target.checked)} />
          <span>{statement}</span>
        </label>
        <Button type="submit" disabled={sign.busy || refusal !== null}>
          Sign off this revision
        </Button>
        <FormError message={sign.error} />
      </form>
      <form
        className="space-y-3"
        onSubmit={(e) => {
          e.preventDefault();
          void back.send({ step: "return", note: comments }, toRig);
        }}
      >
        <h3 className="font-semibold">Return it to draft</h3>
        <TextArea
          label="Comments for the rigger"
          hint="What should change before it is signed off."
          value={comments}
          onChange={(e) => setComments(e.target.value)}
          error={back.fieldError}
          maxLength={2000}
        />
        <Button type="submit" tone="secondary" disabled={back.busy}>
          Return with comments
        </Button>
        <FormError message={back.error} />
      </form>
    </div>
  );
}
