import type { Metadata } from "next";
import { PageHeader } from "@/components/page-header";
import { SiteForm } from "@/components/sites/site-form";
import { authorizePage } from "@/lib/authz";

export const metadata: Metadata = { title: "Add a site" };

export default async function NewSitePage() {
  const { crew } = await authorizePage("site.write", "/sites/new");
  return (
    <>
      <PageHeader title="Add a site" lead="Measure the span between the anchors, say how, and sketch the ground under the line: the planner reads all of it." />
      <SiteForm units={crew.units} />
    </>
  );
}
