import { crewRoute, parseBody } from "@/lib/api";
import { rowId } from "@/lib/validations/ids";
import { TickSchema } from "@/lib/validations/review";
import { onSiteAnswer } from "@/lib/review/on-site-answer";
import { runsOf, tickItem } from "@/db/checklists";

type Params = { id: string; revisionId: string; runId: string };

/** Ticks (or unticks) one item of a checklist run; who and when are kept with it. */
export const POST = crewRoute<Params>("checklist.run", async ({ crew, user }, request, { id, revisionId, runId }) => {
  const body = await parseBody(request, TickSchema);
  const done = await tickItem(
    crew.id,
    rowId(id, "rig"),
    rowId(revisionId, "revision"),
    rowId(runId, "checklist run"),
    { itemId: body.itemId, checked: body.checked, idempotencyKey: body.idempotencyKey ?? null },
    user,
  );
  return onSiteAnswer(done, "No such checklist run on this revision.", async () => ({ run: (await runsOf(crew.id, revisionId)).find((r) => r.id === runId) }));
});
