import crypto from "node:crypto";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { AppClient } from "./support/http";
import { createCrew, createPerson, FIXTURE_PASSWORD, testDb, type FixtureCrew } from "./support/fixtures";

// Pages answer with real HTTP statuses (DEVELOPERS.md, "Pages answer with real statuses"): a page that checks
// access or looks a row up does so before anything streams, so a missing row is a 404, not a 200 page saying 404.
let crew: FixtureCrew;
let other: FixtureCrew;
const as: Record<string, AppClient> = {};
let modelId: string;
let theirModelId: string;

beforeAll(async () => {
  crew = await createCrew("pages");
  other = await createCrew("pages-other");
  for (const role of ["member", "rigger"] as const) as[role] = await AppClient.signedIn(crew.people[role].email, FIXTURE_PASSWORD);
  as.outsider = await AppClient.signedIn(other.people.rigger.email, FIXTURE_PASSWORD);
  modelId = (await (await as.rigger.post("/api/kit/models", { kind: "sling", name: "Page sling", specs: { mbsKN: 40 } })).json()).model.id;
  theirModelId = (await (await as.outsider.post("/api/kit/models", { kind: "sling", name: "Their sling", specs: { mbsKN: 40 } })).json()).model.id;
});

afterAll(() => testDb.destroy());

describe("a page for a row", () => {
  const unknown = crypto.randomUUID();
  for (const path of [
    `/kit/models/${unknown}`,
    `/kit/models/${unknown}/edit`,
    `/kit/items/${unknown}`,
    `/slip-bench/tests/${unknown}`,
    `/rigs/${unknown}`,
    `/sites/${unknown}`,
    `/sites/${unknown}/edit`,
    "/kit/items/not-a-uuid",
  ]) {
    it(`answers 404 for ${path.replace(unknown, "an unknown id")}, on the branded page`, async () => {
      const response = await as.rigger.get(path);
      expect(response.status).toBe(404);
      expect(await response.text()).toContain("Nothing at this address");
    });
  }

  it("answers 404 for another crew's row, exactly as for a missing one", async () => {
    expect((await as.rigger.get(`/kit/models/${theirModelId}`)).status).toBe(404);
    expect((await as.rigger.get(`/kit/models/${modelId}`)).status).toBe(200);
  });

  it("answers 404 for an address the app does not have", async () => {
    const response = await as.member.get("/no-such-page");
    expect(response.status).toBe(404);
    expect(await response.text()).toContain("Nothing at this address");
  });
});

describe("a page that needs more than a member", () => {
  const pages = () => [
    ["/kit/new", "add and change gear in the Kit"],
    ["/slip-bench/new", "record slip tests and their traces"],
    [`/kit/models/${modelId}/edit`, "add and change gear in the Kit"],
    ["/rigs/new", "plan and save rigs"],
    ["/sites/new", "add and change sites"],
  ];
  it("tells a member what it needs and what they are, instead of an error", async () => {
    for (const [path, words] of pages()) {
      const html = await (await as.member.get(path)).text();
      expect(html).toContain(`Only riggers, leads and owners may ${words}; you are a member of ${crew.name}.`);
    }
  });
  it("opens for a rigger", async () => {
    for (const [path] of pages()) {
      const response = await as.rigger.get(path);
      expect(response.status).toBe(200);
      expect(await response.text()).not.toContain("Only riggers, leads and owners");
    }
  });
});

describe("a person in no crew", () => {
  it("is redirected to crew creation by a real redirect", async () => {
    const loner = await createPerson("loner");
    const client = await AppClient.signedIn(loner.email, FIXTURE_PASSWORD);
    const response = await client.get("/kit");
    expect(response.status).toBe(307);
    expect(response.headers.get("location")).toMatch(/\/crews\/new$/);
  });
});
