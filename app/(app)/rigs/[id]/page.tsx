import type { Metadata } from "next";
import { notFound } from "next/navigation";
import Link from "next/link";
import { PageHeader } from "@/components/page-header";
import { CautionNotice } from "@/components/caution-notice";
import { Planner } from "@/components/rigs/planner";
import { RevisionHistory } from "@/components/rigs/revision-history";
import { savedRevision } from "@/lib/planner/saved-revision";
import { authorizePage } from "@/lib/authz";
import { can } from "@/lib/roles";
import { isUuid } from "@/lib/validations/ids";
import { plannerData } from "@/lib/planner/page-data";
import { kitChangesSince, recordedCatalogue } from "@/lib/planner/kit";
import { REVISION_STATE_LABELS } from "@/lib/validations/rigs";
import { findRevision, findRig } from "@/db/rigs";
import { Panel } from "@/components/ui/panel";
import { SignOffStatus } from "@/components/review/sign-off-status";
import { SubmitForReview } from "@/components/review/review-actions";
import { ReuseForm } from "@/components/review/reuse-form";
import { ChecklistRuns } from "@/components/review/checklist-runs";
import { ReadingsPanel } from "@/components/review/readings-panel";
import { AuditLog } from "@/components/review/audit-log";
import { rigReviewData } from "@/lib/review/rig-review-data";
import { KeepRig } from "@/components/offline/keep-rig";

export const metadata: Metadata = { title: "Rig" };

