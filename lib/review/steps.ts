import type { RevisionState } from "@/lib/validations/rigs";
import { REVISION_STATE_LABELS } from "@/lib/validations/rigs";

// The review of a rig revision: which step takes it from which state to which, and why a step is
// refused, in one sentence. The database's trigger holds the same transitions.

export type ReviewStep = "submit" | "return" | "sign";

export const STEP_FROM: Record<ReviewStep, RevisionState> = { submit: "draft", return: "in_review", sign: "in_review" };
export const STEP_TO: Record<ReviewStep, RevisionState> = { submit: "in_review", return: "draft", sign: "signed_off" };

/** What the audit log calls each step. */
export const STEP_ACTIONS: Record<ReviewStep, AuditAction> = { submit: "submitted", return: "returned", sign: "signed_off" };

export const AUDIT_ACTIONS = [
  "rig_started",
  "revision_saved",
  "submitted",
  "returned",
  "signed_off",
  "superseded",
  "reused",
  "checklist_started",
  "checklist_ticked",
  "reading_recorded",
  "checklist_changed",
] as const;
export type AuditAction = (typeof AUDIT_ACTIONS)[number];

export const AUDIT_ACTION_WORDS: Record<AuditAction, string> = {
  rig_started: "started the rig",
  revision_saved: "saved a revision",
  submitted: "submitted it for review",
  returned: "returned it to draft",
  signed_off: "signed it off",
  superseded: "superseded by a newer sign-off",
  reused: "used it for a new rig",
  checklist_started: "started the on-site checklist",
  checklist_ticked: "ticked a checklist item",
  reading_recorded: "recorded a load-cell reading",
  checklist_changed: "changed the crew's checklist",
};

/** The statement a signer confirms; stored with the sign-off as it read then. */
export const SIGN_OFF_STATEMENT =
  "I have checked this revision's inputs and figures against the site and the gear, and I agree the crew may rig it as planned. " +
  "On the day, the crew still inspects every component, follows local rules and stops if anything differs from the plan.";

const stateWords = (state: RevisionState) => REVISION_STATE_LABELS[state].toLowerCase();

/** Why `step` may not be taken on revision `number` in `state`, or null when it may. */
export function stepRefusal(step: ReviewStep, revision: { number: number; state: RevisionState }, latestNumber: number): string | null {
  const name = `Revision ${revision.number}`;
  if (revision.state === STEP_FROM[step]) {
    if (step === "submit" && revision.number !== latestNumber) return `${name} is not the rig's latest: submit revision ${latestNumber} instead.`;
    return null;
  }
  switch (step) {
    case "submit":
      return revision.state === "in_review"
        ? `${name} is already in review.`
        : `${name} is ${stateWords(revision.state)}: only a draft can be submitted. Edit the rig to start a new draft.`;
    case "return":
      return `${name} is ${stateWords(revision.state)}, not in review, so there is nothing to return.`;
    case "sign":
      return revision.state === "draft"
        ? `${name} is a draft: a rig is signed off only after a rigger submits it for review.`
        : `${name} is already ${stateWords(revision.state)}: a revision is signed off once.`;
  }
}

/**
 * Signing off needs a lead or owner (the role table says so); one who wrote or submitted the revision
 * signs it off only where the crew allows self sign-off, so that by default a second person checks it.
 */
export function selfSignOffRefusal(input: { isOwn: boolean; allowSelfSignOff: boolean; crewName: string }): string | null {
  if (!input.isOwn || input.allowSelfSignOff) return null;
  return `You wrote or submitted this revision, and ${input.crewName} does not allow self sign-off: another lead or owner signs it off.`;
}
