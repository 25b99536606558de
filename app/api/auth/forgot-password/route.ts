import { NextResponse } from "next/server";
import { parseBody, route } from "@/lib/api";
import { ForgotPasswordSchema } from "@/lib/validations/account";
import { findUserByEmail } from "@/db/users";
import { createPasswordReset } from "@/db/password-resets";
import { newToken } from "@/lib/tokens";
import { sendMail } from "@/lib/mail/transport";
import { passwordResetMail } from "@/lib/mail/messages";
import { appOrigin } from "@/lib/app-origin";
import { spendAttempt } from "@/lib/rate-limit";

// The same answer whether or not the address has an account, so the form cannot probe for accounts.
export const POST = route(async (request) => {
  const { email } = await parseBody(request, ForgotPasswordSchema);
  // Counted whether or not the address has an account, so the limit says nothing about accounts either.
  await spendAttempt(["linkMail", email]);
  const user = await findUserByEmail(email);
  if (user) {
    const { token, tokenHash } = newToken();
    await createPasswordReset(user.id, tokenHash);
    await sendMail(passwordResetMail({ to: user.email, url: `${appOrigin(request)}/reset-password?token=${token}` }));
  }
  return NextResponse.json({ message: "If that address has an account, a link to choose a new password is on its way. It works once, for one hour." });
});
