import type { Metadata } from "next";
import { PageHeader } from "@/components/page-header";
import { ChecklistEditor } from "@/components/review/checklist-editor";
import { authorizePage } from "@/lib/authz";
import { can } from "@/lib/roles";
import { when } from "@/lib/when";
import { checklistTemplate } from "@/db/checklists";

export const metadata: Metadata = { title: "On-site checklist" };

export default async function ChecklistPage() {
  const context = await authorizePage("crew.read", "/crew/checklist");
  const template = await checklistTemplate(context.crew.id);
  return (
    <>
      <PageHeader
        title="On-site checklist"
        lead={`What ${context.crew.name} checks on site before anyone walks a signed-off rig. Each run records who ticked each item and when.${template.updatedAt ? ` Last changed ${when(template.updatedAt)}.` : ""}`}
      />
      <ChecklistEditor items={template.items} editable={can(context.role, "checklist.template")} />
    </>
  );
}
