import { NextResponse } from "next/server";
import { parseBody, signedInRoute } from "@/lib/api";
import { chooseCrew } from "@/lib/authz";
import { RequestError } from "@/lib/http-errors";
import { AcceptInvitationSchema } from "@/lib/validations/crew";
import { acceptInvitation } from "@/db/invitations";
import { hashToken } from "@/lib/tokens";
import { INVITATION_REFUSALS } from "@/lib/invitation-state";

export const POST = signedInRoute(async ({ user }, request) => {
  const { token } = await parseBody(request, AcceptInvitationSchema);
  const result = await acceptInvitation(hashToken(token), user);
  if (result.outcome !== "joined") {
    const { status, message } = INVITATION_REFUSALS[result.outcome];
    throw new RequestError(status, message);
  }
  await chooseCrew(result.crewId!);
  return NextResponse.json({ crewId: result.crewId });
});
