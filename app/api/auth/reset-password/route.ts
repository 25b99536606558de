import { NextResponse } from "next/server";
import { parseBody, route } from "@/lib/api";
import { RequestError } from "@/lib/http-errors";
import { ResetPasswordSchema } from "@/lib/validations/account";
import { resetPassword } from "@/db/password-resets";
import { hashPassword } from "@/lib/auth/passwords";
import { hashToken } from "@/lib/tokens";

const refusals = {
  unknown: "This reset link is not valid: ask for a new one.",
  used: "This reset link has been used already: ask for a new one.",
  expired: "This reset link is more than an hour old: ask for a new one.",
} as const;

// A new password signs the account out everywhere, since whoever knew the old one may be signed in.
export const POST = route(async (request) => {
  const { token, password } = await parseBody(request, ResetPasswordSchema);
  const passwordHash = await hashPassword(password);
  const result = await resetPassword(hashToken(token), passwordHash);
  if (result.outcome !== "ok") throw new RequestError(410, refusals[result.outcome]);
  return NextResponse.json({ message: "Your password is changed. Sign in with it now." });
});
