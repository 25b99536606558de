import { NextResponse } from "next/server";
import { parseBody, signedInRoute } from "@/lib/api";
import { RequestError } from "@/lib/http-errors";
import { ProfileSchema } from "@/lib/validations/account";
import { emailTaken, renameUser } from "@/db/users";
import { createEmailChange } from "@/db/email-changes";
import { assertCurrentPassword } from "@/lib/auth/current-password";
import { spendAttempt } from "@/lib/rate-limit";
import { newToken } from "@/lib/tokens";
import { sendMail } from "@/lib/mail/transport";
import { emailChangeMail } from "@/lib/mail/messages";
import { appOrigin } from "@/lib/app-origin";

const TAKEN = "Another account already uses this e-mail.";

/**
 * Renames the person at once. A new e-mail must be proven: it asks for the current password, then sends a
 * link to the new address, and the account keeps its old address until that link is opened.
 */
export const PATCH = signedInRoute(async ({ user }, request) => {
  const { name, email, currentPassword } = await parseBody(request, ProfileSchema);
  if (email === user.email) {
    await renameUser(user.id, name);
    return NextResponse.json({ user: { name, email } });
  }
  await assertCurrentPassword(user.id, currentPassword, "to change the e-mail");
  if (await emailTaken(email, user.id)) throw new RequestError(409, TAKEN, { email: TAKEN });
  await spendAttempt(["linkMail", email]);
  await renameUser(user.id, name);
  const { token, tokenHash } = newToken();
  await createEmailChange(user.id, email, tokenHash);
  await sendMail(emailChangeMail({ to: email, name, url: `${appOrigin(request)}/confirm-email?token=${token}` }));
  return NextResponse.json({ user: { name, email: user.email }, pendingEmail: email }, { status: 202 });
});
