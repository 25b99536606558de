import crypto from "node:crypto";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { AppClient } from "./support/http";
import { createCrew, testDb, type FixtureCrew } from "./support/fixtures";
import { DEMO_PASSWORD, DEMO_PEOPLE } from "@/seeds/01_demo_crew";

let crew: FixtureCrew;
let other: FixtureCrew;
const as: Record<string, AppClient> = {};
let brakeId: string;
let ropeId: string;

// NIST SP 811 (2008), appendix B: 1 lbf = 4.448 221 615 260 5 N.
const LBF = 4.4482216152605;

/** An invented slow pull in N, semicolon-separated with decimal commas, slipping 500 N down once it reaches `slipN`. */
function pullCsv(slipN: number, samples = 2000): { text: string; force: number[] } {
  const force: number[] = [];
  const lines = ["Zeit (s);Kraft (N)"];
  let slipped = false;
  for (let i = 0; i < samples; i++) {
    const rising = i * 5 + 3 * Math.sin(i);
    slipped ||= rising >= slipN;
    // The file holds a tenth of a newton; the expected onset is worked out from what the file holds.
    force.push(Number((slipped ? slipN - 500 : rising).toFixed(1)));
    lines.push(`${(i * 0.05).toFixed(2).replace(".", ",")};${force[i].toFixed(1).replace(".", ",")}`);
  }
  return { text: lines.join("\n"), force };
}

/** Independent model of the trade's definition: the running maximum when the force first falls more than `drop` below it. */
function expectedOnset(force: number[], drop: number) {
  let max = -Infinity;
  for (const f of force) {
    max = Math.max(max, f);
    if (max - f > drop) return { kind: "slipped", forceN: max };
  }
  return { kind: "held", forceN: max };
}

function traceForm(text: string | Uint8Array, fields: Record<string, string>, name = "pull.csv") {
  const form = new FormData();
  form.append("file", new Blob([text as BlobPart], { type: "text/csv" }), name);
  for (const [k, v] of Object.entries(fields)) form.append(k, v);
  return form;
}

const counts = async () => ({
  uploads: Number((await testDb("uploads").where({ crew_id: crew.id }).count<{ count: string }[]>({ count: "*" }))[0].count),
  tests: Number((await testDb("slip_tests").where({ crew_id: crew.id }).count<{ count: string }[]>({ count: "*" }))[0].count),
});

beforeAll(async () => {
  crew = await createCrew("slip");
  other = await createCrew("slip-other");
  for (const role of ["member", "rigger", "lead"] as const) as[role] = await AppClient.signedIn(crew.people[role].email, crew.people[role].password);
  as.outsider = await AppClient.signedIn(other.people.owner.email, other.people.owner.password);
  const brake = await (await as.rigger.post("/api/kit/models", { kind: "brake", name: "Bench cam", specs: { minRopeMm: 9, maxRopeMm: 12, mbsKN: 20 } })).json();
  const rope = await (
    await as.rigger.post("/api/kit/models", {
      kind: "rope",
      name: "Bench static 10.5",
      specs: {
        diameterMm: 10.5,
        construction: "static",
        mbsKN: 28,
        massPerMetreG: 70,
        stretchPoints: [
          { tensionKN: 0, elongationPct: 0 },
          { tensionKN: 1, elongationPct: 1 },
        ],
      },
    })
  ).json();
  brakeId = brake.model.id;
  ropeId = rope.model.id;
});

afterAll(async () => {
  await testDb.destroy();
});

const baseTest = () => ({ deviceModelId: brakeId, ropeModelId: ropeId, ropeDiameterMm: 10.5, testedOn: "2026-11-20", notes: "" });

describe("a trace that records the release after the pull", () => {
  // A pull that held to 4 kN, then released to zero: the release must not be taken for a slip once the tester says when the pull ended.
  const text = ["time,force", ...Array.from({ length: 41 }, (_, i) => `${i},${i * 100}`), "41,2000", "42,0", "43,0"].join("\n");

  it("is read as held to its maximum with the pull's end, and the end is kept with the analysis", async () => {
    const response = await as.rigger.post("/api/slip-tests/traces", traceForm(text, { unit: "N", drop: "200", pullEndS: "40" }));
    expect(response.status).toBe(201);
    const { analysis } = await response.json();
    expect(analysis.onset).toMatchObject({ kind: "held", forceN: 4000 });
    expect(analysis.pullEndS).toBe(40);
  });

  it("refuses a pull end that is not a positive number of seconds, storing nothing", async () => {
    const before = await counts();
    const response = await as.rigger.post("/api/slip-tests/traces", traceForm(text, { unit: "N", drop: "200", pullEndS: "-3" }));
    expect(response.status).toBe(400);
    expect((await response.json()).fieldErrors.pullEndS).toMatch(/more than 0 s/);
    expect(await counts()).toEqual(before);
  });
});

