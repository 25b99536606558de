import { NextResponse } from "next/server";
import { crewRoute } from "@/lib/api";
import { RequestError } from "@/lib/http-errors";
import { rowId } from "@/lib/validations/ids";
import { findRevision } from "@/db/rigs";

export const GET = crewRoute<{ id: string; revisionId: string }>("rig.read", async ({ crew }, _request, { id, revisionId }) => {
  const revision = await findRevision(crew.id, rowId(id, "rig"), rowId(revisionId, "revision"));
  if (!revision) throw new RequestError(404, "No such revision of this rig in this crew.");
  return NextResponse.json({ revision });
});
