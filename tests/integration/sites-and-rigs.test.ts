import { afterAll, beforeAll, describe, expect, it } from "vitest";
import example from "@/physics/examples/quarry-highline.json";
import { evaluateRig } from "@/physics";
import { AppClient } from "./support/http";
import { createCrew, testDb, type FixtureCrew } from "./support/fixtures";
import { SITE } from "./support/samples";

// Sites and rigs over HTTP against the real server and PostgreSQL: validation, roles, isolation
// between crews, revisions with a stale save answering 409, and Kit gear used by id.

let crew: FixtureCrew;
let other: FixtureCrew;
const as: Record<"member" | "rigger" | "lead" | "outsider", AppClient> = {} as never;

const WEBBING = {
  kind: "webbing",
  name: "Test tape 25",
  notes: "",
  specs: {
    widthMm: 25,
    massPerMetreG: 50,
    mbsKN: 30,
    stretchPoints: [
      { tensionKN: 0, elongationPct: 0 },
      { tensionKN: 5, elongationPct: 4 },
      { tensionKN: 10, elongationPct: 7 },
    ],
  },
};

async function json(response: Response) {
  return { status: response.status, body: await response.json() };
}

async function newSite(client = as.rigger, site: object = SITE) {
  return json(await client.post("/api/sites", site));
}

async function newModel(model: object) {
  const { status, body } = await json(await as.rigger.post("/api/kit/models", model));
  expect(status).toBe(201);
  return body.model.id as string;
}

async function newRig(inputs: object = example, siteId: string | null = null, client = as.rigger) {
  return json(await client.post("/api/rigs", { name: "Test rig", siteId, inputs }));
}

beforeAll(async () => {
  crew = await createCrew("rigs");
  other = await createCrew("rigs-other");
  for (const role of ["member", "rigger", "lead"] as const) as[role] = await AppClient.signedIn(crew.people[role].email, crew.people[role].password);
  as.outsider = await AppClient.signedIn(other.people.owner.email, other.people.owner.password);
});

afterAll(async () => {
  await testDb.destroy();
});

describe("sites", () => {
  it("are created by riggers, read by members, and kept in SI as sent", async () => {
    const { status, body } = await newSite();
    expect(status).toBe(201);
    expect(body.site).toMatchObject({ name: "Test gorge", spanM: 60, ground: SITE.ground, coordinates: SITE.coordinates, rigCount: 0, archivedAt: null });
    const read = await json(await as.member.get(`/api/sites/${body.site.id}`));
    expect(read.status).toBe(200);
    expect((await as.member.post("/api/sites", SITE)).status).toBe(403);
  });

  it("refuse bad input with the field named in the form's words", async () => {
    const cases: [object, string, RegExp][] = [
      [{ ...SITE, spanM: -3 }, "spanM", /Horizontal span: more than 0 m/],
      [{ ...SITE, heightDifferenceM: 80 }, "heightDifferenceM", /no more than the span/],
      [{ ...SITE, measuredBy: "guess" }, "measuredBy", /How it was measured/],
      [
        {
          ...SITE,
          ground: {
            kind: "profile",
            points: [
              { xM: 10, heightM: -5 },
              { xM: 5, heightM: -5 },
            ],
          },
        },
        "ground.points.1.xM",
        /farther than the point before/,
      ],
      [{ ...SITE, ground: { kind: "profile", points: [{ xM: 70, heightM: -5 }] } }, "ground.points.0.xM", /from 0 m to the span/],
      [{ ...SITE, anchors: { ...SITE.anchors, a: { kind: "bolts", boltCount: 0, boltSizeMm: 12, notes: "" } } }, "anchors.a.boltCount", /at least 1/],
      [{ ...SITE, coordinates: { latitude: 120, longitude: 8 } }, "coordinates.latitude", /from -90° to 90°/],
    ];
    for (const [site, field, message] of cases) {
      const { status, body } = await newSite(as.rigger, site);
      expect(status, field).toBe(400);
      expect(body.fieldErrors[field], field).toMatch(message);
    }
  });

  it("with rigs are archived, not deleted; without rigs they may be deleted", async () => {
    const { body } = await newSite();
    const rig = await newRig(example, body.site.id);
    expect(rig.status).toBe(201);
    const refused = await json(await as.rigger.delete(`/api/sites/${body.site.id}`));
    expect(refused.status).toBe(409);
    expect(refused.body.error).toMatch(/archive it instead/);
    const archived = await json(await as.rigger.post(`/api/sites/${body.site.id}/archive`, { archived: true }));
    expect(archived.body.site.archivedAt).not.toBeNull();
    expect((await as.rigger.get("/api/sites")).status).toBe(200);
    const listed = (await json(await as.rigger.get("/api/sites"))).body.sites.map((s: { id: string }) => s.id);
    expect(listed).not.toContain(body.site.id);
    const newOnArchived = await newRig(example, body.site.id);
    expect(newOnArchived.status).toBe(400);
    expect(newOnArchived.body.error).toMatch(/archived/);

    const lonely = await newSite();
    expect((await as.rigger.delete(`/api/sites/${lonely.body.site.id}`)).status).toBe(200);
    expect((await as.rigger.get(`/api/sites/${lonely.body.site.id}`)).status).toBe(404);
  });

  it("of another crew answer 404 on every route with an id", async () => {
    const { body } = await newSite();
    const id = body.site.id;
    expect((await as.outsider.get(`/api/sites/${id}`)).status).toBe(404);
    expect((await as.outsider.patch(`/api/sites/${id}`, SITE)).status).toBe(404);
    expect((await as.outsider.delete(`/api/sites/${id}`)).status).toBe(404);
    expect((await as.outsider.post(`/api/sites/${id}/archive`, { archived: true })).status).toBe(404);
    const planted = await json(await as.outsider.post("/api/rigs", { name: "Borrowed span", siteId: id, inputs: example }));
    expect(planted.status).toBe(400);
    expect(planted.body.fieldErrors.siteId).toBeDefined();
  });
});

