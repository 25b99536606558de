import { NextResponse } from "next/server";
import { crewRoute, parseBody } from "@/lib/api";
import { RequestError } from "@/lib/http-errors";
import { rowId } from "@/lib/validations/ids";
import { InspectionSchema } from "@/lib/validations/kit";
import { addInspection } from "@/db/kit";

export const POST = crewRoute<{ id: string }>("kit.write", async ({ crew, user }, request, { id }) => {
  const inspection = await parseBody(request, InspectionSchema);
  const row = await addInspection(crew.id, rowId(id, "item"), user.id, inspection);
  if (!row) throw new RequestError(404, "No such item in this crew.");
  if ("retiredOn" in row)
    throw new RequestError(409, `This item was retired on ${row.retiredOn}: a retired item is not inspected again, and its log stays as it was.`);
  return NextResponse.json({ inspection: row }, { status: 201 });
});
