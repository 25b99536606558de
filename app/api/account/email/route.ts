import { NextResponse } from "next/server";
import { parseBody, route } from "@/lib/api";
import { RequestError } from "@/lib/http-errors";
import { ConfirmEmailSchema } from "@/lib/validations/account";
import { confirmEmailChange } from "@/db/email-changes";
import { hashToken } from "@/lib/tokens";

const refusals = {
  unknown: { status: 404, message: "This confirmation link is not valid: change the e-mail on your account page again." },
  used: { status: 410, message: "This confirmation link has been used already, or a newer one was sent: open the newest." },
  expired: { status: 410, message: "This confirmation link is more than an hour old: change the e-mail on your account page again." },
  taken: { status: 409, message: "Another account took this e-mail meanwhile: your account keeps its address." },
} as const;

// The link from the e-mail proves the new address; it works once, within the hour, signed in or not.
export const POST = route(async (request) => {
  const { token } = await parseBody(request, ConfirmEmailSchema);
  const result = await confirmEmailChange(hashToken(token));
  if (result.outcome !== "ok") throw new RequestError(refusals[result.outcome].status, refusals[result.outcome].message);
  return NextResponse.json({ email: result.email, message: `Your account's e-mail is now ${result.email}.` });
});
