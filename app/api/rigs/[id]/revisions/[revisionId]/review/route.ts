import { NextResponse } from "next/server";
import { crewRoute, parseBody } from "@/lib/api";
import { AccessError } from "@/lib/authz";
import { RequestError } from "@/lib/http-errors";
import { can, refusalText, type Action } from "@/lib/roles";
import { rowId } from "@/lib/validations/ids";
import { ReviewStepSchema } from "@/lib/validations/review";
import { SIGN_OFF_STATEMENT, type ReviewStep } from "@/lib/review/steps";
import { appOrigin } from "@/lib/app-origin";
import { sendMail } from "@/lib/mail/transport";
import { reviewRequestMail } from "@/lib/mail/messages";
import { crewSettings } from "@/db/crews";
import { findRevision, findRig } from "@/db/rigs";
import { findSignOff, reviewers, takeStep } from "@/db/reviews";

type Params = { id: string; revisionId: string };

const STEP_PERMISSION: Record<ReviewStep, Action> = { submit: "rig.submit", return: "rig.sign", sign: "rig.sign" };

/** One step of a revision's review: submit it (riggers), return it with comments or sign it off (leads and owners). */
export const POST = crewRoute<Params>("rig.read", async ({ crew, user, role }, request, { id, revisionId }) => {
  const rigId = rowId(id, "rig");
  rowId(revisionId, "revision");
  const body = await parseBody(request, ReviewStepSchema);
  const action = STEP_PERMISSION[body.step];
  if (!can(role, action)) throw new AccessError(403, refusalText(action, role, crew.name));
  const { allowSelfSignOff } = await crewSettings(crew.id);
  const done = await takeStep(body.step, {
    crewId: crew.id,
    crewName: crew.name,
    rigId,
    revisionId,
    actor: user,
    note: body.note || null,
    allowSelfSignOff,
    statement: SIGN_OFF_STATEMENT,
  });
  if (done.outcome === "not_found") throw new RequestError(404, "No such revision of this rig in this crew.");
  if (done.outcome === "refused") {
    if (done.status === 403) throw new AccessError(403, done.message);
    throw new RequestError(409, done.message);
  }
  const revision = (await findRevision(crew.id, rigId, revisionId))!;
  let notified = 0;
  if (body.step === "submit") notified = await askForReview(request, crew, user.name, rigId, revision.number, body.note);
  return NextResponse.json({ revision, signOff: body.step === "sign" ? await findSignOff(crew.id, revisionId) : null, notified });
});

/** Mails the crew's leads and owners a link to the review; the submission stands even if a mail cannot be sent. */
async function askForReview(request: Request, crew: { id: string; name: string }, riggerName: string, rigId: string, revisionNumber: number, note: string) {
  const rig = (await findRig(crew.id, rigId))!;
  const url = `${appOrigin(request)}/rigs/${rigId}/review`;
  let sent = 0;
  for (const reviewer of await reviewers(crew.id)) {
    try {
      await sendMail(reviewRequestMail({ to: reviewer.email, crewName: crew.name, riggerName, rigName: rig.name, revisionNumber, note, url }));
      sent++;
    } catch (error) {
      console.error(`The review request to ${reviewer.email} could not be sent:`, error);
    }
  }
  return sent;
}
