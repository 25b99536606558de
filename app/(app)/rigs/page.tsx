import type { Metadata } from "next";
import Link from "next/link";
import { PageHeader } from "@/components/page-header";
import { buttonClasses } from "@/components/ui/button";
import { CautionNotice } from "@/components/caution-notice";
import { RigList } from "@/components/rigs/rig-list";
import { authorizePage } from "@/lib/authz";
import { can } from "@/lib/roles";
import { rigFilterChoices } from "@/db/rigs";
import { listSites } from "@/db/sites";

export const metadata: Metadata = { title: "Rigs" };

export default async function RigsPage() {
  // The layout's check does not cover a page: each page that shows crew data checks access itself.
  const { crew, role } = await authorizePage("rig.read", "/rigs");
  const [choices, sites] = await Promise.all([rigFilterChoices(crew.id), listSites(crew.id, { includeArchived: true })]);
  return (
    <>
      <PageHeader
        title="Rigs"
        lead="Plans for a line on a real span: drafted by a rigger, checked and signed off by the crew lead."
        actions={
          <>
            <Link href="/rigs/readings" className={buttonClasses("secondary")}>
              Measured tension
            </Link>
            <Link href="/rigs/check" className={buttonClasses("secondary")}>
              Check a line
            </Link>
            {can(role, "rig.write") ? (
              <Link href="/rigs/new" className={buttonClasses("primary")}>
                New rig
              </Link>
            ) : null}
          </>
        }
      />
      <div className="space-y-6">
        <RigList units={crew.units} sites={sites.map((s) => ({ id: s.id, name: s.name }))} mainlines={choices.mainlines} starters={choices.starters} />
        <CautionNotice compact />
      </div>
    </>
  );
}
