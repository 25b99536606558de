import "server-only";
import { cookies } from "next/headers";
import { notFound, redirect } from "next/navigation";
import type { User } from "lucia";
import { getCurrentSession } from "./auth/session";
import { can, refusalText, type Action, type MemberAction, type Role, type RoleRefusal } from "./roles";
import { isUuid } from "./validations/ids";
import type { Crew, Membership } from "@/db/crews";

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

/** The crew this request works in: the one chosen in the crew cookie, else the person's first (crews by name). */
export async function currentMembership(user: User): Promise<Membership | null> {
  const chosen = (await cookies()).get(CREW_COOKIE)?.value;
  return user.memberships.find((m) => m.crew.id === chosen) ?? user.memberships[0] ?? null;
}

/** The signed-in person's crew context, or an AccessError: 401 when nobody is signed in, 404 when they are in no crew. */
async function crewContext(): Promise<CrewContext> {
  const signedIn = await getCurrentSession();
  if (!signedIn) throw new AccessError(401, "Sign in first.");
  const membership = await currentMembership(signedIn.user);
  if (!membership) throw new AccessError(404, "You are not in a crew yet: create one or accept an invitation.");
  return { user: signedIn.user, sessionId: signedIn.session.id, crew: membership.crew, role: membership.role };
}

/** For route handlers and server actions: the caller's crew context, or an AccessError saying why not. */
export async function authorize(action: Action): Promise<CrewContext> {
  const context = await crewContext();
  if (!can(context.role, action)) throw new AccessError(403, refusalText(action, context.role, context.crew.name));
  return context;
}

/** For pages: the crew context; a visitor not signed in goes to sign-in (and back), one in no crew to crew creation. */
async function pageContext(returnTo: string): Promise<CrewContext> {
  try {
    return await crewContext();
  } catch (error) {
    if (!(error instanceof AccessError)) throw error;
    if (error.status === 401) redirect(`/sign-in?next=${encodeURIComponent(returnTo)}`);
    redirect("/crews/new");
  }
}

/**
 * For a page every member may open. Called before any Suspense boundary (no loading.tsx above the page),
 * so that its redirects are real HTTP redirects: see DEVELOPERS.md, "Pages answer with real statuses".
 */
export async function authorizePage(action: MemberAction, returnTo: string): Promise<CrewContext> {
  const context = await pageContext(returnTo);
  if (!can(context.role, action)) throw new AccessError(403, refusalText(action, context.role, context.crew.name));
  return context;
}

/**
 * For a page that needs more than a member (adding gear, recording a slip test, editing): the crew context,
 * or the refusal that the page shows with <RoleRequired> instead of its content.
 */
export async function authorizeRolePage(
  action: Action,
  returnTo: string,
): Promise<{ context: CrewContext; refusal: null } | { context: null; refusal: RoleRefusal }> {
  const context = await pageContext(returnTo);
  if (can(context.role, action)) return { context, refusal: null };
  return { context: null, refusal: { action, role: context.role, crewName: context.crew.name } };
}

/** A page's row from its URL id: the crew's own row, or a real 404 when the id is no uuid or names none of its rows. */
export async function crewRowOrNotFound<Row>(find: (crewId: string, id: string) => Promise<Row | null>, crewId: string, id: string): Promise<Row> {
  const row = isUuid(id) ? await find(crewId, id) : null;
  if (!row) notFound();
  return row;
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
