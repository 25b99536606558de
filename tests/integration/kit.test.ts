import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { AppClient } from "./support/http";
import { createCrew, testDb, type FixtureCrew } from "./support/fixtures";
import { MODELS } from "./support/samples";
import { itemsInService } from "@/db/kit";
import { db } from "@/db/knex";

let crew: FixtureCrew;
let other: FixtureCrew;
const as: Record<string, AppClient> = {};

beforeAll(async () => {
  crew = await createCrew("kit");
  other = await createCrew("kit-other");
  for (const role of ["member", "rigger", "lead"] as const) as[role] = await AppClient.signedIn(crew.people[role].email, crew.people[role].password);
  as.outsider = await AppClient.signedIn(other.people.owner.email, other.people.owner.password);
});

afterAll(async () => {
  await testDb.destroy();
  await db.destroy();
});

async function createModel(kind: keyof typeof MODELS, client = as.rigger) {
  const response = await client.post("/api/kit/models", { kind, notes: "", ...MODELS[kind] });
  return { response, body: await response.json() };
}

describe("gear models of every kind", () => {
  for (const kind of Object.keys(MODELS) as (keyof typeof MODELS)[]) {
    it(`${kind}: a rigger creates it, a lead edits it, a member lists it, a rigger retires it`, async () => {
      const created = await createModel(kind);
      expect(created.response.status).toBe(201);
      expect(created.body.model).toMatchObject({ kind, name: MODELS[kind].name, specs: MODELS[kind].specs, retiredOn: null });
      const id = created.body.model.id;

      const edited = await as.lead.patch(`/api/kit/models/${id}`, { kind, ...MODELS[kind], name: `${MODELS[kind].name} (edited)`, notes: "checked" });
      expect(edited.status).toBe(200);
      expect((await edited.json()).model).toMatchObject({ name: `${MODELS[kind].name} (edited)`, notes: "checked" });

      const listed = await (await as.member.get(`/api/kit/models?kind=${kind}`)).json();
      expect(listed.models.map((m: { id: string }) => m.id)).toContain(id);
      expect(listed.models.every((m: { kind: string }) => m.kind === kind)).toBe(true);

      const retired = await as.rigger.post(`/api/kit/models/${id}/retire`, { retiredOn: "2026-11-01", reason: "replaced by a newer model" });
      expect(retired.status).toBe(200);
      expect((await retired.json()).model).toMatchObject({ retiredOn: "2026-11-01", retiredReason: "replaced by a newer model" });
    });
  }

  it("refuses each kind's bad specs with a message that names the field and the allowed range", async () => {
    const badWebbing = await as.rigger.post("/api/kit/models", { kind: "webbing", name: "x", specs: { ...MODELS.webbing.specs, widthMm: 2500 } });
    expect(badWebbing.status).toBe(400);
    expect((await badWebbing.json()).fieldErrors["specs.widthMm"]).toBe("Width must be at most 60 mm (allowed 10–60 mm).");

    const notFromOrigin = await as.rigger.post("/api/kit/models", {
      kind: "rope",
      name: "x",
      specs: {
        ...MODELS.rope.specs,
        stretchPoints: [
          { tensionKN: 1, elongationPct: 1 },
          { tensionKN: 2, elongationPct: 0.5 },
        ],
      },
    });
    const errors = (await notFromOrigin.json()).fieldErrors;
    expect(errors["specs.stretchPoints.0.tensionKN"]).toMatch(/origin/);
    expect(errors["specs.stretchPoints.1.elongationPct"]).toMatch(/must rise/);

    const backwardsRange = await as.rigger.post("/api/kit/models", { kind: "brake", name: "x", specs: { minRopeMm: 12, maxRopeMm: 9, mbsKN: 20 } });
    expect((await backwardsRange.json()).fieldErrors["specs.maxRopeMm"]).toMatch(/cannot be below/);

    const efficiency = await as.rigger.post("/api/kit/models", { kind: "pulley", name: "x", specs: { sheaveDiameterMm: 50, efficiency: 92, mbsKN: 36 } });
    expect((await efficiency.json()).fieldErrors["specs.efficiency"]).toBe("Efficiency must be at most 100 % (allowed 50–100 %).");

    const missing = await as.rigger.post("/api/kit/models", { kind: "sling", name: "x", specs: {} });
    expect((await missing.json()).fieldErrors["specs.mbsKN"]).toBe("MBS is required (0.5–300 kN).");

    const unknownKind = await as.rigger.post("/api/kit/models", { kind: "hammock", name: "x", specs: {} });
    expect(unknownKind.status).toBe(400);
    expect((await unknownKind.json()).error).toMatch(/Choose a kind of gear/);

    const notJson = await as.rigger.request("POST", "/api/kit/models", undefined, { "content-type": "application/json" });
    expect(notJson.status).toBe(400);
  });

  it("keeps a model's kind fixed", async () => {
    const { body } = await createModel("connector");
    const changed = await as.rigger.patch(`/api/kit/models/${body.model.id}`, { kind: "sling", name: "x", specs: { mbsKN: 20 } });
    expect(changed.status).toBe(409);
  });
});

