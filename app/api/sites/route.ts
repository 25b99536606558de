import { NextResponse } from "next/server";
import { crewRoute, parseBody } from "@/lib/api";
import { SiteSchema } from "@/lib/validations/sites";
import { createSite, listSites } from "@/db/sites";

export const GET = crewRoute("site.read", async ({ crew }, request) => {
  const includeArchived = request.nextUrl.searchParams.get("archived") === "include";
  return NextResponse.json({ sites: await listSites(crew.id, { includeArchived }) });
});

export const POST = crewRoute("site.write", async ({ crew, user }, request) => {
  const site = await parseBody(request, SiteSchema);
  return NextResponse.json({ site: await createSite(crew.id, user.id, site) }, { status: 201 });
});