describe("rigs", () => {
  it("take the site's span, height difference and ground, and keep the server's result of record", async () => {
    const site = (await newSite()).body.site;
    const { status, body } = await newRig({ ...example, spanM: 999 }, site.id);
    expect(status).toBe(201);
    expect(body.revision.inputs.spanM).toBe(60);
    expect(body.revision.inputs.heightDifferenceM).toBe(1);
    expect(body.revision.inputs.ground).toEqual({ points: SITE.ground.points });
    expect(body.revision.snapshot.site).toMatchObject({ id: site.id, spanM: 60 });
    expect(body.revision.state).toBe("draft");
    // The stored result is the engine's own answer to the stored input (an independent run of the same engine here).
    expect(body.revision.result).toEqual(JSON.parse(JSON.stringify(evaluateRig(body.revision.inputs))));
    expect(body.rig).toMatchObject({ siteId: site.id, revisionCount: 1 });
  });

  it("refuse what the engine cannot make, in one sentence naming the field as the form does, in the crew's units", async () => {
    const tooHard = await newRig({ ...example, pretension: { forceN: 40000, readAt: "a" } });
    expect(tooHard.status).toBe(400);
    expect(tooHard.body.error).toBe(
      "This rig cannot be saved. Pretension, nobody on the line: allowed is a pretension > 0 kN and below the mainline's MBS, 32 kN.",
    );
    expect(tooHard.body.error).not.toMatch(/forceN|40000|got/);
    expect(tooHard.body.fieldErrors["pretension.forceN"]).toMatch(/^Allowed: /);

    await testDb("crews").where({ id: crew.id }).update({ units: "us" });
    try {
      const inUs = await newRig({ ...example, pretension: { forceN: 40000, readAt: "a" } });
      // 32 kN = 7193.9 lbf (NIST SP 811: 1 lbf = 4.448 221 615 260 5 N).
      expect(inUs.body.error).toMatch(/below the mainline's MBS, 7193\.\d+ lbf/);
    } finally {
      await testDb("crews").where({ id: crew.id }).update({ units: "si" });
    }
    expect((await newRig({ ...example, spanM: "far" })).status).toBe(400);
  });

  it("save revisions on top of the current one; a stale save answers 409 with the current one and saves nothing", async () => {
    const created = (await newRig()).body;
    const rigId = created.rig.id;
    const first = created.revision.id;
    const second = await json(
      await as.rigger.post(`/api/rigs/${rigId}/revisions`, {
        basedOnRevisionId: first,
        name: "Test rig",
        siteId: null,
        inputs: { ...example, walker: { massKg: 90 } },
      }),
    );
    expect(second.status).toBe(201);
    expect(second.body.revision).toMatchObject({ number: 2, basedOnId: first });
    const stale = await json(
      await as.lead.post(`/api/rigs/${rigId}/revisions`, {
        basedOnRevisionId: first,
        name: "Test rig",
        siteId: null,
        inputs: { ...example, walker: { massKg: 60 } },
      }),
    );
    expect(stale.status).toBe(409);
    expect(stale.body.current).toMatchObject({ id: second.body.revision.id, number: 2 });
    expect(stale.body.error).toMatch(/Revision 2 was saved by .* while you edited/);
    const revisions = (await json(await as.member.get(`/api/rigs/${rigId}/revisions`))).body.revisions;
    expect(revisions.map((r: { number: number }) => r.number)).toEqual([2, 1]);
  });

  it("take exactly one of many saves made on the same revision at once", async () => {
    const created = (await newRig()).body;
    const saves = await Promise.all(
      Array.from({ length: 10 }, (_, i) =>
        as.rigger.post(`/api/rigs/${created.rig.id}/revisions`, {
          basedOnRevisionId: created.revision.id,
          name: "Test rig",
          siteId: null,
          inputs: { ...example, walker: { massKg: 60 + i } },
        }),
      ),
    );
    const statuses = saves.map((r) => r.status).sort();
    expect(statuses.filter((s) => s === 201)).toHaveLength(1);
    expect(statuses.filter((s) => s === 409)).toHaveLength(9);
  });

  it("are written by riggers and read by members; another crew's rig is not found", async () => {
    expect((await newRig(example, null, as.member)).status).toBe(403);
    const { body } = await newRig();
    expect((await as.member.get(`/api/rigs/${body.rig.id}`)).status).toBe(200);
    expect(
      (await as.member.post(`/api/rigs/${body.rig.id}/revisions`, { basedOnRevisionId: body.revision.id, name: "x", siteId: null, inputs: example })).status,
    ).toBe(403);
    expect((await as.outsider.get(`/api/rigs/${body.rig.id}`)).status).toBe(404);
    expect((await as.outsider.get(`/api/rigs/${body.rig.id}/revisions`)).status).toBe(404);
    expect((await as.outsider.get(`/api/rigs/${body.rig.id}/revisions/${body.revision.id}`)).status).toBe(404);
    expect(
      (await as.outsider.post(`/api/rigs/${body.rig.id}/revisions`, { basedOnRevisionId: body.revision.id, name: "x", siteId: null, inputs: example })).status,
    ).toBe(404);
    expect((await as.rigger.get("/api/rigs/not-a-uuid")).status).toBe(404);
    const outsiderList = (await json(await as.outsider.get("/api/rigs"))).body.rigs.map((r: { id: string }) => r.id);
    expect(outsiderList).not.toContain(body.rig.id);
  });

  it("use Kit gear by id, refuse retired gear, and keep their figures when the Kit changes later", async () => {
    const webbing = await newModel(WEBBING);
    const created = await newRig({ ...example, mainline: { ...example.mainline, modelId: webbing, name: "typed name", mbsN: 1 } });
    expect(created.status).toBe(201);
    const saved = created.body.revision;
    expect(saved.inputs.mainline).toMatchObject({ modelId: webbing, name: "Test tape 25", mbsN: 30000, massPerMetreKg: 0.05 });
    expect(saved.snapshot.gear).toEqual([{ field: "mainline.modelId", modelId: webbing, kind: "webbing", name: "Test tape 25", specs: WEBBING.specs }]);

    // Editing the Kit later changes nothing saved.
    expect((await as.rigger.patch(`/api/kit/models/${webbing}`, { ...WEBBING, specs: { ...WEBBING.specs, mbsKN: 20 } })).status).toBe(200);
    const reread = (await json(await as.rigger.get(`/api/rigs/${created.body.rig.id}/revisions/${saved.id}`))).body.revision;
    expect(reread.inputs).toEqual(saved.inputs);
    expect(reread.result).toEqual(saved.result);
    expect(reread.snapshot).toEqual(saved.snapshot);

    // A new revision takes the Kit as it is now.
    const next = await json(
      await as.rigger.post(`/api/rigs/${created.body.rig.id}/revisions`, { basedOnRevisionId: saved.id, name: "Test rig", siteId: null, inputs: saved.inputs }),
    );
    expect(next.body.revision.inputs.mainline.mbsN).toBe(20000);

    expect((await as.rigger.post(`/api/kit/models/${webbing}/retire`, { retiredOn: "2026-11-01", reason: "Core damage." })).status).toBe(200);
    const retired = await newRig({ ...example, mainline: { ...example.mainline, modelId: webbing } });
    expect(retired.status).toBe(400);
    expect(retired.body.fieldErrors["mainline.modelId"]).toMatch(/^Mainline from the Kit: Test tape 25 was retired on 2026-11-01/);

    const unknown = await newRig({ ...example, mainline: { ...example.mainline, modelId: crypto.randomUUID() } });
    expect(unknown.body.fieldErrors["mainline.modelId"]).toMatch(/not in the crew's Kit/);
    const foreign = await json(
      await as.outsider.post("/api/rigs", { name: "x", siteId: null, inputs: { ...example, mainline: { ...example.mainline, modelId: webbing } } }),
    );
    expect(foreign.body.fieldErrors["mainline.modelId"]).toMatch(/not in the crew's Kit/);
  });

  it("check a Kit brake against that model's slip tests, and refuse a rope it does not take", async () => {
    const brake = await newModel({ kind: "brake", name: "Test cam", notes: "", specs: { minRopeMm: 10, maxRopeMm: 11, mbsKN: 20 } });
    const test = await json(
      await as.rigger.post("/api/slip-tests", {
        deviceModelId: brake,
        ropeDiameterMm: 11,
        result: "slipped",
        force: 5,
        forceUnit: "kN",
        testedOn: "2026-10-01",
        notes: "",
      }),
    );
    expect(test.status, JSON.stringify(test.body)).toBe(201);
    const { status, body } = await newRig({ ...example, brake: { modelId: brake, device: "typed", ropeDiameterMm: 11 }, slipBench: [] });
    expect(status).toBe(201);
    expect(body.revision.inputs.brake.device).toBe("Test cam");
    expect(body.revision.inputs.slipBench).toEqual([{ testId: test.body.test.id, device: "Test cam", ropeDiameterMm: 11, result: "slipped", forceN: 5000 }]);
    expect(body.revision.result.brake.governingLoad).toBe(5000);
    const wide = await newRig({ ...example, brake: { modelId: brake, device: "typed", ropeDiameterMm: 12 }, slipBench: [] });
    expect(wide.status).toBe(400);
    expect(wide.body.error).toMatch(/12 mm rope is outside what Test cam takes according to the Kit \(10–11 mm\)/);
  });

  it("list with search, filters, sort and pages on the server, and refuse a bad filter plainly", async () => {
    const site = (await newSite()).body.site;
    for (const name of ["Filter alpha", "Filter beta", "Filter gamma"]) {
      expect((await as.rigger.post("/api/rigs", { name, siteId: site.id, inputs: example })).status).toBe(201);
    }
    const bySite = (await json(await as.member.get(`/api/rigs?siteId=${site.id}&sort=name&pageSize=2`))).body;
    expect(bySite.total).toBe(3);
    expect(bySite.rigs.map((r: { name: string }) => r.name)).toEqual(["Filter alpha", "Filter beta"]);
    const page2 = (await json(await as.member.get(`/api/rigs?siteId=${site.id}&sort=name&pageSize=2&page=2`))).body;
    expect(page2.rigs.map((r: { name: string }) => r.name)).toEqual(["Filter gamma"]);
    expect((await json(await as.member.get(`/api/rigs?q=filter%20be&siteId=${site.id}`))).body.total).toBe(1);
    expect((await json(await as.member.get(`/api/rigs?q=%25&siteId=${site.id}`))).body.total).toBe(0);
    expect((await json(await as.member.get(`/api/rigs?siteId=${site.id}&spanMinM=61`))).body.total).toBe(0);
    expect((await json(await as.member.get(`/api/rigs?siteId=${site.id}&spanMaxM=60&state=draft&startedBy=${crew.people.rigger.id}`))).body.total).toBe(3);
    const bad = await json(await as.member.get("/api/rigs?state=finished"));
    expect(bad.status).toBe(400);
    expect(bad.body.fieldErrors.state).toMatch(/State: one of draft/);
  });

  it("keep a revision's content fixed even against an UPDATE sent straight to the database", async () => {
    const { body } = await newRig();
    await expect(
      testDb("rig_revisions")
        .where({ id: body.revision.id })
        .update({ inputs: JSON.stringify({}) }),
    ).rejects.toThrow(/immutable/);
    await expect(testDb("rig_revisions").where({ id: body.revision.id }).update({ state: "in_review" })).resolves.toBe(1);
  });
});