describe("roles", () => {
  it("lets members read and refuses them every write", async () => {
    expect((await as.member.get("/api/kit/models")).status).toBe(200);
    const { response } = await createModel("sling", as.member);
    expect(response.status).toBe(403);
    const { body } = await createModel("sling");
    expect((await as.member.patch(`/api/kit/models/${body.model.id}`, { kind: "sling", ...MODELS.sling })).status).toBe(403);
    expect((await as.member.post(`/api/kit/models/${body.model.id}/retire`, { retiredOn: "2026-11-01", reason: "worn out" })).status).toBe(403);
    expect((await as.member.post("/api/kit/items", { modelId: body.model.id, label: "S-1", inServiceSince: "2026-01-01" })).status).toBe(403);
  });

  it("answers 401 to someone not signed in", async () => {
    expect((await new AppClient().get("/api/kit/models")).status).toBe(401);
  });
});

describe("isolation between crews", () => {
  it("answers 404 for another crew's models and items, and never lists them", async () => {
    const { body } = await createModel("webbing");
    const item = await (await as.rigger.post("/api/kit/items", { modelId: body.model.id, label: "W-1", inServiceSince: "2026-02-01" })).json();
    const modelPath = `/api/kit/models/${body.model.id}`;
    const itemPath = `/api/kit/items/${item.item.id}`;
    expect((await as.outsider.get(modelPath)).status).toBe(404);
    expect((await as.outsider.patch(modelPath, { kind: "webbing", ...MODELS.webbing })).status).toBe(404);
    expect((await as.outsider.post(`${modelPath}/retire`, { retiredOn: "2026-11-01", reason: "not mine" })).status).toBe(404);
    expect((await as.outsider.get(itemPath)).status).toBe(404);
    expect((await as.outsider.patch(itemPath, { label: "stolen", inServiceSince: "2026-02-01" })).status).toBe(404);
    expect((await as.outsider.post(`${itemPath}/inspections`, { inspectedOn: "2026-11-01", result: "pass" })).status).toBe(404);
    expect((await as.outsider.post("/api/kit/items", { modelId: body.model.id, label: "mine now", inServiceSince: "2026-02-01" })).status).toBe(404);
    const theirs = await (await as.outsider.get("/api/kit/models")).json();
    expect(theirs.models).toEqual([]);
    expect((await (await as.outsider.get("/api/kit/items")).json()).items).toEqual([]);
    expect((await as.outsider.get("/api/kit/models/not-a-uuid")).status).toBe(404);
  });
});

describe("inventory", () => {
  it("adds, edits, inspects and retires an item; a retired item cannot go into a new plan", async () => {
    const { body } = await createModel("rope");
    const created = await as.rigger.post("/api/kit/items", { modelId: body.model.id, label: "R-07", inServiceSince: "2025-05-01", notes: "orange sheath" });
    expect(created.status).toBe(201);
    const item = (await created.json()).item;
    expect(item).toMatchObject({ label: "R-07", modelName: MODELS.rope.name, inServiceSince: "2025-05-01", retiredOn: null });

    const edited = await as.lead.patch(`/api/kit/items/${item.id}`, { label: "R-07b", inServiceSince: "2025-05-02", notes: "" });
    expect((await edited.json()).item).toMatchObject({ label: "R-07b", inServiceSince: "2025-05-02" });

    const inspected = await as.rigger.post(`/api/kit/items/${item.id}/inspections`, {
      inspectedOn: "2026-10-01",
      result: "watch",
      notes: "glazing near one end",
    });
    expect(inspected.status).toBe(201);
    expect((await inspected.json()).inspection).toMatchObject({ result: "watch", inspectorName: crew.people.rigger.name });

    const detail = await (await as.member.get(`/api/kit/items/${item.id}`)).json();
    expect(detail.item).toMatchObject({ lastInspectedOn: "2026-10-01", lastResult: "watch" });
    expect(detail.inspections).toHaveLength(1);

    expect((await itemsInService(crew.id, [item.id])).map((i) => i.id)).toEqual([item.id]);
    const tooEarly = await as.rigger.post(`/api/kit/items/${item.id}/retire`, { retiredOn: "2025-01-01", reason: "core shot" });
    expect(tooEarly.status).toBe(400);
    expect((await tooEarly.json()).fieldErrors.retiredOn).toMatch(/before the item went into service/);
    const retired = await as.rigger.post(`/api/kit/items/${item.id}/retire`, { retiredOn: "2026-10-02", reason: "core shot" });
    expect((await retired.json()).item).toMatchObject({ retiredOn: "2026-10-02", retiredReason: "core shot" });
    expect(await itemsInService(crew.id, [item.id])).toEqual([]);
    const listed = await (await as.member.get(`/api/kit/items?modelId=${body.model.id}`)).json();
    expect(listed.items.map((i: { label: string }) => i.label)).toEqual(["R-07b"]);
  });

  it("refuses new items of a retired model, items in the future and bad inspections", async () => {
    const { body } = await createModel("pulley");
    const future = await as.rigger.post("/api/kit/items", { modelId: body.model.id, label: "P-1", inServiceSince: "2999-01-01" });
    expect((await future.json()).fieldErrors.inServiceSince).toBe("In service since cannot be in the future.");
    const item = (await (await as.rigger.post("/api/kit/items", { modelId: body.model.id, label: "P-1", inServiceSince: "2026-01-01" })).json()).item;
    const badResult = await as.rigger.post(`/api/kit/items/${item.id}/inspections`, { inspectedOn: "2026-10-01", result: "fine" });
    expect((await badResult.json()).fieldErrors.result).toBe("Choose pass, watch or fail.");
    await as.rigger.post(`/api/kit/models/${body.model.id}/retire`, { retiredOn: "2026-11-01", reason: "recalled" });
    expect(await itemsInService(crew.id, [item.id])).toEqual([]);
    const refused = await as.rigger.post("/api/kit/items", { modelId: body.model.id, label: "P-2", inServiceSince: "2026-01-01" });
    expect(refused.status).toBe(409);
  });
});

