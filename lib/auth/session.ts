import { cache } from "react";
import { cookies } from "next/headers";
import type { Session, User } from "lucia";
import { lucia } from "./lucia";
import { recordSessionAgent } from "@/db/users";

export interface SignedIn {
  session: Session;
  user: User;
}

/** The signed-in person of this request, or null; refreshes the cookie when lucia extends the session. */
export const getCurrentSession = cache(async (): Promise<SignedIn | null> => {
  const jar = await cookies();
  const sessionId = jar.get(lucia.sessionCookieName)?.value;
  if (!sessionId) return null;
  const { session, user } = await lucia.validateSession(sessionId);
  try {
    if (session?.fresh) {
      const cookie = lucia.createSessionCookie(session.id);
      jar.set(cookie.name, cookie.value, cookie.attributes);
    } else if (!session) {
      const cookie = lucia.createBlankSessionCookie();
      jar.set(cookie.name, cookie.value, cookie.attributes);
    }
  } catch {
    // Server components may not set cookies; the next route handler or action will.
  }
  return session && user ? { session, user } : null;
});

/** Signs the person in on this device, noting the browser so the account page can list devices. */
export async function startSession(userId: string, userAgent: string | null): Promise<void> {
  const session = await lucia.createSession(userId, {});
  await recordSessionAgent(session.id, userAgent);
  const cookie = lucia.createSessionCookie(session.id);
  (await cookies()).set(cookie.name, cookie.value, cookie.attributes);
}

export async function endSession(sessionId: string): Promise<void> {
  await lucia.invalidateSession(sessionId);
  const cookie = lucia.createBlankSessionCookie();
  (await cookies()).set(cookie.name, cookie.value, cookie.attributes);
}
