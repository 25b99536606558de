import { NextResponse } from "next/server";
import { crewRoute, parseBody } from "@/lib/api";
import { RequestError } from "@/lib/http-errors";
import { rowId } from "@/lib/validations/ids";
import { RetirementSchema } from "@/lib/validations/kit";
import { findItem, retireItem } from "@/db/kit";

export const POST = crewRoute<{ id: string }>("kit.write", async ({ crew }, request, { id }) => {
  const retirement = await parseBody(request, RetirementSchema);
  const item = await findItem(crew.id, rowId(id, "item"));
  if (!item) throw new RequestError(404, "No such item in this crew.");
  if (retirement.retiredOn < item.inServiceSince) {
    const message = `Retired on cannot be before the item went into service (${item.inServiceSince}).`;
    throw new RequestError(400, message, { retiredOn: message });
  }
  return NextResponse.json({ item: await retireItem(crew.id, id, retirement) });
});
