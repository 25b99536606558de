import type { Metadata } from "next";
import { notFound } from "next/navigation";
import Link from "next/link";
import { PageHeader } from "@/components/page-header";
import { CautionNotice } from "@/components/caution-notice";
import { Planner } from "@/components/rigs/planner";
import { RevisionDifferences } from "@/components/rigs/revision-history";
import { ReviewForm } from "@/components/review/review-form";
import { Panel } from "@/components/ui/panel";
import { savedRevision } from "@/lib/planner/saved-revision";
import { recordedCatalogue } from "@/lib/planner/kit";
import { authorizePage } from "@/lib/authz";
import { can } from "@/lib/roles";
import { isUuid } from "@/lib/validations/ids";
import { REVISION_STATE_LABELS } from "@/lib/validations/rigs";
import { SIGN_OFF_STATEMENT, selfSignOffRefusal } from "@/lib/review/steps";
import { when } from "@/lib/when";
import { crewSettings } from "@/db/crews";
import { findRevision, findRig } from "@/db/rigs";
import { standingSignOff } from "@/db/reviews";
import { latestSubmission } from "@/db/audit-log";

export const metadata: Metadata = { title: "Review" };

/** The review of a rig's revision in review: what the rigger said, what changed since the last sign-off, the figures, and the lead's answer. */
export default async function ReviewPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const context = await authorizePage("rig.read", `/rigs/${id}/review`);
  const rig = isUuid(id) ? await findRig(context.crew.id, id) : null;
  if (!rig) notFound();
  const inReview = rig.head.state === "in_review";
  if (!inReview) {
    return (
      <>
        <PageHeader title={`Review of ${rig.name}`} />
        <p>
          Nothing of this rig is in review: its latest revision, {rig.head.number}, is {REVISION_STATE_LABELS[rig.head.state].toLowerCase()}.{" "}
          <Link href={`/rigs/${rig.id}`}>Open the rig</Link>.
        </p>
      </>
    );
  }
  const [revision, signOff, submission, settings] = await Promise.all([
    findRevision(context.crew.id, rig.id, rig.head.id),
    standingSignOff(context.crew.id, rig.id),
    latestSubmission(context.crew.id, rig.head.id),
    crewSettings(context.crew.id),
  ]);
  if (!revision) notFound();
  const signedRevision = signOff ? await findRevision(context.crew.id, rig.id, signOff.revisionId) : null;
  const catalogue = recordedCatalogue(revision);
  const saved = savedRevision(revision);
  const isOwn = revision.authorId === context.user.id || submission?.actorId === context.user.id;
  const refusal = selfSignOffRefusal({ isOwn, allowSelfSignOff: settings.allowSelfSignOff, crewName: context.crew.name });
  return (
    <>
      <PageHeader
        title={`Review of ${rig.name}`}
        lead={
          <>
            Revision {revision.number}, saved by {revision.authorName ?? "someone no longer in the crew"} on {when(revision.createdAt)}
            {submission ? `, submitted by ${submission.actorName} on ${when(submission.at)}` : ""}. <Link href={`/rigs/${rig.id}`}>Open the rig</Link>.
          </>
        }
      />
      <div className="space-y-6">
        {submission?.note ? (
          <Panel title="The rigger's note" id="note">
            <p className="whitespace-pre-line">{submission.note}</p>
          </Panel>
        ) : null}
        <Panel title={signedRevision ? `What changed since signed-off revision ${signedRevision.number}` : "What changed"} id="changes">
          {signedRevision ? (
            <RevisionDifferences from={signedRevision} to={revision} units={context.crew.units} catalogue={catalogue} />
          ) : (
            <p>No revision of this rig has been signed off before: check every input.</p>
          )}
        </Panel>
        {can(context.role, "rig.sign") ? (
          <Panel title="Your answer" id="answer">
            <ReviewForm rigId={rig.id} revisionId={revision.id} statement={SIGN_OFF_STATEMENT} refusal={refusal} />
          </Panel>
        ) : (
          <p>A lead or owner of {context.crew.name} signs this revision off or returns it.</p>
        )}
        <CautionNotice compact />
        <Planner
          mode="view"
          units={context.crew.units}
          catalogue={catalogue}
          sites={revision.snapshot.site ? [revision.snapshot.site] : []}
          start={saved.values}
          revision={{ ...saved, rigId: rig.id }}
          kitChanges={[]}
        />
      </div>
    </>
  );
}
