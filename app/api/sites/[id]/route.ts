import { NextResponse } from "next/server";
import { crewRoute, parseBody } from "@/lib/api";
import { RequestError } from "@/lib/http-errors";
import { rowId } from "@/lib/validations/ids";
import { SiteSchema } from "@/lib/validations/sites";
import { deleteSite, findSite, updateSite } from "@/db/sites";

type Params = { id: string };
const missing = () => new RequestError(404, "No such site in this crew.");

export const GET = crewRoute<Params>("site.read", async ({ crew }, _request, { id }) => {
  const site = await findSite(crew.id, rowId(id, "site"));
  if (!site) throw missing();
  return NextResponse.json({ site });
});

export const PATCH = crewRoute<Params>("site.write", async ({ crew }, request, { id }) => {
  const site = await parseBody(request, SiteSchema);
  const updated = await updateSite(crew.id, rowId(id, "site"), site);
  if (!updated) throw missing();
  return NextResponse.json({ site: updated });
});

export const DELETE = crewRoute<Params>("site.write", async ({ crew }, _request, { id }) => {
  const outcome = await deleteSite(crew.id, rowId(id, "site"));
  if (outcome === "not_found") throw missing();
  if (outcome === "has_rigs")
    throw new RequestError(409, "Rigs are planned on this site, so it cannot be deleted: archive it instead, which keeps their span.");
  return NextResponse.json({ deleted: true });
});
