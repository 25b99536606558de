import { Lucia, TimeSpan } from "lucia";
import { NodePostgresAdapter } from "@lucia-auth/adapter-postgresql";
import { pgPool } from "@/db/pg-pool";
import { SESSION_COOKIE } from "./cookie-name";

// Secure cookies everywhere but on the local plain-http stack, which sets COOKIE_SECURE=false.
const secure = process.env.COOKIE_SECURE ? process.env.COOKIE_SECURE === "true" : process.env.NODE_ENV === "production";

export const lucia = new Lucia(new NodePostgresAdapter(pgPool, { user: "users", session: "sessions" }), {
  sessionExpiresIn: new TimeSpan(30, "d"),
  // The cookie ends with the session (30 days, renewed with it), not at the browser's 400-day ceiling.
  sessionCookie: { name: SESSION_COOKIE, expires: true, attributes: { secure, sameSite: "lax" } },
  getUserAttributes: (attributes) => ({ email: attributes.email, name: attributes.name }),
});

declare module "lucia" {
  interface Register {
    Lucia: typeof lucia;
    DatabaseUserAttributes: { email: string; name: string };
  }
}
