import { NextResponse } from "next/server";
import { parseBody, signedInRoute } from "@/lib/api";
import { chooseCrew } from "@/lib/authz";
import { RequestError } from "@/lib/http-errors";
import { SwitchCrewSchema } from "@/lib/validations/crew";

export const POST = signedInRoute(async ({ user }, request) => {
  const { crewId } = await parseBody(request, SwitchCrewSchema);
  const membership = user.memberships.find((m) => m.crew.id === crewId);
  if (!membership) throw new RequestError(404, "No crew of yours has that id.");
  await chooseCrew(crewId);
  return NextResponse.json({ crew: membership.crew, role: membership.role });
});
