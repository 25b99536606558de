import type { Metadata } from "next";
import { PageHeader } from "@/components/page-header";
import { GearModelForm } from "@/components/kit/gear-model-form";
import { RoleRequired } from "@/components/role-required";
import { authorizeRolePage } from "@/lib/authz";

export const metadata: Metadata = { title: "Add a gear model" };

export default async function NewGearModelPage() {
  const { context, refusal } = await authorizeRolePage("kit.write", "/kit/new");
  if (refusal) return <RoleRequired title="Add a gear model" refusal={refusal} back={{ href: "/kit", label: "Back to the Kit" }} />;
  return (
    <>
      <PageHeader title="Add a gear model" lead="Give the specs from the maker's data or your own tests; the planner reads them when it checks a rig." />
      <GearModelForm units={context.crew.units} />
    </>
  );
}
