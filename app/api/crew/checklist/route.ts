import { NextResponse } from "next/server";
import { crewRoute, parseBody } from "@/lib/api";
import { ChecklistTemplateSchema } from "@/lib/validations/review";
import { checklistTemplate, saveChecklistTemplate } from "@/db/checklists";

export const GET = crewRoute("crew.read", async ({ crew }) => NextResponse.json(await checklistTemplate(crew.id)));

/** Replaces the crew's on-site checklist; runs already started keep the items they started with. */
export const PUT = crewRoute("checklist.template", async ({ crew, user }, request) => {
  const { items } = await parseBody(request, ChecklistTemplateSchema);
  return NextResponse.json({ items: await saveChecklistTemplate(crew.id, user, items) });
});
