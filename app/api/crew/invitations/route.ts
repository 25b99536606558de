import { NextResponse } from "next/server";
import { crewRoute, parseBody } from "@/lib/api";
import { InviteSchema } from "@/lib/validations/crew";
import { createInvitation, openInvitationsOf, withdrawUnsentInvitation } from "@/db/invitations";
import { memberByEmail } from "@/db/crews";
import { RequestError } from "@/lib/http-errors";
import { withArticle } from "@/lib/roles";
import { INVITATION_DAYS } from "@/lib/invitation-state";
import { newToken } from "@/lib/tokens";
import { sendMail } from "@/lib/mail/transport";
import { invitationMail } from "@/lib/mail/messages";
import { appOrigin } from "@/lib/app-origin";
import { spendAttempt } from "@/lib/rate-limit";

const UNSENT = "The invitation mail could not be sent to this address, so no invitation was made: check the address and try again.";

export const GET = crewRoute("crew.invite", async ({ crew }) => NextResponse.json({ invitations: await openInvitationsOf(crew.id) }));

export const POST = crewRoute("crew.invite", async ({ crew, user }, request) => {
  const { email, role } = await parseBody(request, InviteSchema);
  const member = await memberByEmail(crew.id, email);
  if (member) {
    const message = `${member.name} (${email}) is already in ${crew.name}, as ${withArticle(member.role)}: change their role in the People table instead of inviting them.`;
    throw new RequestError(409, message, { email: message });
  }
  await spendAttempt(["linkMail", email]);
  const { token, tokenHash } = newToken();
  const url = `${appOrigin(request)}/invitations/${token}`;
  const invitation = await createInvitation({ crewId: crew.id, email, role, tokenHash, invitedBy: user.id });
  // Sent with no transaction open: a slow relay must not hold one of the pool's connections meanwhile.
  try {
    await sendMail(invitationMail({ to: email, crewName: crew.name, inviterName: user.name, role, url, days: INVITATION_DAYS }));
  } catch (error) {
    console.error("invitations: the mail relay refused the invitation:", error);
    await withdrawUnsentInvitation(crew.id, invitation.id);
    throw new RequestError(422, UNSENT, { email: UNSENT });
  }
  return NextResponse.json({ invitation }, { status: 201 });
});
