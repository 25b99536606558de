import { NextResponse } from "next/server";
import { parseBody, signedInRoute } from "@/lib/api";
import { ChangePasswordSchema } from "@/lib/validations/account";
import { setPasswordHash } from "@/db/users";
import { hashPassword } from "@/lib/auth/passwords";
import { assertCurrentPassword } from "@/lib/auth/current-password";
import { lucia } from "@/lib/auth/lucia";
import { startSession } from "@/lib/auth/session";

// A changed password ends every other session and keeps this device signed in with a new one.
export const POST = signedInRoute(async ({ user }, request) => {
  const { currentPassword, newPassword } = await parseBody(request, ChangePasswordSchema);
  await assertCurrentPassword(user.id, currentPassword, "to choose a new one");
  await setPasswordHash(user.id, await hashPassword(newPassword));
  await lucia.invalidateUserSessions(user.id);
  await startSession(user.id, request.headers.get("user-agent"));
  return NextResponse.json({ changed: true });
});
