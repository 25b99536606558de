import crypto from "node:crypto";
import example from "@/physics/examples/quarry-highline.json";
import { ROLES, type Role } from "@/lib/roles";
import { AppClient } from "./http";
import { createCrew, createPerson, testDb, type FixtureCrew, type Person } from "./fixtures";
import { MODELS, SITE } from "./samples";
import { json, newRig, signedRig, type RigRevision } from "./rig-steps";

// Every route and method, and the status each kind of caller gets: signed out, each role of the crew that
// owns the rows named, and an owner of another crew naming the same rows (who must find nothing: 404).
// The README's permission table is `lib/roles.ts`; this table is what the server answers, walked by
// route-matrix.test.ts, which also fails on any route file not listed here.

export type Caller = "signedOut" | Role | "otherCrew";
export const CALLERS: Caller[] = ["signedOut", ...ROLES, "otherCrew"];
type Method = "GET" | "POST" | "PUT" | "PATCH" | "DELETE";

/** What one caller sends: the path and body are made for each call, so a write never finds an earlier caller's effect. */
export interface Call {
  path: string;
  body?: unknown;
}

/** The rows the calls name, made once in the crew whose rows they are. */
export interface World {
  crew: FixtureCrew;
  clients: Record<Caller, AppClient>;
  people: Record<Caller, Person | null>;
  brakeId: string;
  ropeId: string;
  slingId: string;
  itemId: string;
  uploadId: string;
  siteId: string;
  signed: RigRevision;
  runId: string;
  itemOnChecklist: string;
  slipTestId: string;
}

export interface RouteCase {
  /** The route file under `app/`, as on disk. */
  file: string;
  method: Method;
  /** `me` is the person calling (null when signed out). */
  call: (world: World, me: Person | null) => Promise<Call>;
  expect: Record<Caller, number>;
  /** Each caller signs in anew as a person of a crew made for this call: for calls that end sessions or change crews. */
  ownPeople?: true;
}

let serial = 0;
/** A name no earlier call used. */
const unique = (stem: string) => `${stem} ${++serial}-${crypto.randomBytes(2).toString("hex")}`;

/** The status of a crew action: 401 signed out, 403 below the least role, `ok` from it, and the other crew's answer. */
function byRole(least: Role, ok: number, otherCrew = 404): Record<Caller, number> {
  const statuses = Object.fromEntries(ROLES.map((role) => [role, ROLES.indexOf(role) >= ROLES.indexOf(least) ? ok : 403]));
  return { signedOut: 401, ...statuses, otherCrew } as Record<Caller, number>;
}
/** The same status for everyone. */
const everyone = (status: number) => Object.fromEntries(CALLERS.map((c) => [c, status])) as Record<Caller, number>;
/** Any signed-in person: 401 signed out. */
const signedIn = (ok: number, otherCrew = ok) => ({ ...everyone(ok), signedOut: 401, otherCrew });

async function created(client: AppClient, path: string, body: unknown, key: string): Promise<string> {
  const answer = await json(await client.post(path, body));
  if (answer.status !== 201) throw new Error(`setting up the route matrix: POST ${path} answered ${answer.status}: ${JSON.stringify(answer.body)}`);
  return answer.body[key].id as string;
}

const newModel = (w: World) =>
  created(w.clients.owner, "/api/kit/models", { kind: "sling", notes: "", ...MODELS.sling, name: unique("Matrix sling") }, "model");
const newItem = (w: World, modelId = w.slingId) =>
  created(w.clients.owner, "/api/kit/items", { modelId, label: unique("M"), inServiceSince: "2026-01-01", notes: "" }, "item");
