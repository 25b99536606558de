import { NextResponse } from "next/server";
import { z } from "zod";
import { crewRoute, parseBody } from "@/lib/api";
import { RequestError } from "@/lib/http-errors";
import { rowId } from "@/lib/validations/ids";
import { setSiteArchived } from "@/db/sites";

const ArchiveSchema = z.object({ archived: z.boolean({ error: "Say whether to archive the site (true) or bring it back (false)." }) });

export const POST = crewRoute<{ id: string }>("site.write", async ({ crew }, request, { id }) => {
  const { archived } = await parseBody(request, ArchiveSchema);
  const site = await setSiteArchived(crew.id, rowId(id, "site"), archived);
  if (!site) throw new RequestError(404, "No such site in this crew.");
  return NextResponse.json({ site });
});
