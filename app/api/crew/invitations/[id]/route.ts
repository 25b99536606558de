import { NextResponse } from "next/server";
import { crewRoute } from "@/lib/api";
import { RequestError } from "@/lib/http-errors";
import { revokeInvitation } from "@/db/invitations";

export const DELETE = crewRoute<{ id: string }>("crew.invite", async ({ crew }, _request, { id }) => {
  if (!(await revokeInvitation(crew.id, id))) throw new RequestError(404, "This invitation is no longer open: it was accepted, withdrawn or has expired.");
  return NextResponse.json({ revoked: id });
});
