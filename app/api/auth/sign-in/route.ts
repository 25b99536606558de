import { NextResponse } from "next/server";
import { parseBody, route } from "@/lib/api";
import { AccessError } from "@/lib/authz";
import { SignInSchema } from "@/lib/validations/account";
import { findUserByEmail } from "@/db/users";
import { decoyHash, verifyPassword } from "@/lib/auth/passwords";
import { startSession } from "@/lib/auth/session";
import { clearAttempts, refundAttempt, spendAttempt } from "@/lib/rate-limit";
import { clientAddress } from "@/lib/client-address";

// An unknown e-mail and a wrong password get the same answer, in the same time. Each attempt is counted
// before the password is checked; one that succeeds is given back.
export const POST = route(async (request) => {
  const { email, password } = await parseBody(request, SignInSchema);
  const address = clientAddress(request);
  await spendAttempt(["signInAccount", email], ["signInAddress", address]);
  const user = await findUserByEmail(email);
  const matches = await verifyPassword(user?.password_hash ?? (await decoyHash()), password);
  if (!user || !matches) throw new AccessError(401, "That e-mail and password do not match an account.");
  await Promise.all([clearAttempts("signInAccount", email), refundAttempt("signInAddress", address)]);
  await startSession(user.id, request.headers.get("user-agent"));
  return NextResponse.json({ user: { name: user.name, email: user.email } });
});
