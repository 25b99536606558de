import fc from "fast-check";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { AppClient } from "./support/http";
import { testDb } from "./support/fixtures";
import { contentType, hostileQuery, hostileSegment, mutatedForm, mutatedJson, rawBody } from "./support/hostile";
import { makeWorld, ownCaller, ROUTES, type RouteCase, type World } from "./support/route-matrix";

// Fuzzing every route of the route matrix over HTTP against the real server and database: each route's own
// request, changed the ways careless clients and attackers change it (hostile values in place of each field,
// fields missing or added, bodies that are not JSON, ids and escapes in the path that are not ids, hostile
// query strings, other methods, other content types, signed out). However wrong the request, the server must
// never answer 5xx, and every refusal is JSON with a message a person can read.
afterAll(() => testDb.destroy());

/** At least this many requests in all, spread evenly over the routes. */
const REQUESTS = 10_000;
const RUNS_PER_ROUTE = Math.ceil(REQUESTS / ROUTES.length);
// One seed in npm test, so that a run repeats; FUZZ_SEED=random (or a number) explores further.
const SEED = process.env.FUZZ_SEED === "random" ? Date.now() % 2 ** 31 : Number(process.env.FUZZ_SEED ?? 990006887);
const METHODS = ["GET", "POST", "PUT", "PATCH", "DELETE"] as const;
/** The query parameters any route reads, and a few it does not. */
const QUERY_KEYS = [
  ...["modelId", "kind", "archived", "purpose", "format", "deviceId", "ropeDiameterMm"],
  ...["q", "siteId", "state", "mainline", "spanMinM", "spanMaxM", "startedBy", "sort", "page", "pageSize"],
];

interface FuzzRequest {
  method: string;
  path: string;
  signedOut: boolean;
  body?: unknown;
  contentType?: string;
}

/** The requests fuzzed from one route's own: its dynamic segments (by the route file's `[name]`s) replaced, its body changed. */
function requestsLike(route: RouteCase, template: { path: string; body?: unknown }): fc.Arbitrary<FuzzRequest> {
  const [pathname, query = ""] = template.path.split("?");
  const dynamic = route.file.split("/").slice(0, -1);
  const segments = pathname
    .split("/")
    .slice(1)
    .map((segment, i) => (dynamic[i]?.startsWith("[") ? hostileSegment(segment) : fc.constant(segment)));
  const search = fc.oneof(
    { arbitrary: fc.constant(query), weight: 3 },
    { arbitrary: hostileQuery(QUERY_KEYS), weight: 2 },
    { arbitrary: hostileQuery(QUERY_KEYS).map((more) => [query, more].filter(Boolean).join("&")), weight: 1 },
  );
  const body = (method: string): fc.Arbitrary<{ body?: unknown; contentType?: string }> => {
    if (method === "GET") return fc.constant({});
    const raw = fc.record({ body: rawBody, contentType });
    if (template.body instanceof FormData) return fc.oneof({ arbitrary: mutatedForm(template.body).map((form) => ({ body: form })), weight: 4 }, raw);
    const json = mutatedJson(template.body ?? {}).map((value) => ({ body: JSON.stringify(value), contentType: "application/json" }));
    return fc.oneof({ arbitrary: json, weight: 4 }, raw);
  };
  const method = fc.oneof({ arbitrary: fc.constant(route.method), weight: 9 }, fc.constantFrom(...METHODS));
  return fc
    .record({ method, segments: fc.tuple(...segments), search, signedOut: fc.nat(9).map((n) => n === 0) })
    .chain(({ method, segments, search, signedOut }) =>
      body(method).map((sent) => ({ method, path: `/${segments.join("/")}${search ? `?${search}` : ""}`, signedOut, ...sent })),
    );
}

const describeRequest = (r: FuzzRequest) => {
  const body =
    r.body instanceof FormData ? `form(${[...r.body.keys()].join(",")})` : r.body instanceof Uint8Array ? `bytes(${r.body.length})` : JSON.stringify(r.body);
  return `${r.signedOut ? "signed out " : ""}${r.method} ${r.path.slice(0, 200)} ${r.contentType ?? ""} ${String(body).slice(0, 200)}`;
};

const isApi = (pathname: string) => pathname === "/api" || pathname.startsWith("/api/");
let sent = 0;

describe(`fuzzing every route (${RUNS_PER_ROUTE} requests each, seed ${SEED})`, () => {
  let world: World;
  const signedOut = new AppClient();
  beforeAll(async () => {
    world = await makeWorld();
  }, 60_000);

  describe.concurrent("each route", () => {
    for (const route of ROUTES) {
      it(`${route.method} ${route.file}: no 5xx, every refusal JSON with a message`, { timeout: 180_000 }, async () => {
        // A route that ends sessions or changes crews gets an owner of its own, so that no other route loses its caller.
        const { client, me } = route.ownPeople ? await ownCaller("owner") : { client: world.clients.owner, me: world.people.owner };
        const template = await route.call(world, me);
        await fc.assert(
          fc.asyncProperty(requestsLike(route, template), async (request) => {
            const caller = request.signedOut ? signedOut : client;
            // Each request from an address of its own (198.18.0.0/15, set aside for tests by RFC 2544), through the
            // test stack's trusted proxy: its failed sign-ins must not lock the other suites' address out.
            const n = sent++;
            const headers: Record<string, string> = { "x-forwarded-for": `198.18.${n >> 8}.${n & 255}` };
            if (request.contentType) headers["content-type"] = request.contentType;
            const response = await caller.request(request.method, request.path, request.body, headers);
            const text = await response.text();
            const what = `${describeRequest(request)} → ${response.status} ${text.slice(0, 300)}`;
            expect(response.status, what).toBeLessThan(500);
            // A path with ".." can leave /api on its way (the URL is resolved before it is sent): pages answer as pages.
            if (response.status >= 400 && isApi(new URL(request.path, caller.baseUrl).pathname)) {
              expect(response.headers.get("content-type"), what).toMatch(/^application\/json/);
              const answer = JSON.parse(text) as { error?: unknown };
              expect(typeof answer.error === "string" && /\w/.test(answer.error), what).toBe(true);
            }
          }),
          { numRuns: RUNS_PER_ROUTE, seed: SEED, endOnFailure: true },
        );
      });
    }
  });

  it(`sent at least ${REQUESTS} requests in all`, () => {
    expect(sent).toBeGreaterThanOrEqual(REQUESTS);
  });
});
