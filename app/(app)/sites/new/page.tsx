import type { Metadata } from "next";
import { PageHeader } from "@/components/page-header";
import { SiteForm } from "@/components/sites/site-form";
import { RoleRequired } from "@/components/role-required";
import { authorizeRolePage } from "@/lib/authz";

export const metadata: Metadata = { title: "Add a site" };

export default async function NewSitePage() {
  const { context, refusal } = await authorizeRolePage("site.write", "/sites/new");
  if (refusal) return <RoleRequired title="Add a site" refusal={refusal} back={{ href: "/sites", label: "Back to the sites" }} />;
  const { crew } = context;
  return (
    <>
      <PageHeader title="Add a site" lead="Measure the span between the anchors, say how, and sketch the ground under the line: the planner reads all of it." />
      <SiteForm units={crew.units} />
    </>
  );
}
