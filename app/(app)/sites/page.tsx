import type { Metadata } from "next";
import Link from "next/link";
import { PageHeader } from "@/components/page-header";
import { buttonClasses } from "@/components/ui/button";
import { EmptyState } from "@/components/ui/empty-state";
import { Table } from "@/components/ui/table";
import { authorizePage } from "@/lib/authz";
import { can } from "@/lib/roles";
import { formatDistance } from "@/lib/rig-form/format";
import { MEASUREMENT_LABELS } from "@/lib/validations/sites";
import { listSites } from "@/db/sites";

export const metadata: Metadata = { title: "Sites" };

export default async function SitesPage({ searchParams }: { searchParams: Promise<{ archived?: string }> }) {
  const { archived } = await searchParams;
  const { crew, role } = await authorizePage("site.read", "/sites");
  const includeArchived = archived === "include";
  const sites = await listSites(crew.id, { includeArchived });
  const units = crew.units;
  return (
    <>
      <PageHeader
        title="Sites"
        lead="The spans the crew rigs: where the anchors are, how far apart, how they were measured and what lies under the line."
        actions={
          can(role, "site.write") ? (
            <Link href="/sites/new" className={buttonClasses("primary")}>
              Add a site
            </Link>
          ) : null
        }
      />
      <div className="space-y-4">
        <p>{includeArchived ? <Link href="/sites">Show sites in use only</Link> : <Link href="/sites?archived=include">Show archived sites too</Link>}</p>
        {sites.length ? (
          <Table
            caption="Sites"
            rowKey={(s) => s.id}
            rows={sites}
            columns={[
              {
                key: "name",
                header: "Site",
                cell: (s) => (
                  <>
                    <Link href={`/sites/${s.id}`} className="font-semibold">
                      {s.name}
                    </Link>
                    {s.archivedAt ? <span className="block text-xs text-ink-600">Archived</span> : null}
                  </>
                ),
              },
              { key: "span", header: "Span", align: "right", cell: (s) => <span className="whitespace-nowrap">{formatDistance(s.spanM, units)}</span> },
              {
                key: "rise",
                header: "B above A",
                align: "right",
                cell: (s) => <span className="whitespace-nowrap">{formatDistance(s.heightDifferenceM, units)}</span>,
              },
              { key: "measured", header: "Measured by", cell: (s) => `${MEASUREMENT_LABELS[s.measuredBy]}, ±${formatDistance(s.uncertaintyM, units)}` },
              {
                key: "ground",
                header: "Ground",
                cell: (s) => (s.ground.kind === "none" ? "Not given" : s.ground.kind === "level" ? "Level" : `${s.ground.points.length} points`),
              },
              { key: "rigs", header: "Rigs", align: "right", cell: (s) => s.rigCount },
            ]}
          />
        ) : (
          <EmptyState title="No sites yet">Add a site to plan rigs on its measured span and ground.</EmptyState>
        )}
      </div>
    </>
  );
}
