import { NextResponse } from "next/server";
import { ENGINE_VERSION } from "@/physics";
import { crewRoute, parseBody } from "@/lib/api";
import { RequestError } from "@/lib/http-errors";
import { rowId } from "@/lib/validations/ids";
import { readingSchema } from "@/lib/validations/review";
import { predictReading } from "@/lib/review/reading-prediction";
import { onSiteAnswer } from "@/lib/review/on-site-answer";
import { findRevision } from "@/db/rigs";
import { findReading, readingsOfRevision, recordReading } from "@/db/readings";

type Params = { id: string; revisionId: string };
const MISSING = "No such revision of this rig in this crew.";

export const GET = crewRoute<Params>("rig.read", async ({ crew }, _request, { id, revisionId }) => {
  const revision = await findRevision(crew.id, rowId(id, "rig"), rowId(revisionId, "revision"));
  if (!revision) throw new RequestError(404, MISSING);
  return NextResponse.json({ readings: await readingsOfRevision(crew.id, revision.id) });
});

/** Records a load-cell reading on the signed-off revision, beside the engine's prediction for the same conditions. */
export const POST = crewRoute<Params>("reading.write", async ({ crew, user }, request, { id, revisionId }) => {
  const rigId = rowId(id, "rig");
  const body = await parseBody(request, readingSchema(crew.units));
  const done = await recordReading(
    crew.id,
    rigId,
    rowId(revisionId, "revision"),
    body,
    user,
    (inputs) => predictReading(inputs, body, crew.units),
    ENGINE_VERSION,
  );
  if (done.outcome === "unpredictable") throw new RequestError(400, `Nothing was saved. ${done.message}`, { [done.field]: done.message });
  return onSiteAnswer(done, MISSING, async (readingId) => ({ reading: await findReading(crew.id, readingId) }));
});