describe("labels and retired items", () => {
  it("refuses a second item of a model with the same label, in any case, and allows it in another model", async () => {
    const { body } = await createModel("sling");
    const first = await as.rigger.post("/api/kit/items", { modelId: body.model.id, label: "SL-1", inServiceSince: "2026-01-01" });
    expect(first.status).toBe(201);
    const again = await as.rigger.post("/api/kit/items", { modelId: body.model.id, label: "sl-1", inServiceSince: "2026-01-01" });
    expect(again.status).toBe(409);
    expect((await again.json()).fieldErrors.label).toBe(
      'Another item of this model is already labelled "sl-1": give each item its own serial or label (a letter or number more will do).',
    );
    const second = await (await as.rigger.post("/api/kit/items", { modelId: body.model.id, label: "SL-2", inServiceSince: "2026-01-01" })).json();
    const renamed = await as.rigger.patch(`/api/kit/items/${second.item.id}`, { label: "SL-1", inServiceSince: "2026-01-01" });
    expect(renamed.status).toBe(409);
    const { body: another } = await createModel("sling");
    expect((await as.rigger.post("/api/kit/items", { modelId: another.model.id, label: "SL-1", inServiceSince: "2026-01-01" })).status).toBe(201);
  });

  it("refuses to inspect a retired item, saying why, and keeps its log", async () => {
    const { body } = await createModel("connector");
    const item = (await (await as.rigger.post("/api/kit/items", { modelId: body.model.id, label: "C-1", inServiceSince: "2026-01-01" })).json()).item;
    await as.rigger.post(`/api/kit/items/${item.id}/inspections`, { inspectedOn: "2026-02-01", result: "fail", notes: "bent gate" });
    await as.rigger.post(`/api/kit/items/${item.id}/retire`, { retiredOn: "2026-02-02", reason: "bent gate" });
    const refused = await as.rigger.post(`/api/kit/items/${item.id}/inspections`, { inspectedOn: "2026-03-01", result: "pass" });
    expect(refused.status).toBe(409);
    expect((await refused.json()).error).toBe("This item was retired on 2026-02-02: a retired item is not inspected again, and its log stays as it was.");
    expect((await (await as.member.get(`/api/kit/items/${item.id}`)).json()).inspections).toHaveLength(1);
  });
});

describe("a crew that works in US units", () => {
  it("is refused a spec with the limit in lbf, and its values are kept in the Kit's units", async () => {
    const us = await createCrew("kit-us");
    await testDb("crews").where({ id: us.id }).update({ units: "us" });
    const rigger = await AppClient.signedIn(us.people.rigger.email, us.people.rigger.password);
    const tooStrong = await rigger.post("/api/kit/models", { kind: "sling", name: "x", specs: { mbsKN: 400 } });
    // 300 kN = 67 443 lbf and 0.5 kN = 112.4 lbf (NIST SP 811), rounded inward to three figures.
    expect((await tooStrong.json()).fieldErrors["specs.mbsKN"]).toBe("MBS must be at most 67400 lbf (allowed 113–67400 lbf).");
    const created = await rigger.post("/api/kit/models", { kind: "sling", name: "US sling", specs: { mbsKN: 40 } });
    expect((await created.json()).model.specs).toEqual({ mbsKN: 40 });
  });
});
