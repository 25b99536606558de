import type { Metadata } from "next";
import { PageHeader } from "@/components/page-header";
import { GearModelForm } from "@/components/kit/gear-model-form";
import { authorizePage } from "@/lib/authz";

export const metadata: Metadata = { title: "Add a gear model" };

export default async function NewGearModelPage() {
  await authorizePage("kit.write", "/kit/new");
  return (
    <>
      <PageHeader title="Add a gear model" lead="Give the specs from the maker's data or your own tests; the planner reads them when it checks a rig." />
      <GearModelForm />
    </>
  );
}
