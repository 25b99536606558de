import type { Metadata } from "next";
import { PageHeader } from "@/components/page-header";
import { GearModelForm } from "@/components/kit/gear-model-form";
import { authorizePage } from "@/lib/authz";
import { crewRowOrNotFound } from "@/lib/validations/ids";
import type { GearModelInput } from "@/lib/validations/kit";
import { findModel } from "@/db/kit";

export const metadata: Metadata = { title: "Edit gear model" };

export default async function EditGearModelPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const { crew } = await authorizePage("kit.write", `/kit/models/${id}/edit`);
  const model = await crewRowOrNotFound(findModel, crew.id, id);
  return (
    <>
      <PageHeader
        title={`Edit ${model.name}`}
        lead="Changes apply to every item of this model; plans already signed off keep the specs they were checked with."
      />
      <GearModelForm model={{ id, kind: model.kind, name: model.name, notes: model.notes, specs: model.specs } as { id: string } & GearModelInput} />
    </>
  );
}
