import { NextResponse } from "next/server";
import { crewRoute, parseBody } from "@/lib/api";
import { RequestError } from "@/lib/http-errors";
import { rowId } from "@/lib/validations/ids";
import { GearItemEditSchema, duplicateLabelMessage } from "@/lib/validations/kit";
import { findItem, listInspections, updateItem } from "@/db/kit";
import { listUploads } from "@/db/uploads";

type Params = { id: string };

export const GET = crewRoute<Params>("kit.read", async ({ crew }, _request, { id }) => {
  const item = await findItem(crew.id, rowId(id, "item"));
  if (!item) throw new RequestError(404, "No such item in this crew.");
  const [inspections, photos] = await Promise.all([listInspections(crew.id, id), listUploads(crew.id, { itemId: id })]);
  return NextResponse.json({ item, inspections, photos });
});

export const PATCH = crewRoute<Params>("kit.write", async ({ crew }, request, { id }) => {
  const edit = await parseBody(request, GearItemEditSchema);
  const current = await findItem(crew.id, rowId(id, "item"));
  if (!current) throw new RequestError(404, "No such item in this crew.");
  if (current.retiredOn && edit.inServiceSince > current.retiredOn) {
    const message = `In service since cannot be after the day it was retired (${current.retiredOn}).`;
    throw new RequestError(400, message, { inServiceSince: message });
  }
  const updated = await updateItem(crew.id, id, edit);
  if (updated === "duplicate_label") throw new RequestError(409, duplicateLabelMessage(edit.label), { label: duplicateLabelMessage(edit.label) });
  return NextResponse.json({ item: updated });
});
