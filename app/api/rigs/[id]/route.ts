import { NextResponse } from "next/server";
import { crewRoute } from "@/lib/api";
import { RequestError } from "@/lib/http-errors";
import { rowId } from "@/lib/validations/ids";
import { findRevision, findRig } from "@/db/rigs";

export const GET = crewRoute<{ id: string }>("rig.read", async ({ crew }, _request, { id }) => {
  const rig = await findRig(crew.id, rowId(id, "rig"));
  if (!rig) throw new RequestError(404, "No such rig in this crew.");
  return NextResponse.json({ rig, revision: await findRevision(crew.id, rig.id, rig.head.id) });
});