const newSite = (w: World) => created(w.clients.owner, "/api/sites", { ...SITE, name: unique("Matrix site") }, "site");
async function newMember(w: World): Promise<string> {
  const person = await createPerson("matrix");
  await testDb("crew_members").insert({ crew_id: w.crew.id, user_id: person.id, role: "member" });
  return person.id;
}
// A real 1×1 PNG (signature, IHDR, IDAT, IEND per ISO/IEC 15948).
const PNG = Buffer.from("iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAYAAAAfFcSJAAAADUlEQVR42mP8z8BQDwAEhQGAhKmMIQAAAABJRU5ErkJggg==", "base64");
function photoForm(itemId: string) {
  const form = new FormData();
  form.append("file", new Blob([PNG]), "sling.png");
  form.append("itemId", itemId);
  return form;
}
function traceForm() {
  const form = new FormData();
  form.append("file", new Blob(["time,force\n0,0\n1,1000\n2,2000\n3,500\n"], { type: "text/csv" }), "pull.csv");
  form.append("unit", "N");
  form.append("drop", "200");
  return form;
}
const slipTest = (w: World) => ({
  deviceModelId: w.brakeId,
  ropeModelId: w.ropeId,
  ropeDiameterMm: 10.5,
  testedOn: "2026-11-20",
  notes: "",
  result: "held",
  force: 6,
  forceUnit: "kN",
});
const rigPath = (rig: RigRevision) => `/api/rigs/${rig.rigId}/revisions/${rig.revisionId}`;
const settings = {
  units: "si",
  minSafetyFactors: { webbing: 3, rope: 3, anchor: 3, connector: 3, sling: 3, pulley: 3, brake: 3 },
  minClearanceM: 2,
  minBrakeMargin: 1.5,
  allowSelfSignOff: false,
};

const at = (path: string, body?: unknown) => async (): Promise<Call> => ({ path, body });

