import { NextResponse } from "next/server";
import { crewRoute, parseBody } from "@/lib/api";
import { RequestError } from "@/lib/http-errors";
import { rowId } from "@/lib/validations/ids";
import { ReuseSchema } from "@/lib/validations/review";
import { plannerValues } from "@/lib/planner/kit";
import { assertSiteOpen, revisionOfRecord } from "@/lib/planner/revision-of-record";
import { createRig, findRevision, findRig } from "@/db/rigs";

type Params = { id: string; revisionId: string };

/**
 * "Use this rig": a new rig whose first draft is a signed-off revision's plan, on another site or the
 * same one, checked again with the Kit as it is now. The new rig links back to the revision it came from.
 */
export const POST = crewRoute<Params>("rig.reuse", async ({ crew, user }, request, { id, revisionId }) => {
  const source = await findRevision(crew.id, rowId(id, "rig"), rowId(revisionId, "revision"));
  if (!source) throw new RequestError(404, "No such revision of this rig in this crew.");
  const body = await parseBody(request, ReuseSchema);
  if (source.state !== "signed_off") {
    throw new RequestError(409, `Revision ${source.number} is not the signed-off one: only a signed-off revision can be used for a new rig.`);
  }
  await assertSiteOpen(crew.id, body.siteId);
  const revision = await revisionOfRecord(crew.id, crew.units, { name: body.name, siteId: body.siteId, inputs: plannerValues(source) });
  const { rigId, revisionId: newRevisionId } = await createRig(crew.id, user, revision, source.id);
  return NextResponse.json({ rig: await findRig(crew.id, rigId), revision: await findRevision(crew.id, rigId, newRevisionId) }, { status: 201 });
});
