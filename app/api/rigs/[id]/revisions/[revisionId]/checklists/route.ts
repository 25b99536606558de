import { NextResponse } from "next/server";
import { crewRoute, parseBody } from "@/lib/api";
import { RequestError } from "@/lib/http-errors";
import { rowId } from "@/lib/validations/ids";
import { StartChecklistSchema } from "@/lib/validations/review";
import { onSiteAnswer } from "@/lib/review/on-site-answer";
import { findRevision } from "@/db/rigs";
import { runsOf, startRun } from "@/db/checklists";

type Params = { id: string; revisionId: string };
const MISSING = "No such revision of this rig in this crew.";

export const GET = crewRoute<Params>("rig.read", async ({ crew }, _request, { id, revisionId }) => {
  const revision = await findRevision(crew.id, rowId(id, "rig"), rowId(revisionId, "revision"));
  if (!revision) throw new RequestError(404, MISSING);
  return NextResponse.json({ runs: await runsOf(crew.id, revision.id) });
});

/** Starts the crew's checklist on a signed-off revision, with the items as they read now. */
export const POST = crewRoute<Params>("checklist.run", async ({ crew, user }, request, { id, revisionId }) => {
  const rigId = rowId(id, "rig");
  const body = await parseBody(request, StartChecklistSchema);
  const done = await startRun(crew.id, rigId, rowId(revisionId, "revision"), user, body.idempotencyKey ?? null);
  return onSiteAnswer(done, MISSING, async (runId) => ({ run: (await runsOf(crew.id, revisionId)).find((r) => r.id === runId) }));
});
