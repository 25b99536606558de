import { NextResponse } from "next/server";
import { crewRoute, parseBody } from "@/lib/api";
import { RequestError } from "@/lib/http-errors";
import { GEAR_KINDS, GearModelSchema, type GearKind } from "@/lib/validations/kit";
import { createModel, listModels } from "@/db/kit";

export const GET = crewRoute("kit.read", async ({ crew }, request) => {
  const kind = request.nextUrl.searchParams.get("kind");
  if (kind !== null && !(GEAR_KINDS as readonly string[]).includes(kind)) {
    throw new RequestError(400, `Unknown kind "${kind}": choose one of ${GEAR_KINDS.join(", ")}.`);
  }
  return NextResponse.json({ models: await listModels(crew.id, kind ? [kind as GearKind] : undefined) });
});

export const POST = crewRoute("kit.write", async ({ crew }, request) => {
  const model = await parseBody(request, GearModelSchema[crew.units]);
  return NextResponse.json({ model: await createModel(crew.id, model) }, { status: 201 });
});