describe("a trace, detected, confirmed, in the slip table", () => {
  it("detects the onset the trade's definition gives, keeps the file with its SHA-256, and saves the confirmed value", async () => {
    const { text, force } = pullCsv(6000);
    const response = await as.rigger.post("/api/slip-tests/traces", traceForm(text, { unit: "N", drop: "200" }));
    expect(response.status).toBe(201);
    const { upload, analysis } = await response.json();
    const expected = expectedOnset(force, 200);
    expect(analysis.onset.kind).toBe("slipped");
    expect(analysis.onset.forceN).toBeCloseTo(expected.forceN, 6);
    expect(analysis.rows).toBe(2000);
    expect(analysis.chart.time.length).toBeLessThanOrEqual(1601);
    expect(upload.sha256).toBe(crypto.createHash("sha256").update(text).digest("hex"));

    const download = await as.member.get(`/api/uploads/${upload.id}`);
    expect(download.status).toBe(200);
    expect(await download.text()).toBe(text);
    expect((await as.outsider.get(`/api/uploads/${upload.id}`)).status).toBe(404);

    const saved = await as.rigger.post("/api/slip-tests", {
      ...baseTest(),
      result: "slipped",
      force: Number((analysis.onset.forceN / 1000).toPrecision(4)),
      forceUnit: "kN",
      traceUploadId: upload.id,
    });
    expect(saved.status).toBe(201);
    const { test } = await saved.json();
    expect(test).toMatchObject({ result: "slipped", detectedResult: "slipped", traceUploadId: upload.id, testerName: crew.people.rigger.name });
    expect(test.detectedForceN).toBeCloseTo(expected.forceN, 6);

    const { table } = await (await as.member.get("/api/slip-table")).json();
    expect(table.cells).toEqual([expect.objectContaining({ deviceId: brakeId, ropeDiameterMm: 10.5, tests: 1, slips: 1 })]);
    expect(table.cells[0].lowestSlipN).toBeCloseTo(expected.forceN, -1);
  });

  it("asks for a reason when the tester corrects the detected value, then keeps both", async () => {
    const { text } = pullCsv(7000);
    const { upload } = await (await as.rigger.post("/api/slip-tests/traces", traceForm(text, { unit: "N", drop: "200" }))).json();
    const corrected = { ...baseTest(), result: "slipped", force: 6.5, forceUnit: "kN", traceUploadId: upload.id };
    const refused = await as.rigger.post("/api/slip-tests", corrected);
    expect(refused.status).toBe(400);
    expect((await refused.json()).fieldErrors.notes).toMatch(/say in the notes why/);
    const saved = await as.rigger.post("/api/slip-tests", { ...corrected, notes: "Sheath slipped first at 6.5 kN; the cam bit later." });
    expect(saved.status).toBe(201);
    expect((await saved.json()).test).toMatchObject({ forceN: 6500, detectedResult: "slipped" });
  });

  it("records held-to results as lower bounds, never as slips, and converts lbf", async () => {
    const saved = await as.rigger.post("/api/slip-tests", {
      ...baseTest(),
      ropeDiameterMm: 11,
      ropeModelId: undefined,
      result: "held",
      force: 2000,
      forceUnit: "lbf",
    });
    expect(saved.status).toBe(201);
    expect((await saved.json()).test.forceN).toBeCloseTo(2000 * LBF, 6);
    const { table } = await (await as.member.get("/api/slip-table")).json();
    const cell = table.cells.find((c: { ropeDiameterMm: number }) => c.ropeDiameterMm === 11);
    expect(cell).toMatchObject({ slips: 0, lowestSlipN: null });
    expect(cell.highestHeldN).toBeCloseTo(2000 * LBF, 6);
    const csv = await as.member.get("/api/slip-table?format=csv");
    expect(csv.headers.get("content-type")).toMatch(/text\/csv/);
    // 2000 lbf is 8896.4 N: cut down to 8.89 kN, never rounded up to 8.90.
    expect((await csv.text()).split("\r\n")).toContain('"Bench cam",11.0,1,0,,,8.89');
    // A crew in US units gets the same table in lbf: the 2000 lbf held-to bound reads 2000 (kept as 8896.4 N, cut down).
    await testDb("crews").where({ id: crew.id }).update({ units: "us" });
    const usCsv = (await (await as.member.get("/api/slip-table?format=csv")).text()).split("\r\n");
    await testDb("crews").where({ id: crew.id }).update({ units: "si" });
    expect(usCsv[0]).toBe("device,rope_diameter_mm,tests,slips,lowest_slip_lbf,slip_spread_lbf,held_to_at_least_lbf");
    expect(usCsv).toContain('"Bench cam",11.0,1,0,,,2000');
    const listed = await (await as.member.get(`/api/slip-tests?deviceId=${brakeId}&ropeDiameterMm=11`)).json();
    expect(listed.tests).toHaveLength(1);
  });
});

