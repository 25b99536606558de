import { NextResponse } from "next/server";
import { crewRoute, parseBody } from "@/lib/api";
import { RequestError } from "@/lib/http-errors";
import { rowId } from "@/lib/validations/ids";
import { NewRevisionSchema } from "@/lib/validations/rigs";
import { revisionOfRecord } from "@/lib/planner/revision-of-record";
import { findRevision, findRig, listRevisions, saveRevision } from "@/db/rigs";

type Params = { id: string };
const missing = () => new RequestError(404, "No such rig in this crew.");

export const GET = crewRoute<Params>("rig.read", async ({ crew }, _request, { id }) => {
  const rig = await findRig(crew.id, rowId(id, "rig"));
  if (!rig) throw missing();
  return NextResponse.json({ revisions: await listRevisions(crew.id, rig.id) });
});

/** Saves a revision on top of the one the editor started from; a newer one saved meanwhile answers 409 with it. */
export const POST = crewRoute<Params>("rig.write", async ({ crew, user }, request, { id }) => {
  const rigId = rowId(id, "rig");
  const body = await parseBody(request, NewRevisionSchema);
  if (!(await findRig(crew.id, rigId))) throw missing();
  const revision = await revisionOfRecord(crew.id, crew.units, body);
  const saved = await saveRevision(crew.id, rigId, user, body.basedOnRevisionId, revision);
  if (saved.outcome === "not_found") throw missing();
  if (saved.outcome === "in_review") {
    throw new RequestError(
      409,
      `Revision ${saved.number} is in review, so the rig cannot change until a lead signs it off or returns it. Your edits are kept on this page.`,
    );
  }
  if (saved.outcome === "stale") {
    const current = await findRevision(crew.id, rigId, saved.currentId);
    return NextResponse.json(
      {
        error: `Revision ${current?.number} was saved by ${current?.authorName ?? "someone"} while you edited, so yours was not saved. Your edits are kept: compare them with revision ${current?.number} and save again.`,
        current,
      },
      { status: 409 },
    );
  }
  return NextResponse.json({ revision: await findRevision(crew.id, rigId, saved.revisionId) }, { status: 201 });
});
