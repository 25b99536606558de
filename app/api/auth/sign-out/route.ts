import { NextResponse } from "next/server";
import { signedInRoute } from "@/lib/api";
import { endSession } from "@/lib/auth/session";

export const POST = signedInRoute(async ({ session }) => {
  await endSession(session.id);
  return NextResponse.json({ signedOut: true });
});
