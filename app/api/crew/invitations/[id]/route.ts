import { NextResponse } from "next/server";
import { crewRoute } from "@/lib/api";
import { RequestError } from "@/lib/http-errors";
import { revokeInvitation } from "@/db/invitations";

export const DELETE = crewRoute<{ id: string }>("crew.invite", async ({ crew }, _request, { id }) => {
  if (!(await revokeInvitation(crew.id, id))) throw new RequestError(404, "No open invitation of this crew has that id.");
  return NextResponse.json({ revoked: id });
});
