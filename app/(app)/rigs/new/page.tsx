import type { Metadata } from "next";
import { PageHeader } from "@/components/page-header";
import { CautionNotice } from "@/components/caution-notice";
import { Planner } from "@/components/rigs/planner";
import { RoleRequired } from "@/components/role-required";
import { authorizeRolePage } from "@/lib/authz";
import { plannerData } from "@/lib/planner/page-data";
import { startingRig } from "@/lib/rig-form/starting-rig";

export const metadata: Metadata = { title: "New rig" };

export default async function NewRigPage({ searchParams }: { searchParams: Promise<{ siteId?: string }> }) {
  const { siteId } = await searchParams;
  const { context, refusal } = await authorizeRolePage("rig.write", `/rigs/new${siteId ? `?siteId=${encodeURIComponent(siteId)}` : ""}`);
  if (refusal) return <RoleRequired title="New rig" refusal={refusal} back={{ href: "/rigs", label: "Back to the rigs" }} />;
  const data = await plannerData(context.crew.id);
  const site = data.sites.find((s) => s.id === siteId) ?? null;
  const example = startingRig(data.minimums, data.minClearanceM);
  const start = site
    ? { ...example, name: `${site.name} line`, siteId: site.id, spanM: site.spanM, heightDifferenceM: site.heightDifferenceM }
    : { ...example, name: "New rig", siteId: null };
  return (
    <>
      <PageHeader
        title="New rig"
        lead={`Plan a line${site ? ` on ${site.name}` : ""}. It starts from an invented worked example: pick the crew's webbing, slings, pulleys and brake from the Kit, then save it as the first revision.`}
      />
      <div className="space-y-6">
        <CautionNotice compact />
        <Planner mode="new" units={data.units} catalogue={data.catalogue} sites={data.sites} start={start} />
      </div>
    </>
  );
}
