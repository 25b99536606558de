import { NextResponse } from "next/server";
import { crewRoute, parseBody } from "@/lib/api";
import { invalidInput } from "@/lib/http-errors";
import { NewRigSchema, RigListQuerySchema } from "@/lib/validations/rigs";
import { assertSiteOpen, revisionOfRecord } from "@/lib/planner/revision-of-record";
import { createRig, findRevision, findRig, listRigs } from "@/db/rigs";

export const GET = crewRoute("rig.read", async ({ crew }, request) => {
  const query = RigListQuerySchema.safeParse(Object.fromEntries(request.nextUrl.searchParams));
  if (!query.success) throw invalidInput(query.error);
  return NextResponse.json({ ...(await listRigs(crew.id, query.data)), page: query.data.page, pageSize: query.data.pageSize });
});

export const POST = crewRoute("rig.write", async ({ crew, user }, request) => {
  const body = await parseBody(request, NewRigSchema);
  await assertSiteOpen(crew.id, body.siteId);
  const revision = await revisionOfRecord(crew.id, crew.units, body);
  const { rigId, revisionId } = await createRig(crew.id, user, revision);
  return NextResponse.json({ rig: await findRig(crew.id, rigId), revision: await findRevision(crew.id, rigId, revisionId) }, { status: 201 });
});