export const ROUTES: RouteCase[] = [
  ...(["GET", "POST", "PUT", "PATCH", "DELETE"] as const).map((method) => ({
    file: "api/[...unmatched]/route.ts",
    method,
    call: at("/api/no-such-route"),
    expect: everyone(404),
  })),
  { file: "api/health/route.ts", method: "GET", call: at("/api/health"), expect: everyone(200) },
  { file: "serwist/[path]/route.ts", method: "GET", call: at("/serwist/sw.js"), expect: everyone(200) },

  // Accounts: open to anyone, or to any signed-in person whatever their crew.
  {
    file: "api/auth/sign-up/route.ts",
    method: "POST",
    call: async () => ({
      path: "/api/auth/sign-up",
      body: { name: "Matrix", email: `${unique("m").replace(/\W/g, "")}@fixture.example`, password: "a long enough password" },
    }),
    expect: everyone(201),
    ownPeople: true,
  },
  {
    file: "api/auth/sign-in/route.ts",
    method: "POST",
    call: async () => {
      const p = await createPerson("matrix-sign-in");
      return { path: "/api/auth/sign-in", body: { email: p.email, password: p.password } };
    },
    expect: everyone(200),
    ownPeople: true,
  },
  { file: "api/auth/sign-out/route.ts", method: "POST", call: at("/api/auth/sign-out"), expect: signedIn(200), ownPeople: true },
  { file: "api/auth/sign-out-everywhere/route.ts", method: "POST", call: at("/api/auth/sign-out-everywhere"), expect: signedIn(200), ownPeople: true },
  {
    file: "api/auth/forgot-password/route.ts",
    method: "POST",
    call: async () => ({ path: "/api/auth/forgot-password", body: { email: `${unique("nobody").replace(/\W/g, "")}@fixture.example` } }),
    expect: everyone(200),
  },
  {
    file: "api/auth/reset-password/route.ts",
    method: "POST",
    call: at("/api/auth/reset-password", { token: "a".repeat(43), password: "a long enough password" }),
    expect: everyone(410),
  },
  {
    file: "api/account/route.ts",
    method: "PATCH",
    call: async (_w, me) => ({ path: "/api/account", body: { name: unique("Renamed"), email: me?.email ?? "nobody@fixture.example" } }),
    expect: signedIn(200),
    ownPeople: true,
  },
  // The right current password would sign every other device out: a wrong-length new one shows the route was reached.
  {
    file: "api/account/password/route.ts",
    method: "POST",
    call: at("/api/account/password", { currentPassword: "x", newPassword: "short" }),
    expect: signedIn(400),
  },
  { file: "api/account/sessions/[id]/route.ts", method: "DELETE", call: at(`/api/account/sessions/${"a".repeat(40)}`), expect: signedIn(404) },
  { file: "api/account/email/route.ts", method: "POST", call: at("/api/account/email", { token: "a".repeat(43) }), expect: everyone(404) },
  { file: "api/crews/route.ts", method: "GET", call: at("/api/crews"), expect: signedIn(200) },
  {
    file: "api/crews/route.ts",
    method: "POST",
    call: async () => ({ path: "/api/crews", body: { name: unique("Matrix crew") } }),
    expect: signedIn(201),
    ownPeople: true,
  },
  {
    file: "api/crews/current/route.ts",
    method: "POST",
    call: async (w) => ({ path: "/api/crews/current", body: { crewId: w.crew.id } }),
    expect: signedIn(200, 404),
  },
  { file: "api/invitations/accept/route.ts", method: "POST", call: at("/api/invitations/accept", { token: "a".repeat(43) }), expect: signedIn(404) },

  // The crew itself.
  { file: "api/crew/members/route.ts", method: "GET", call: at("/api/crew/members"), expect: byRole("member", 200, 200) },
  {
    file: "api/crew/members/[userId]/route.ts",
    method: "PATCH",
    call: async (w) => ({ path: `/api/crew/members/${await newMember(w)}`, body: { role: "rigger" } }),
    expect: byRole("owner", 200),
  },
  {
    file: "api/crew/members/[userId]/route.ts",
    method: "DELETE",
    call: async (w) => ({ path: `/api/crew/members/${await newMember(w)}` }),
    expect: byRole("owner", 200),
  },
  { file: "api/crew/settings/route.ts", method: "GET", call: at("/api/crew/settings"), expect: byRole("member", 200, 200) },
  { file: "api/crew/settings/route.ts", method: "PATCH", call: at("/api/crew/settings", settings), expect: byRole("lead", 200, 200) },
  { file: "api/crew/checklist/route.ts", method: "GET", call: at("/api/crew/checklist"), expect: byRole("member", 200, 200) },
  {
    file: "api/crew/checklist/route.ts",
    method: "PUT",
    call: at("/api/crew/checklist", { items: [{ text: "Anchors as planned" }] }),
    expect: byRole("lead", 200, 200),
  },
  { file: "api/crew/invitations/route.ts", method: "GET", call: at("/api/crew/invitations"), expect: byRole("owner", 200, 200) },
  {
    file: "api/crew/invitations/route.ts",
    method: "POST",
    call: async () => ({ path: "/api/crew/invitations", body: { email: `${unique("invitee").replace(/\W/g, "")}@fixture.example`, role: "member" } }),
    expect: byRole("owner", 201, 201),
  },
  {
    file: "api/crew/invitations/[id]/route.ts",
    method: "DELETE",
    call: async (w) => ({
      path: `/api/crew/invitations/${await created(w.clients.owner, "/api/crew/invitations", { email: `${unique("withdrawn").replace(/\W/g, "")}@fixture.example`, role: "member" }, "invitation")}`,
    }),
    expect: byRole("owner", 200),
  },

  // Kit.
  { file: "api/kit/models/route.ts", method: "GET", call: at("/api/kit/models"), expect: byRole("member", 200, 200) },
  {
    file: "api/kit/models/route.ts",
    method: "POST",
    call: async () => ({ path: "/api/kit/models", body: { kind: "sling", notes: "", ...MODELS.sling, name: unique("Matrix sling") } }),
    expect: byRole("rigger", 201, 201),
  },
  { file: "api/kit/models/[id]/route.ts", method: "GET", call: async (w) => ({ path: `/api/kit/models/${w.slingId}` }), expect: byRole("member", 200) },
  {
    file: "api/kit/models/[id]/route.ts",
    method: "PATCH",
    call: async (w) => ({
      path: `/api/kit/models/${await newModel(w)}`,
      body: { kind: "sling", notes: "checked", ...MODELS.sling, name: unique("Matrix sling") },
    }),
    expect: byRole("rigger", 200),
  },
  {
    file: "api/kit/models/[id]/retire/route.ts",
    method: "POST",
    call: async (w) => ({ path: `/api/kit/models/${await newModel(w)}/retire`, body: { retiredOn: "2026-11-01", reason: "replaced" } }),
    expect: byRole("rigger", 200),
  },
  { file: "api/kit/items/route.ts", method: "GET", call: at("/api/kit/items"), expect: byRole("member", 200, 200) },
  {
    file: "api/kit/items/route.ts",
    method: "POST",
    call: async (w) => ({ path: "/api/kit/items", body: { modelId: w.slingId, label: unique("M"), inServiceSince: "2026-01-01", notes: "" } }),
    expect: byRole("rigger", 201),
  },
  { file: "api/kit/items/[id]/route.ts", method: "GET", call: async (w) => ({ path: `/api/kit/items/${w.itemId}` }), expect: byRole("member", 200) },
  {
    file: "api/kit/items/[id]/route.ts",
    method: "PATCH",
    call: async (w) => ({ path: `/api/kit/items/${await newItem(w)}`, body: { label: unique("M"), inServiceSince: "2026-01-02", notes: "checked" } }),
    expect: byRole("rigger", 200),
  },
  {
    file: "api/kit/items/[id]/retire/route.ts",
    method: "POST",
    call: async (w) => ({ path: `/api/kit/items/${await newItem(w)}/retire`, body: { retiredOn: "2026-11-01", reason: "worn" } }),
    expect: byRole("rigger", 200),
  },
  {
    file: "api/kit/items/[id]/inspections/route.ts",
    method: "POST",
    call: async (w) => ({ path: `/api/kit/items/${w.itemId}/inspections`, body: { inspectedOn: "2026-11-01", result: "pass", notes: "" } }),
    expect: byRole("rigger", 201),
  },
  {
    file: "api/uploads/route.ts",
    method: "POST",
    call: async (w) => ({ path: "/api/uploads?purpose=photo", body: photoForm(w.itemId) }),
    expect: byRole("rigger", 201),
  },
  { file: "api/uploads/[id]/route.ts", method: "GET", call: async (w) => ({ path: `/api/uploads/${w.uploadId}` }), expect: byRole("member", 200) },
  {
    file: "api/uploads/[id]/route.ts",
    method: "DELETE",
    call: async (w) => {
      const answer = await json(await w.clients.owner.post("/api/uploads?purpose=photo", photoForm(w.itemId)));
      return { path: `/api/uploads/${answer.body.upload.id}` };
    },
    expect: byRole("rigger", 200),
  },

  // Slip bench.
  { file: "api/slip-tests/route.ts", method: "GET", call: at("/api/slip-tests"), expect: byRole("member", 200, 200) },
  // Another crew's gear named in a form is refused on its field ("choose a device from your Kit"), as a missing one is.
  { file: "api/slip-tests/route.ts", method: "POST", call: async (w) => ({ path: "/api/slip-tests", body: slipTest(w) }), expect: byRole("rigger", 201, 400) },
  { file: "api/slip-tests/[id]/route.ts", method: "GET", call: async (w) => ({ path: `/api/slip-tests/${w.slipTestId}` }), expect: byRole("member", 200) },
  {
    file: "api/slip-tests/traces/route.ts",
    method: "POST",
    call: async () => ({ path: "/api/slip-tests/traces", body: traceForm() }),
    expect: byRole("rigger", 201, 201),
  },
  { file: "api/slip-table/route.ts", method: "GET", call: at("/api/slip-table"), expect: byRole("member", 200, 200) },
  { file: "api/slip-table/link/route.ts", method: "POST", call: at("/api/slip-table/link"), expect: byRole("lead", 201, 201) },
  { file: "api/slip-table/link/route.ts", method: "DELETE", call: at("/api/slip-table/link"), expect: byRole("lead", 200, 200) },

  // Sites.
  { file: "api/sites/route.ts", method: "GET", call: at("/api/sites"), expect: byRole("member", 200, 200) },
  {
    file: "api/sites/route.ts",
    method: "POST",
    call: async () => ({ path: "/api/sites", body: { ...SITE, name: unique("Matrix site") } }),
    expect: byRole("rigger", 201, 201),
  },
  { file: "api/sites/[id]/route.ts", method: "GET", call: async (w) => ({ path: `/api/sites/${w.siteId}` }), expect: byRole("member", 200) },
  {
    file: "api/sites/[id]/route.ts",
    method: "PATCH",
    call: async (w) => ({ path: `/api/sites/${await newSite(w)}`, body: { ...SITE, name: unique("Matrix site") } }),
    expect: byRole("rigger", 200),
  },
  { file: "api/sites/[id]/route.ts", method: "DELETE", call: async (w) => ({ path: `/api/sites/${await newSite(w)}` }), expect: byRole("rigger", 200) },
  {
    file: "api/sites/[id]/archive/route.ts",
    method: "POST",
    call: async (w) => ({ path: `/api/sites/${await newSite(w)}/archive`, body: { archived: true } }),
    expect: byRole("rigger", 200),
  },

  // Rigs, their review and the day on site.
  { file: "api/compute/route.ts", method: "POST", call: at("/api/compute", example), expect: byRole("member", 200, 200) },
  { file: "api/rigs/route.ts", method: "GET", call: at("/api/rigs"), expect: byRole("member", 200, 200) },
  {
    file: "api/rigs/route.ts",
    method: "POST",
    call: async () => ({ path: "/api/rigs", body: { name: unique("Matrix rig"), siteId: null, inputs: example } }),
    expect: byRole("rigger", 201, 201),
  },
  { file: "api/rigs/[id]/route.ts", method: "GET", call: async (w) => ({ path: `/api/rigs/${w.signed.rigId}` }), expect: byRole("member", 200) },
  {
    file: "api/rigs/[id]/revisions/route.ts",
    method: "GET",
    call: async (w) => ({ path: `/api/rigs/${w.signed.rigId}/revisions` }),
    expect: byRole("member", 200),
  },
  {
    file: "api/rigs/[id]/revisions/route.ts",
    method: "POST",
    call: async (w) => {
      const rig = await newRig(w.clients.owner);
      return {
        path: `/api/rigs/${rig.rigId}/revisions`,
        body: { basedOnRevisionId: rig.revisionId, name: unique("Matrix rig"), siteId: null, inputs: example },
      };
    },
    expect: byRole("rigger", 201),
  },
  { file: "api/rigs/[id]/revisions/[revisionId]/route.ts", method: "GET", call: async (w) => ({ path: rigPath(w.signed) }), expect: byRole("member", 200) },
  {
    file: "api/rigs/[id]/revisions/[revisionId]/card/route.ts",
    method: "GET",
    call: async (w) => ({ path: `${rigPath(w.signed)}/card` }),
    expect: byRole("member", 200),
  },
  // Review steps each check their own role (submit: riggers up); the route lets every member reach them.
  {
    file: "api/rigs/[id]/revisions/[revisionId]/review/route.ts",
    method: "POST",
    call: async (w) => ({ path: `${rigPath(await newRig(w.clients.owner))}/review`, body: { step: "submit", note: "" } }),
    expect: byRole("rigger", 200),
  },
  {
    file: "api/rigs/[id]/revisions/[revisionId]/reuse/route.ts",
    method: "POST",
    call: async (w) => ({ path: `${rigPath(w.signed)}/reuse`, body: { name: unique("Matrix reuse"), siteId: null } }),
    expect: byRole("member", 201),
  },
  {
    file: "api/rigs/[id]/revisions/[revisionId]/checklists/route.ts",
    method: "GET",
    call: async (w) => ({ path: `${rigPath(w.signed)}/checklists` }),
    expect: byRole("member", 200),
  },
  {
    file: "api/rigs/[id]/revisions/[revisionId]/checklists/route.ts",
    method: "POST",
    call: async (w) => ({ path: `${rigPath(w.signed)}/checklists`, body: {} }),
    expect: byRole("member", 201),
  },
  {
    file: "api/rigs/[id]/revisions/[revisionId]/checklists/[runId]/ticks/route.ts",
    method: "POST",
    call: async (w) => ({ path: `${rigPath(w.signed)}/checklists/${w.runId}/ticks`, body: { itemId: w.itemOnChecklist, checked: true } }),
    expect: byRole("member", 201),
  },
  {
    file: "api/rigs/[id]/revisions/[revisionId]/readings/route.ts",
    method: "GET",
    call: async (w) => ({ path: `${rigPath(w.signed)}/readings` }),
    expect: byRole("member", 200),
  },
  {
    file: "api/rigs/[id]/revisions/[revisionId]/readings/route.ts",
    method: "POST",
    call: async (w) => ({ path: `${rigPath(w.signed)}/readings`, body: { kind: "pretension", anchor: "b", measuredN: 3400, sagM: 1.3 } }),
    expect: byRole("member", 201),
  },
];

