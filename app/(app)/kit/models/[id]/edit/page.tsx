import type { Metadata } from "next";
import { PageHeader } from "@/components/page-header";
import { GearModelForm } from "@/components/kit/gear-model-form";
import { RoleRequired } from "@/components/role-required";
import { authorizeRolePage, crewRowOrNotFound } from "@/lib/authz";
import type { GearModelInput } from "@/lib/validations/kit";
import { findModel } from "@/db/kit";

export const metadata: Metadata = { title: "Edit gear model" };

export default async function EditGearModelPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const { context, refusal } = await authorizeRolePage("kit.write", `/kit/models/${id}/edit`);
  if (refusal) return <RoleRequired title="Edit a gear model" refusal={refusal} back={{ href: `/kit/models/${id}`, label: "Back to the model" }} />;
  const model = await crewRowOrNotFound(findModel, context.crew.id, id);
  return (
    <>
      <PageHeader
        title={`Edit ${model.name}`}
        lead="Changes apply to every item of this model; plans already signed off keep the specs they were checked with."
      />
      <GearModelForm
        units={context.crew.units}
        model={{ id, kind: model.kind, name: model.name, notes: model.notes, specs: model.specs } as { id: string } & GearModelInput}
      />
    </>
  );
}
