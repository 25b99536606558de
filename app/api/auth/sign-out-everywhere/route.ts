import { NextResponse } from "next/server";
import { signedInRoute } from "@/lib/api";
import { lucia } from "@/lib/auth/lucia";
import { endSession } from "@/lib/auth/session";

export const POST = signedInRoute(async ({ session, user }) => {
  await lucia.invalidateUserSessions(user.id);
  await endSession(session.id);
  return NextResponse.json({ signedOut: true });
});