/** Makes the crew whose rows the calls name, a client of each caller, and the rows. */
export async function makeWorld(): Promise<World> {
  const crew = await createCrew("matrix");
  const other = await createCrew("matrix-other");
  const people = { signedOut: null, ...crew.people, otherCrew: other.people.owner } as Record<Caller, Person | null>;
  const clients = {} as Record<Caller, AppClient>;
  for (const caller of CALLERS) clients[caller] = people[caller] ? await AppClient.signedIn(people[caller].email, people[caller].password) : new AppClient();
  const owner = clients.owner;
  const world = { crew, clients, people } as World;
  world.brakeId = await created(owner, "/api/kit/models", { kind: "brake", notes: "", ...MODELS.brake }, "model");
  world.ropeId = await created(owner, "/api/kit/models", { kind: "rope", notes: "", ...MODELS.rope }, "model");
  world.slingId = await newModel(world);
  world.itemId = await newItem(world);
  world.uploadId = (await json(await owner.post("/api/uploads?purpose=photo", photoForm(world.itemId)))).body.upload.id;
  world.siteId = await newSite(world);
  const checklist = await json(await owner.put("/api/crew/checklist", { items: [{ text: "Anchors as planned" }] }));
  world.itemOnChecklist = checklist.body.items[0].id;
  world.signed = await signedRig(clients.rigger, clients.lead);
  world.runId = await created(owner, `${rigPath(world.signed)}/checklists`, {}, "run");
  world.slipTestId = await created(owner, "/api/slip-tests", slipTest(world), "test");
  return world;
}

/** A caller that may end its own session or change its crew: a person of a crew made for this call. */
export async function ownCaller(caller: Caller): Promise<{ client: AppClient; me: Person | null }> {
  if (caller === "signedOut") return { client: new AppClient(), me: null };
  const crew = await createCrew("matrix-own");
  const me = crew.people[caller === "otherCrew" ? "owner" : caller];
  return { client: await AppClient.signedIn(me.email, me.password), me };
}