describe("bad traces and bad values: a clear message each, nothing half saved", () => {
  const cases: [string, string | Uint8Array, Record<string, string>, number, RegExp, string?][] = [
    ["no numeric force column", "time,comment\n0,start\n1,pull\n", { unit: "N", drop: "200" }, 422, /no numeric force column/],
    ["a row that does not parse", "time,force\n0,100\n1,200\n2,abc\n", { unit: "N", drop: "200" }, 422, /^Row 4: the force "abc" is not a number\.$/],
    ["times going backwards", "time,force\n0,100\n2,200\n1,300\n", { unit: "N", drop: "200" }, 422, /^Row 4: the time 1 is not after the previous row's/],
    [
      "a force unit out of the bench's range",
      "time,force\n0,100\n1,4500\n",
      { unit: "kN", drop: "0.2" },
      422,
      /peaks at 4500\.00 kN, outside what a slip bench measures \(0\.1–50 kN\)/,
    ],
    ["an unknown unit", "time,force\n0,100\n1,4500\n", { unit: "tons", drop: "200" }, 400, /Choose the force unit: N, kN, lbf, kgf/],
    ["a binary file named .csv", new Uint8Array([0x89, 0x50, 0x4e, 0x47, 0, 0, 0, 0]), { unit: "N", drop: "200" }, 415, /contents are not/],
    ["a file that is not a CSV by name", "time,force\n0,1\n", { unit: "N", drop: "200" }, 415, /does not end in one of those extensions/, "pull.xlsx"],
  ];
  for (const [what, body, fields, status, message, name] of cases) {
    it(`refuses ${what}`, async () => {
      const before = await counts();
      const response = await as.rigger.post("/api/slip-tests/traces", traceForm(body, fields, name));
      expect(response.status).toBe(status);
      expect((await response.json()).error).toMatch(message);
      expect(await counts()).toEqual(before);
    });
  }

  it("refuses a trace over the size limit before reading it", async () => {
    const before = await counts();
    const big = new Uint8Array(64 * 1024 * 1024 + 1).fill(0x31);
    const response = await as.rigger.post("/api/slip-tests/traces", traceForm(big, { unit: "N", drop: "200" }));
    expect(response.status).toBe(413);
    expect((await response.json()).error).toMatch(/at most 64 MiB/);
    expect(await counts()).toEqual(before);
  });

  it("refuses a slip force in the wrong unit's range and a device that is not a brake or line grip", async () => {
    const before = await counts();
    const wrongUnit = await as.rigger.post("/api/slip-tests", { ...baseTest(), result: "slipped", force: 6500, forceUnit: "kN" });
    expect(wrongUnit.status).toBe(400);
    expect((await wrongUnit.json()).fieldErrors.force).toBe("6500 kN is outside what a slip bench measures (0.1–50 kN): check the unit.");
    const notADevice = await as.rigger.post("/api/slip-tests", { ...baseTest(), deviceModelId: ropeId, result: "slipped", force: 6.5, forceUnit: "kN" });
    expect((await notADevice.json()).fieldErrors.deviceModelId).toMatch(/brake or line grip/);
    const tooFine = await as.rigger.post("/api/slip-tests", { ...baseTest(), ropeDiameterMm: 10.55, result: "slipped", force: 6.5, forceUnit: "kN" });
    expect((await tooFine.json()).fieldErrors.ropeDiameterMm).toMatch(/tenth of a millimetre/);
    expect(await counts()).toEqual(before);
  });
});

describe("roles, isolation and the published link", () => {
  it("lets members read and refuses them traces and tests", async () => {
    expect((await as.member.get("/api/slip-tests")).status).toBe(200);
    expect((await as.member.post("/api/slip-tests/traces", traceForm("time,force\n0,1\n1,2\n", { unit: "N", drop: "200" }))).status).toBe(403);
    expect((await as.member.post("/api/slip-tests", { ...baseTest(), result: "slipped", force: 6.5, forceUnit: "kN" })).status).toBe(403);
    expect((await new AppClient().get("/api/slip-table")).status).toBe(401);
  });

  it("keeps each crew's tests, traces and table to itself", async () => {
    const { tests } = await (await as.rigger.get("/api/slip-tests")).json();
    expect((await as.outsider.get(`/api/slip-tests/${tests[0].id}`)).status).toBe(404);
    expect((await (await as.outsider.get("/api/slip-tests")).json()).tests).toEqual([]);
    expect((await (await as.outsider.get("/api/slip-table")).json()).table.cells).toEqual([]);
    const borrowed = await as.outsider.post("/api/slip-tests", { ...baseTest(), result: "slipped", force: 6.5, forceUnit: "kN" });
    expect((await borrowed.json()).fieldErrors.deviceModelId).toBeDefined();
    const traced = tests.find((t: { traceUploadId: string | null }) => t.traceUploadId);
    expect((await as.outsider.get(`/api/uploads/${traced.traceUploadId}`)).status).toBe(404);
  });

  it("serves the demo crew's seeded traces from the bucket, and answers missing bytes with 404 and the reason, never 500", async () => {
    const demo = await AppClient.signedIn(DEMO_PEOPLE.find((p) => p.role === "rigger")!.email, DEMO_PASSWORD);
    const { tests } = await (await demo.get("/api/slip-tests")).json();
    const traced = tests.find((t: { traceUploadId: string | null }) => t.traceUploadId);
    const response = await demo.get(`/api/uploads/${traced.traceUploadId}`);
    expect(response.status).toBe(200);
    expect((await response.text()).split("\n").length).toBeGreaterThan(100);
    const row = testDb("uploads").where({ id: traced.traceUploadId });
    const { storage_key: storedKey } = await row.clone().first("storage_key");
    await row.clone().update({ storage_key: "missing/never-stored" });
    try {
      const missing = await demo.get(`/api/uploads/${traced.traceUploadId}`);
      expect(missing.status).toBe(404);
      expect((await missing.json()).error).toMatch(/are not in storage; its recorded analysis is kept/);
    } finally {
      await row.clone().update({ storage_key: storedKey });
    }
  });

  it("lets only a lead publish a read-only link that shows the table and nothing else, until revoked", async () => {
    expect((await as.rigger.post("/api/slip-table/link")).status).toBe(403);
    const published = await as.lead.post("/api/slip-table/link");
    expect(published.status).toBe(201);
    const { token, url } = await published.json();
    expect(url).toMatch(new RegExp(`/shared/slip-table/${token}$`));
    const page = await new AppClient().get(`/shared/slip-table/${token}`);
    expect(page.status).toBe(200);
    const html = await page.text();
    expect(html).toContain("Bench cam");
    expect(html).toContain(crew.name);
    expect(html).not.toContain(crew.people.rigger.name);
    expect(html).not.toContain("Sheath slipped first");
    expect((await new AppClient().get("/shared/slip-table/not-a-real-token-at-all-000")).status).toBe(404);
    const again = await (await as.lead.post("/api/slip-table/link")).json();
    expect((await new AppClient().get(`/shared/slip-table/${token}`)).status).toBe(404);
    expect((await as.lead.delete("/api/slip-table/link")).status).toBe(200);
    expect((await new AppClient().get(`/shared/slip-table/${again.token}`)).status).toBe(404);
  });
});
