import type { Metadata } from "next";
import Link from "next/link";
import { PageHeader } from "@/components/page-header";
import { buttonClasses } from "@/components/ui/button";
import { EmptyState } from "@/components/ui/empty-state";
import { Table } from "@/components/ui/table";
import { FileList } from "@/components/kit/file-list";
import { FileUploadForm } from "@/components/kit/file-upload-form";
import { GroundChart } from "@/components/sites/ground-chart";
import { SiteActions } from "@/components/sites/site-actions";
import { authorizePage, crewRowOrNotFound } from "@/lib/authz";
import { can } from "@/lib/roles";
import { formatDistance } from "@/lib/rig-form/format";
import { ANCHOR_KIND_LABELS, MEASUREMENT_LABELS, type SiteAnchor } from "@/lib/validations/sites";
import { REVISION_STATE_LABELS, RigListQuerySchema } from "@/lib/validations/rigs";
import { findSite } from "@/db/sites";
import { listRigs } from "@/db/rigs";
import { listUploads } from "@/db/uploads";

export const metadata: Metadata = { title: "Site" };

function anchorDetail(anchor: SiteAnchor): string {
  if (anchor.kind === "tree") return `${ANCHOR_KIND_LABELS.tree}, trunk ${anchor.trunkDiameterCm} cm across`;
  if (anchor.kind === "bolts") return `${anchor.boltCount} bolt${anchor.boltCount === 1 ? "" : "s"} of ${anchor.boltSizeMm} mm`;
  return ANCHOR_KIND_LABELS[anchor.kind];
}

const Fact = ({ label, children }: { label: string; children: React.ReactNode }) => (
  <div className="border-b border-ink-100 pb-2">
    <dt className="text-sm text-ink-600">{label}</dt>
    <dd className="text-lg font-semibold text-ink-900">{children}</dd>
  </div>
);

export default async function SitePage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const { crew, role } = await authorizePage("site.read", `/sites/${id}`);
  const site = await crewRowOrNotFound(findSite, crew.id, id);
  const [rigs, photos] = await Promise.all([
    listRigs(crew.id, RigListQuerySchema.parse({ siteId: id, pageSize: "100" })),
    listUploads(crew.id, { siteId: id }),
  ]);
  const units = crew.units;
  const writer = can(role, "site.write");
  const { coordinates } = site;
  return (
    <>
      <PageHeader
        title={site.name}
        lead={site.archivedAt ? "Archived: kept for the rigs planned on it, not offered for new ones." : undefined}
        actions={
          writer ? (
            <>
              {site.archivedAt || !can(role, "rig.write") ? null : (
                <Link href={`/rigs/new?siteId=${site.id}`} className={buttonClasses("primary")}>
                  Start a rig here
                </Link>
              )}
              <Link href={`/sites/${site.id}/edit`} className={buttonClasses("secondary")}>
                Edit
              </Link>
            </>
          ) : null
        }
      />
      <div className="space-y-8">
        <dl className="grid gap-x-6 gap-y-3 sm:grid-cols-2 lg:grid-cols-3">
          <Fact label="Horizontal span A to B">{formatDistance(site.spanM, units)}</Fact>
          <Fact label="Height of B above A">{formatDistance(site.heightDifferenceM, units)}</Fact>
          <Fact label="How the span was measured">
            {MEASUREMENT_LABELS[site.measuredBy]}, ±{formatDistance(site.uncertaintyM, units)}
          </Fact>
          <Fact label="Anchor A">{anchorDetail(site.anchors.a)}</Fact>
          <Fact label="Anchor B">{anchorDetail(site.anchors.b)}</Fact>
          <Fact label="Coordinates">
            {coordinates ? (
              <a href={`geo:${coordinates.latitude},${coordinates.longitude}`}>
                {coordinates.latitude.toFixed(5)}, {coordinates.longitude.toFixed(5)}
              </a>
            ) : (
              "Not given"
            )}
          </Fact>
        </dl>
        {site.accessNotes ? (
          <section aria-labelledby="access" className="space-y-1">
            <h2 id="access">Access</h2>
            <p className="max-w-prose whitespace-pre-line">{site.accessNotes}</p>
          </section>
        ) : null}
        {(["a", "b"] as const).some((s) => site.anchors[s].notes) ? (
          <section aria-labelledby="anchor-notes" className="grid gap-4 md:grid-cols-2">
            <h2 id="anchor-notes" className="md:col-span-2">
              Anchor notes
            </h2>
            {(["a", "b"] as const).map((s) =>
              site.anchors[s].notes ? (
                <p key={s} className="max-w-prose whitespace-pre-line">
                  <strong>Anchor {s.toUpperCase()}:</strong> {site.anchors[s].notes}
                </p>
              ) : null,
            )}
          </section>
        ) : null}
        <section aria-labelledby="ground" className="space-y-2">
          <h2 id="ground">Ground under the line</h2>
          <GroundChart spanM={site.spanM} heightDifferenceM={site.heightDifferenceM} ground={site.ground} units={units} />
        </section>
        <section aria-labelledby="rigs" className="space-y-3">
          <h2 id="rigs">Rigs on this site</h2>
          {rigs.rigs.length ? (
            <Table
              caption="Rigs on this site"
              rowKey={(r) => r.id}
              rows={rigs.rigs}
              columns={[
                { key: "name", header: "Rig", cell: (r) => <Link href={`/rigs/${r.id}`}>{r.name}</Link> },
                { key: "state", header: "State", cell: (r) => `${REVISION_STATE_LABELS[r.head.state]}, rev. ${r.head.number}` },
                { key: "mainline", header: "Mainline", cell: (r) => r.head.mainlineName },
              ]}
            />
          ) : (
            <EmptyState title="No rigs on this site yet" />
          )}
        </section>
        <section aria-labelledby="photos" className="space-y-3">
          <h2 id="photos">Photos</h2>
          <FileList files={photos} removable={writer} />
          {writer ? <FileUploadForm purpose="photo" owner={{ siteId: site.id }} /> : null}
        </section>
        {writer ? <SiteActions siteId={site.id} archived={site.archivedAt !== null} rigCount={site.rigCount} /> : null}
      </div>
    </>
  );
}
