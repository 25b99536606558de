import { NextResponse } from "next/server";
import { parseBody, signedInRoute } from "@/lib/api";
import { chooseCrew } from "@/lib/authz";
import { RequestError } from "@/lib/http-errors";
import { acceptInvitationSchema } from "@/lib/validations/crew";
import { acceptInvitation } from "@/db/invitations";
import { hashToken } from "@/lib/tokens";

const refusals = {
  unknown: [404, "This invitation link is not valid: ask the crew's owner for a new one."],
  revoked: [410, "This invitation was withdrawn: ask the crew's owner for a new one."],
  used: [410, "This invitation has been used already."],
  expired: [410, "This invitation is more than 7 days old: ask the crew's owner for a new one."],
  wrong_email: [422, "This invitation is for another e-mail address: sign in with the address it was sent to."],
} as const;

export const POST = signedInRoute(async ({ user }, request) => {
  const { token } = await parseBody(request, acceptInvitationSchema);
  const result = await acceptInvitation(hashToken(token), user);
  if (result.outcome !== "joined") {
    const [status, message] = refusals[result.outcome];
    throw new RequestError(status, message);
  }
  await chooseCrew(result.crewId!);
  return NextResponse.json({ crewId: result.crewId });
});
