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

export const metadata: Metadata = { title: "Rig" };

export default async function RigPage({ params, searchParams }: { params: Promise<{ id: string }>; searchParams: Promise<{ revision?: string }> }) {
  const { id } = await params;
  const { revision: asked } = await searchParams;
  const context = await authorizePage("rig.read", `/rigs/${id}`);
  const rig = isUuid(id) ? await findRig(context.crew.id, id) : null;
  if (!rig) notFound();
  const revisionId = asked && isUuid(asked) ? asked : rig.head.id;
  const [revision, data] = await Promise.all([findRevision(context.crew.id, rig.id, revisionId), plannerData(context.crew.id)]);
  if (!revision) notFound();
  const isHead = revision.id === rig.head.id;
  const mode = can(context.role, "rig.write") && isHead ? "edit" : "view";
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
      <p className="-mt-4 mb-6 flex flex-wrap gap-x-5 gap-y-1 text-sm">
        <Link href={`/rigs/${rig.id}/card?revision=${revision.id}`}>Rig card to print</Link>
        <a href={`/api/rigs/${rig.id}/revisions/${revision.id}/card`}>Rig card as PDF</a>
      </p>
      <div className="space-y-6">
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
        <section aria-labelledby="history" className="space-y-3 rounded-panel border border-ink-200 bg-white p-4 shadow-panel">
          <h2 id="history" className="text-lg">
            Revision history
          </h2>
          <RevisionHistory rigId={rig.id} units={data.units} catalogue={data.catalogue} />
        </section>
      </div>
    </>
  );
}
