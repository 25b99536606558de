import fs from "node:fs";
import path from "node:path";
import { beforeAll, describe, expect, it } from "vitest";
import { CALLERS, makeWorld, ownCaller, ROUTES, type World } from "./support/route-matrix";

// Walks the route matrix: every route and method, called by each kind of caller, answers the status the
// table gives; and every route file in the app, with every method it exports, is in the table.

const APP = path.join(process.cwd(), "app");
const METHODS = ["GET", "POST", "PUT", "PATCH", "DELETE"];

function routeFiles(dir: string): string[] {
  return fs.readdirSync(dir, { withFileTypes: true }).flatMap((entry) => {
    const full = path.join(dir, entry.name);
    if (entry.isDirectory()) return routeFiles(full);
    return entry.name === "route.ts" ? [path.relative(APP, full).split(path.sep).join("/")] : [];
  });
}

/** The methods a route file exports (HEAD and OPTIONS aside): `export const GET`, `export async function GET`, or among destructured names. */
function exportedMethods(file: string): string[] {
  const source = fs.readFileSync(path.join(APP, file), "utf8");
  const exported = [...source.matchAll(/export\s+(?:const|async function|function)\s+(\w+)|export\s+const\s+\{([^}]*)\}/g)].flatMap((m) =>
    m[1] ? [m[1]] : m[2].split(",").map((name) => name.trim()),
  );
  return exported.filter((name) => METHODS.includes(name));
}

describe("route matrix", () => {
  it("lists every route file and every method it exports, and nothing else", () => {
    const onDisk = routeFiles(APP).flatMap((file) => exportedMethods(file).map((method) => `${method} ${file}`));
    const listed = ROUTES.map((r) => `${r.method} ${r.file}`);
    expect([...listed].sort()).toEqual([...new Set(onDisk)].sort());
    expect(new Set(listed).size).toBe(listed.length);
  });

  let world: World;
  beforeAll(async () => {
    world = await makeWorld();
  }, 60_000);

  for (const route of ROUTES) {
    it(`${route.method} ${route.file}: ${CALLERS.map((c) => `${c} ${route.expect[c]}`).join(", ")}`, async () => {
      const answers: Record<string, number> = {};
      for (const caller of CALLERS) {
        const { client, me } = route.ownPeople ? await ownCaller(caller) : { client: world.clients[caller], me: world.people[caller] };
        const call = await route.call(world, me);
        const response = await client.request(route.method, call.path, call.body);
        answers[caller] = response.status;
        // Every answer of the API is JSON with a message, refusals included.
        if (response.status >= 400) expect((await response.json()).error, `${caller}: ${route.method} ${call.path}`).toMatch(/\w/);
        else await response.arrayBuffer();
      }
      expect(answers).toEqual(route.expect);
    });
  }
});
