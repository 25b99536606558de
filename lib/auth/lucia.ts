import { Lucia, TimeSpan } from "lucia";
import type { Membership } from "@/db/crews";
import { pgPool } from "@/db/pg-pool";
import { SESSION_COOKIE } from "./cookie-name";
import { SessionAdapter } from "./session-adapter";

// Secure cookies everywhere but on the local plain-http stack, which sets COOKIE_SECURE=false.
const secure = process.env.COOKIE_SECURE ? process.env.COOKIE_SECURE === "true" : process.env.NODE_ENV === "production";

export const lucia = new Lucia(new SessionAdapter(pgPool), {
  sessionExpiresIn: new TimeSpan(30, "d"),
  // The cookie ends with the session (30 days, renewed with it), not at the browser's 400-day ceiling.
  sessionCookie: { name: SESSION_COOKIE, expires: true, attributes: { secure, sameSite: "lax" } },
  getUserAttributes: (attributes) => ({ email: attributes.email, name: attributes.name, memberships: attributes.memberships }),
});

declare module "lucia" {
  interface Register {
    Lucia: typeof lucia;
    /** The person's crews and roles come with the session (lib/auth/session-adapter.ts), read afresh on every request. */
    DatabaseUserAttributes: { email: string; name: string; memberships: Membership[] };
  }
}
