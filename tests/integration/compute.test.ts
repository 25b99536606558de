import fs from "node:fs";
import path from "node:path";
import { afterAll, describe, expect, it } from "vitest";
import { AppClient } from "./support/http";
import { createCrew, FIXTURE_PASSWORD, testDb } from "./support/fixtures";
import { evaluateRig } from "@/physics";

afterAll(() => testDb.destroy());

const example = JSON.parse(fs.readFileSync(path.join(process.cwd(), "physics/examples/quarry-highline.json"), "utf8"));

describe("POST /api/compute", () => {
  it("returns what the engine returns in the browser, for any member", async () => {
    const crew = await createCrew("compute");
    const member = await AppClient.signedIn(crew.people.member.email, FIXTURE_PASSWORD);
    const response = await member.post("/api/compute", example);
    expect(response.status).toBe(200);
    expect(await response.json()).toEqual(JSON.parse(JSON.stringify(evaluateRig(example))));
  });

  it("answers bad input with 400 naming the field, what was given and what is allowed", async () => {
    const crew = await createCrew("compute-bad");
    const rigger = await AppClient.signedIn(crew.people.rigger.email, FIXTURE_PASSWORD);
    const response = await rigger.post("/api/compute", { ...example, spanM: -5 });
    expect(response.status).toBe(400);
    const body = await response.json();
    expect(body.field).toBe("spanM");
    expect(body.given).toBe("-5");
    expect(body.allowed).toBeTruthy();
    expect(body.error).not.toMatch(/RigInputError/);
    expect((await rigger.post("/api/compute", "not json", { "content-type": "application/json" })).status).toBe(400);
  });

  it("is refused to someone not signed in", async () => {
    expect((await new AppClient().post("/api/compute", example)).status).toBe(401);
  });
});
