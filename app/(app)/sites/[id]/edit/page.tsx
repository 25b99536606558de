import type { Metadata } from "next";
import { PageHeader } from "@/components/page-header";
import { SiteForm } from "@/components/sites/site-form";
import { RoleRequired } from "@/components/role-required";
import { authorizeRolePage, crewRowOrNotFound } from "@/lib/authz";
import { findSite, siteInput } from "@/db/sites";

export const metadata: Metadata = { title: "Edit a site" };

export default async function EditSitePage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const { context, refusal } = await authorizeRolePage("site.write", `/sites/${id}/edit`);
  if (refusal) return <RoleRequired title="Edit a site" refusal={refusal} back={{ href: `/sites/${id}`, label: "Back to the site" }} />;
  const { crew } = context;
  const values = siteInput(await crewRowOrNotFound(findSite, crew.id, id));
  return (
    <>
      <PageHeader
        title={`Edit ${values.name}`}
        lead="Saved rigs keep the span and ground they were planned on; new revisions use the site as it is saved here."
      />
      <SiteForm units={crew.units} site={{ id, values }} />
    </>
  );
}
