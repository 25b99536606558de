import { NextResponse } from "next/server";
import { parseBody, signedInRoute } from "@/lib/api";
import { RequestError } from "@/lib/http-errors";
import { ChangePasswordSchema } from "@/lib/validations/account";
import { findUserById, setPasswordHash } from "@/db/users";
import { hashPassword, verifyPassword } from "@/lib/auth/passwords";
import { lucia } from "@/lib/auth/lucia";
import { startSession } from "@/lib/auth/session";

// A changed password ends every other session and keeps this device signed in with a new one.
export const POST = signedInRoute(async ({ user }, request) => {
  const { currentPassword, newPassword } = await parseBody(request, ChangePasswordSchema);
  const row = await findUserById(user.id);
  if (!row || !(await verifyPassword(row.password_hash, currentPassword))) {
    throw new RequestError(400, "Your current password is not right.", { currentPassword: "This is not your current password." });
  }
  await setPasswordHash(user.id, await hashPassword(newPassword));
  await lucia.invalidateUserSessions(user.id);
  await startSession(user.id, request.headers.get("user-agent"));
  return NextResponse.json({ changed: true });
});
