import "server-only";
import { cookies } from "next/headers";
import { redirect } from "next/navigation";
import type { User } from "lucia";
import { getCurrentSession } from "./auth/session";
import { can, type Action, type Role } from "./roles";
import { membershipIn, membershipsOf, type Crew } from "@/db/crews";

export const CREW_COOKIE = "spanwright_crew";

export interface CrewContext {
  user: User;
  sessionId: string;
  crew: Crew;
  role: Role;
}

/**
 * Why a request may not go on. Another crew's data answers 404 like a missing row, so that its
 * existence does not leak; 403 is kept for the caller's own crew when the role is too low.
 */
export class AccessError extends Error {
  constructor(
    readonly status: 401 | 403 | 404,
    message: string,
  ) {
    super(message);
    this.name = "AccessError";
  }
}

/** The crew this request works in: the one chosen in the crew cookie, else the person's first. */
export async function currentMembership(userId: string) {
  const chosen = (await cookies()).get(CREW_COOKIE)?.value;
  if (chosen) {
    const membership = await membershipIn(userId, chosen);
    if (membership) return membership;
  }
  return (await membershipsOf(userId))[0] ?? null;
}

/** For route handlers and server actions: the caller's crew context, or an AccessError. */
export async function authorize(action: Action): Promise<CrewContext> {
  const signedIn = await getCurrentSession();
  if (!signedIn) throw new AccessError(401, "Sign in first.");
  const membership = await currentMembership(signedIn.user.id);
  if (!membership) throw new AccessError(404, "You are not in a crew yet: create one or accept an invitation.");
  if (!can(membership.role, action)) {
    throw new AccessError(403, `Your role in ${membership.crew.name} (${membership.role}) may not do this.`);
  }
  return { user: signedIn.user, sessionId: signedIn.session.id, crew: membership.crew, role: membership.role };
}

/** For pages: redirects to sign-in (and back) or to crew creation instead of throwing. */
export async function authorizePage(action: Action, returnTo: string): Promise<CrewContext> {
  try {
    return await authorize(action);
  } catch (error) {
    if (!(error instanceof AccessError)) throw error;
    if (error.status === 401) redirect(`/sign-in?next=${encodeURIComponent(returnTo)}`);
    if (error.status === 404) redirect("/crews/new");
    throw error;
  }
}

/** Remembers the crew this browser works in; a choice of a crew one is not in is ignored on read. */
export async function chooseCrew(crewId: string): Promise<void> {
  (await cookies()).set(CREW_COOKIE, crewId, {
    httpOnly: true,
    sameSite: "lax",
    path: "/",
    secure: process.env.COOKIE_SECURE ? process.env.COOKIE_SECURE === "true" : process.env.NODE_ENV === "production",
  });
}
