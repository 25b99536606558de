import { NextResponse, type NextRequest } from "next/server";
import { ZodError, type ZodType } from "zod";
import { getCurrentSession, type SignedIn } from "./auth/session";
import { authorize, AccessError, type CrewContext } from "./authz";
import { RequestError, invalidInput } from "./http-errors";
import { readJson } from "./request-body";
import { RigInputError, SolveError } from "@/physics";
import type { Action } from "./roles";
import { allowedSentence, rigInputProblem } from "./planner/problems";
import { isDatabaseUnreachable } from "@/db/errors";

const MUTATING = new Set(["POST", "PUT", "PATCH", "DELETE"]);

/** The origins this site answers as: APP_ORIGIN where set (the public address), and this request's own scheme and Host. */
function siteOrigins(request: Request): string[] {
  const host = request.headers.get("host");
  const own = host ? [`${new URL(request.url).protocol}//${host}`] : [];
  return process.env.APP_ORIGIN ? [new URL(process.env.APP_ORIGIN).origin, ...own] : own;
}

/**
 * Mutating requests must come from our own pages: the Origin header names this site, scheme, host and port
 * alike. X-Forwarded-Host is not believed, since any client can send it.
 */
export function assertSameOrigin(request: Request): void {
  if (!MUTATING.has(request.method)) return;
  const origin = request.headers.get("origin");
  let given: string | null = null;
  try {
    given = origin ? new URL(origin).origin : null;
  } catch {
    given = null;
  }
  if (!given || !siteOrigins(request).includes(given)) {
    throw new AccessError(403, "This request did not come from a Spanwright page (its Origin header is missing or names another site).");
  }
}

/** Turns any error into the JSON answer a client can show; only a real fault answers 500. */
export function errorResponse(error: unknown): NextResponse {
  if (error instanceof ZodError) error = invalidInput(error);
  if (error instanceof AccessError) return NextResponse.json({ error: error.message }, { status: error.status });
  if (error instanceof RigInputError) {
    // The engine's own input is in SI units; its field is named as the form labels it.
    const problem = rigInputProblem(error, "si");
    const body = {
      ...error.toJSON(),
      error: `The engine cannot check this rig. ${problem.sentence}`,
      fieldErrors: { [error.field]: allowedSentence(problem.allowed) },
    };
    return NextResponse.json(body, { status: 400 });
  }
  if (error instanceof SolveError)
    return NextResponse.json(
      { ...error.toJSON(), error: `The engine could not solve this rig: ${error.message}. No figures are given rather than unsure ones.` },
      { status: 422 },
    );
  if (error instanceof RequestError) {
    return NextResponse.json({ error: error.message, fieldErrors: error.fieldErrors }, { status: error.status, headers: error.headers });
  }
  if (isDatabaseUnreachable(error)) return databaseUnavailable();
  console.error(error);
  return NextResponse.json({ error: "Something went wrong on the server; nothing was saved. Try again." }, { status: 500 });
}

/** While the database cannot be reached: a 503 that says so and when to try again (a write is atomic: all of it or none). */
export function databaseUnavailable(): NextResponse {
  return NextResponse.json(
    { error: "The database is not answering just now. Try again in a few seconds: a change is saved whole or not at all." },
    { status: 503, headers: { "Retry-After": "5" } },
  );
}

type Segment<P> = { params: Promise<P> };

/** Any route handler: origin check on mutating requests, and every error mapped to a clear answer. */
export function route<P = Record<string, never>>(handler: (request: NextRequest, params: P) => Promise<Response>) {
  return async (request: NextRequest, segment: Segment<P>) => {
    let response: Response;
    try {
      assertSameOrigin(request);
      response = await handler(request, await segment.params);
    } catch (error) {
      response = errorResponse(error);
    }
    // Answers carry the caller's own data: no browser or proxy keeps a copy unless the route says otherwise.
    if (!response.headers.has("cache-control")) response.headers.set("cache-control", "no-store");
    return response;
  };
}

/** A route handler for a signed-in person, in or out of a crew. */
export function signedInRoute<P = Record<string, never>>(handler: (signedIn: SignedIn, request: NextRequest, params: P) => Promise<Response>) {
  return route<P>(async (request, params) => {
    const signedIn = await getCurrentSession();
    if (!signedIn) throw new AccessError(401, "Sign in first.");
    return handler(signedIn, request, params);
  });
}

/** A route handler that works on the caller's crew, allowed only to roles the action permits. */
export function crewRoute<P = Record<string, never>>(action: Action, handler: (context: CrewContext, request: NextRequest, params: P) => Promise<Response>) {
  return route<P>(async (request, params) => handler(await authorize(action), request, params));
}

/** Parses a JSON body with a schema; bad JSON or bad fields answer 400 with what is allowed. */
export async function parseBody<T>(request: Request, schema: ZodType<T>): Promise<T> {
  const result = schema.safeParse(await readJson(request));
  if (!result.success) throw invalidInput(result.error);
  return result.data;
}
