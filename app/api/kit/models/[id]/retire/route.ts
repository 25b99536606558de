import { NextResponse } from "next/server";
import { crewRoute, parseBody } from "@/lib/api";
import { RequestError } from "@/lib/http-errors";
import { rowId } from "@/lib/validations/ids";
import { RetirementSchema } from "@/lib/validations/kit";
import { retireModel } from "@/db/kit";

export const POST = crewRoute<{ id: string }>("kit.write", async ({ crew }, request, { id }) => {
  const retirement = await parseBody(request, RetirementSchema);
  const model = await retireModel(crew.id, rowId(id, "gear model"), retirement);
  if (!model) throw new RequestError(404, "No such gear model in this crew.");
  return NextResponse.json({ model });
});
