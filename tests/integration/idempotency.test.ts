import crypto from "node:crypto";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { AppClient } from "./support/http";
import { createCrew, testDb, type FixtureCrew } from "./support/fixtures";
import { json, signedRig, supersede, type RigRevision } from "./support/rig-steps";

// Every write route that takes an idempotency key (the phone's offline queue sends one with each write):
// starting a checklist run, ticking an item, recording a load-cell reading. A key lands once, whatever
// happens to the revision afterwards; a replay answers 200 "replayed" and changes nothing; parallel copies
// of one write make one row; another crew's key is its own; a replay the member may no longer make is
// refused with a reason the phone can show.

type Who = "member" | "rigger" | "lead";
let crew: FixtureCrew;
let other: FixtureCrew;
const as = {} as Record<Who | "outsider", AppClient>;

const runsUrl = (rig: RigRevision) => `/api/rigs/${rig.rigId}/revisions/${rig.revisionId}/checklists`;
const readingsUrl = (rig: RigRevision) => `/api/rigs/${rig.rigId}/revisions/${rig.revisionId}/readings`;
const reading = (idempotencyKey: string) => ({ kind: "pretension", anchor: "b", measuredN: 3400, sagM: 1.3, idempotencyKey });

const count = async (table: string, where: Record<string, string>) => Number((await testDb(table).where(where).count({ n: "*" }))[0].n);

interface WriteRoute {
  name: string;
  table: string;
  /** Makes what the write needs (a signed-off rig, a run), and says where it goes and with what body. */
  prepare: (rig: RigRevision) => Promise<{ url: string; body: (key: string) => object }>;
}

const routes: WriteRoute[] = [
  {
    name: "starting a checklist run",
    table: "checklist_runs",
    prepare: async (rig) => ({ url: runsUrl(rig), body: (idempotencyKey) => ({ idempotencyKey }) }),
  },
  {
    name: "ticking a checklist item",
    table: "checklist_ticks",
    prepare: async (rig) => {
      const run = await json(await as.member.post(runsUrl(rig), {}));
      expect(run.status).toBe(201);
      const itemId = run.body.run.items[0].id as string;
      return { url: `${runsUrl(rig)}/${run.body.run.id}/ticks`, body: (idempotencyKey) => ({ itemId, checked: true, idempotencyKey }) };
    },
  },
  { name: "recording a load-cell reading", table: "tension_readings", prepare: async (rig) => ({ url: readingsUrl(rig), body: reading }) },
];

beforeAll(async () => {
  crew = await createCrew("idempotency");
  other = await createCrew("idempotency-other");
  for (const role of ["member", "rigger", "lead"] as const) as[role] = await AppClient.signedIn(crew.people[role].email, crew.people[role].password);
  as.outsider = await AppClient.signedIn(other.people.member.email, other.people.member.password);
  expect((await as.lead.put("/api/crew/checklist", { items: [{ text: "Anchors as planned" }] })).status).toBe(200);
});

afterAll(async () => {
  await testDb.destroy();
});

