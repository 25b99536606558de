import { NextResponse } from "next/server";
import { crewRoute, parseBody } from "@/lib/api";
import { RequestError } from "@/lib/http-errors";
import { rowId } from "@/lib/validations/ids";
import { GearModelSchema } from "@/lib/validations/kit";
import { findModel, listItems, updateModel } from "@/db/kit";

type Params = { id: string };

export const GET = crewRoute<Params>("kit.read", async ({ crew }, _request, { id }) => {
  const model = await findModel(crew.id, rowId(id, "gear model"));
  if (!model) throw new RequestError(404, "No such gear model in this crew.");
  return NextResponse.json({ model, items: await listItems(crew.id, id) });
});

export const PATCH = crewRoute<Params>("kit.write", async ({ crew }, request, { id }) => {
  const model = await parseBody(request, GearModelSchema[crew.units]);
  const updated = await updateModel(crew.id, rowId(id, "gear model"), model);
  if (!updated) throw new RequestError(404, "No such gear model in this crew.");
  if (updated === "kind_changed") throw new RequestError(409, "A model's kind cannot change: record a new model of the other kind instead.");
  return NextResponse.json({ model: updated });
});