export default async function RigPage({ params, searchParams }: { params: Promise<{ id: string }>; searchParams: Promise<{ revision?: string }> }) {
  const { id } = await params;
  const { revision: asked } = await searchParams;
  const context = await authorizePage("rig.read", `/rigs/${id}`);
  const rig = isUuid(id) ? await findRig(context.crew.id, id) : null;
  if (!rig) notFound();
  const revisionId = asked && isUuid(asked) ? asked : rig.head.id;
  const [revision, data, review] = await Promise.all([
    findRevision(context.crew.id, rig.id, revisionId),
    plannerData(context.crew.id),
    rigReviewData(context.crew.id, rig, context.crew.units),
  ]);
  if (!revision) notFound();
  const isHead = revision.id === rig.head.id;
  // A revision in review is what the lead reads: it is returned or signed off before anyone edits the rig.
  const mode = can(context.role, "rig.write") && isHead && revision.state !== "in_review" ? "edit" : "view";
  const signed = review.signOff;
  // Reading a revision shows it as it was saved; editing uses the Kit and sites as they are now
  // (a site archived since stays offered to the rig that stands on it).
  const recordedSite = revision.snapshot.site;
  const sites =
    mode === "view"
      ? recordedSite
        ? [recordedSite]
        : []
      : recordedSite && !data.sites.some((s) => s.id === recordedSite.id)
        ? [...data.sites, recordedSite]
        : data.sites;
  const catalogue = mode === "view" ? recordedCatalogue(revision) : data.catalogue;
  const saved = savedRevision(revision);
  return (
    <>
      <PageHeader
        title={rig.name}
        lead={
          <>
            {rig.siteId ? (
              <>
                On <Link href={`/sites/${rig.siteId}`}>{rig.siteName}</Link> ·{" "}
              </>
            ) : (
              "Free span · "
            )}
            Revision {revision.number} of {rig.revisionCount}, {REVISION_STATE_LABELS[revision.state].toLowerCase()}
            {isHead ? "" : ` (the current one is revision ${rig.head.number}: `}
            {isHead ? null : (
              <>
                <Link href={`/rigs/${rig.id}`}>open it</Link>)
              </>
            )}
            {mode === "view" && isHead ? ". You can read this rig; riggers change it." : "."}
          </>
        }
      />
      <p className="-mt-4 mb-2 flex flex-wrap gap-x-5 gap-y-1 text-sm">
        <Link href={`/rigs/${rig.id}/card?revision=${revision.id}`}>Rig card to print</Link>
        <a href={`/api/rigs/${rig.id}/revisions/${revision.id}/card`}>Rig card as PDF</a>
      </p>
      <div className="mb-6">
        <KeepRig
          rig={{
            rigId: rig.id,
            name: rig.name,
            revisionText: `Revision ${revision.number}, ${REVISION_STATE_LABELS[revision.state].toLowerCase()}`,
            siteName: rig.siteName ?? null,
            signedOffNumber: signed?.revisionNumber ?? null,
          }}
          revisionId={revision.id}
          signedOffRevisionId={signed?.revisionId ?? null}
        />
      </div>
      <div className="space-y-6">
        <SignOffStatus rigId={rig.id} signOff={signed} verification={review.verification} latest={rig.head} />
        {review.reusedFrom ? (
          <p>
            Started from <Link href={`/rigs/${review.reusedFrom.rigId}`}>{review.reusedFrom.rigName}</Link>, signed-off revision {review.reusedFrom.number}.
          </p>
        ) : null}
        {rig.head.state === "in_review" ? (
          <p className="rounded-panel border-2 border-info-700 bg-info-100 p-3">
            Revision {rig.head.number} is in review: the crew&apos;s leads and owners were asked to review it, and nobody changes the rig until one signs it off
            or returns it. <Link href={`/rigs/${rig.id}/review`}>{can(context.role, "rig.sign") ? "Review it" : "See the review"}</Link>.
          </p>
        ) : null}
        <CautionNotice compact />
        <Planner
          key={revision.id}
          mode={mode}
          units={data.units}
          catalogue={catalogue}
          sites={sites}
          start={saved.values}
          revision={{ ...saved, rigId: rig.id }}
          kitChanges={mode === "edit" ? kitChangesSince(revision.snapshot, data.catalogue) : []}
        />
        {isHead && rig.head.state === "draft" && can(context.role, "rig.submit") ? (
          <Panel title="Submit for review" id="submit">
            <SubmitForReview rigId={rig.id} revisionId={rig.head.id} revisionNumber={rig.head.number} />
          </Panel>
        ) : null}
        {signed ? (
          <Panel title={`On site: signed-off revision ${signed.revisionNumber}`} id="on-site">
            <h3 className="font-semibold">Checklist</h3>
            <ChecklistRuns
              rigId={rig.id}
              rigName={rig.name}
              revisionId={signed.revisionId}
              canRun={can(context.role, "checklist.run")}
              hasTemplate={review.hasChecklist}
            />
            <h3 className="pt-2 font-semibold">Measured tension</h3>
            <p className="text-sm text-ink-600">
              A load cell&apos;s reading beside the engine&apos;s prediction for the same conditions on this revision. A large difference means the line, the
              stretch curve or the reading is not what the plan assumed: find out why before anyone walks.
            </p>
            <ReadingsPanel
              rigId={rig.id}
              rigName={rig.name}
              revisionId={signed.revisionId}
              units={data.units}
              canRecord={can(context.role, "reading.write")}
              readAt={review.signedReadAt}
            />
          </Panel>
        ) : null}
        {signed && can(context.role, "rig.reuse") ? (
          <Panel title="Use this rig for another site or day" id="reuse">
            <p className="text-sm text-ink-600">
              Starts a new rig whose first draft is signed-off revision {signed.revisionNumber}, checked again with the Kit as it is now. It needs its own
              sign-off.
            </p>
            <ReuseForm rigId={rig.id} revisionId={signed.revisionId} rigName={rig.name} sites={data.sites} siteId={rig.siteId} />
          </Panel>
        ) : null}
        <Panel title="Revision history" id="history">
          <RevisionHistory rigId={rig.id} units={data.units} catalogue={data.catalogue} />
        </Panel>
        <Panel title="What happened" id="audit-log">
          <AuditLog entries={review.auditLog} />
        </Panel>
      </div>
    </>
  );
}
