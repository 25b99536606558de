import { NextResponse } from "next/server";
import { crewRoute, parseBody } from "@/lib/api";
import { RequestError } from "@/lib/http-errors";
import { rowId } from "@/lib/validations/ids";
import { GearItemSchema, duplicateLabelMessage } from "@/lib/validations/kit";
import { createItem, listItems } from "@/db/kit";

export const GET = crewRoute("kit.read", async ({ crew }, request) => {
  const modelId = request.nextUrl.searchParams.get("modelId");
  return NextResponse.json({ items: await listItems(crew.id, modelId ? rowId(modelId, "gear model") : undefined) });
});

export const POST = crewRoute("kit.write", async ({ crew }, request) => {
  const item = await parseBody(request, GearItemSchema);
  const created = await createItem(crew.id, item);
  if (created === "model_not_found") throw new RequestError(404, "No such gear model in this crew.");
  if (created === "model_retired") throw new RequestError(409, "This model is retired: no new items of it can be added.");
  if (created === "duplicate_label") throw new RequestError(409, duplicateLabelMessage(item.label), { label: duplicateLabelMessage(item.label) });
  return NextResponse.json({ item: created }, { status: 201 });
});