describe.each(routes)("idempotency keys: $name", ({ table, prepare }) => {
  it("lands a key once: each replay answers 200 replayed and changes nothing, the audit log included", async () => {
    const rig = await signedRig(as.rigger, as.lead);
    const { url, body } = await prepare(rig);
    const key = crypto.randomUUID();
    const first = await json(await as.member.post(url, body(key)));
    expect(first).toMatchObject({ status: 201, body: { replayed: false } });
    const logged = await count("audit_log", { crew_id: crew.id });
    for (let i = 0; i < 2; i++) expect(await json(await as.member.post(url, body(key)))).toMatchObject({ status: 200, body: { replayed: true } });
    expect(await count(table, { crew_id: crew.id, idempotency_key: key })).toBe(1);
    // The audit log records the write once too.
    expect(await count("audit_log", { crew_id: crew.id })).toBe(logged);
  });

  it("makes one row from 20 parallel copies of one write, with no 5xx", async () => {
    const rig = await signedRig(as.rigger, as.lead);
    const { url, body } = await prepare(rig);
    const key = crypto.randomUUID();
    const statuses = await Promise.all(Array.from({ length: 20 }, async () => (await as.member.post(url, body(key))).status));
    expect(statuses.filter((s) => s === 201)).toHaveLength(1);
    expect(statuses.filter((s) => s === 200)).toHaveLength(19);
    expect(await count(table, { crew_id: crew.id, idempotency_key: key })).toBe(1);
  });

  it("answers a replay of a landed write as landed even after the revision was superseded; a new write there is refused with why", async () => {
    const rig = await signedRig(as.rigger, as.lead);
    const { url, body } = await prepare(rig);
    const key = crypto.randomUUID();
    expect((await as.member.post(url, body(key))).status).toBe(201);
    await supersede(as.rigger, as.lead, rig);
    expect(await json(await as.member.post(url, body(key)))).toMatchObject({ status: 200, body: { replayed: true } });
    const fresh = await json(await as.member.post(url, body(crypto.randomUUID())));
    expect(fresh.status).toBe(409);
    expect(fresh.body.error).toMatch(/^Revision 1 has been superseded by a newer sign-off: .+ on the signed-off revision\.$/);
  });

  it("refuses the same key from another crew's member with 404, changing nothing in either crew", async () => {
    const rig = await signedRig(as.rigger, as.lead);
    const { url, body } = await prepare(rig);
    const key = crypto.randomUUID();
    expect((await as.member.post(url, body(key))).status).toBe(201);
    const intruder = await json(await as.outsider.post(url, body(key)));
    expect(intruder.status).toBe(404);
    expect(typeof intruder.body.error).toBe("string");
    expect(await count(table, { crew_id: other.id })).toBe(0);
  });
});

describe("idempotency keys: bad keys and replays the member may no longer make", () => {
  it("refuses a key that is not a uuid, saying what is allowed, and saves nothing", async () => {
    const rig = await signedRig(as.rigger, as.lead);
    for (const idempotencyKey of ["", "abc", "00000000-0000-0000-0000-00000000000g", 42, null]) {
      const refused = await json(await as.member.post(readingsUrl(rig), { ...reading("x"), idempotencyKey }));
      expect(refused.status, JSON.stringify(idempotencyKey)).toBe(400);
      expect(refused.body.fieldErrors.idempotencyKey).toBe("The write's key must be a uuid; the app makes one for each write.");
    }
    expect(await count("tension_readings", { revision_id: rig.revisionId })).toBe(0);
  });

  it("refuses the replay of a member removed from the crew meanwhile, with a message, and keeps what had landed", async () => {
    const leaver = await createCrew("idempotency-leaver");
    const rigger = await AppClient.signedIn(leaver.people.rigger.email, leaver.people.rigger.password);
    const lead = await AppClient.signedIn(leaver.people.lead.email, leaver.people.lead.password);
    const member = await AppClient.signedIn(leaver.people.member.email, leaver.people.member.password);
    const rig = await signedRig(rigger, lead);
    const landed = crypto.randomUUID();
    expect((await member.post(readingsUrl(rig), reading(landed))).status).toBe(201);
    await testDb("crew_members").where({ crew_id: leaver.id, user_id: leaver.people.member.id }).delete();
    for (const key of [landed, crypto.randomUUID()]) {
      const refused = await json(await member.post(readingsUrl(rig), reading(key)));
      expect(refused.status).toBeGreaterThanOrEqual(400);
      expect(refused.status).toBeLessThan(500);
      expect(refused.status).not.toBe(401);
      expect(refused.body.error).toMatch(/\w+ \w+/);
    }
    expect(await count("tension_readings", { revision_id: rig.revisionId })).toBe(1);
  });

  it("lands every write sent with no key: the key is optional, for clients that do not queue", async () => {
    const rig = await signedRig(as.rigger, as.lead);
    for (let i = 0; i < 2; i++)
      expect((await as.member.post(readingsUrl(rig), { kind: "pretension", anchor: "b", measuredN: 3400, sagM: 1.3 })).status).toBe(201);
    expect(await count("tension_readings", { revision_id: rig.revisionId })).toBe(2);
  });
});
