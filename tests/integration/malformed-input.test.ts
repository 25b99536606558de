import net from "node:net";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { AppClient } from "./support/http";
import { createCrew, FIXTURE_PASSWORD, testDb, type FixtureCrew } from "./support/fixtures";

// Requests that used to answer 500: each now gets a 4xx with a plain JSON message, and nothing is stored.
afterAll(() => testDb.destroy());

const DASHES = "-".repeat(36);
const PNG = Buffer.from("iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAYAAAAfFcSJAAAADUlEQVR42mP8z8BQDwAEhQGAhKmMIQAAAABJRU5ErkJggg==", "base64");
const sling = { kind: "sling", notes: "", name: "Test sling 120", specs: { mbsKN: 40 } };

let crew: FixtureCrew;
let owner: AppClient;
let rigger: AppClient;
beforeAll(async () => {
  crew = await createCrew("malformed");
  owner = await AppClient.signedIn(crew.people.owner.email, FIXTURE_PASSWORD);
  rigger = await AppClient.signedIn(crew.people.rigger.email, FIXTURE_PASSWORD);
});

const count = async (table: string) => Number((await testDb(table).where({ crew_id: crew.id }).count<{ count: string }[]>({ count: "*" }))[0].count);

async function expectJsonRefusal(response: Response, status: number, message: RegExp) {
  expect(response.status).toBe(status);
  expect(response.headers.get("content-type")).toMatch(/application\/json/);
  expect((await response.json()).error).toMatch(message);
}

describe("malformed input", () => {
  it("refuses a NUL character in stored text or in a file name, storing nothing and uploading nothing", async () => {
    await expectJsonRefusal(await rigger.post("/api/kit/models", { ...sling, name: "Sling\u0000" }), 400, /NUL character/);
    expect(await count("gear_models")).toBe(0);
    const { model } = await (await rigger.post("/api/kit/models", sling)).json();
    const form = new FormData();
    form.append("file", new Blob([PNG], { type: "image/png" }), "pad\u0000.png");
    form.append("modelId", model.id);
    await expectJsonRefusal(await rigger.post("/api/uploads?purpose=photo", form), 400, /NUL character/);
    expect(await count("uploads")).toBe(0);
  });

  it("refuses a date before 1900, such as the year 0, on its field", async () => {
    const { model } = await (await rigger.post("/api/kit/models", { ...sling, name: "Dated sling" })).json();
    const response = await rigger.post("/api/kit/items", { modelId: model.id, label: "D-1", inServiceSince: "0000-01-01" });
    expect(response.status).toBe(400);
    expect((await response.json()).fieldErrors.inServiceSince).toBe("In service since must be on or after 1900-01-01.");
  });

  it("treats an id of 36 dashes as naming nothing, in a path, a body and the crew cookie", async () => {
    await expectJsonRefusal(await rigger.get(`/api/kit/items/${DASHES}`), 404, /No such item/);
    await expectJsonRefusal(await rigger.switchCrew(DASHES), 404, /No crew of yours/);
    const withCookie = await fetch(new URL("/api/kit/models", rigger.baseUrl), {
      headers: { cookie: `spanwright_session=${await sessionOf(crew.people.rigger.id)}; spanwright_crew=${DASHES}` },
    });
    expect(withCookie.status).toBe(200);
    const page = await fetch(new URL("/kit", rigger.baseUrl), {
      headers: { cookie: `spanwright_session=${await sessionOf(crew.people.rigger.id)}; spanwright_crew=${DASHES}` },
      redirect: "manual",
    });
    expect(page.status).toBe(200);
  });

  it("answers a malformed %-escape or a NUL in the address with a JSON 400, and an unknown API address with a JSON 404", async () => {
    await expectJsonRefusal(await rigger.get("/api/kit/items/%ZZ"), 400, /malformed %-escape/);
    await expectJsonRefusal(await rigger.get("/api/rigs/%E0%A4%A"), 400, /malformed %-escape/);
    await expectJsonRefusal(await rigger.get("/api/rigs?q=%00"), 400, /NUL character/);
    await expectJsonRefusal(await rigger.get("/api/no-such-thing"), 404, /No such address/);
    await expectJsonRefusal(await rigger.request("PUT", "/api/compute", {}), 405, /does not take PUT requests/);
  });

  it("answers headers too large with a JSON 431", async () => {
    const { hostname, port } = new URL(rigger.baseUrl);
    const raw = await new Promise<string>((resolve, reject) => {
      const socket = net.connect(Number(port), hostname, () => socket.write(`GET /api/health HTTP/1.1\r\nHost: x\r\nX-Big: ${"a".repeat(40_000)}\r\n\r\n`));
      let text = "";
      socket.on("data", (chunk) => (text += chunk));
      socket.on("end", () => resolve(text));
      socket.on("error", reject);
    });
    expect(raw).toMatch(/^HTTP\/1\.1 431/);
    expect(raw).toMatch(/content-type: application\/json/i);
    expect(raw).toMatch(/"error":"The request's headers are too large/);
  });

  it("refuses an invitation to an address over 254 characters, storing no invitation", async () => {
    const response = await owner.post("/api/crew/invitations", { email: `${"a".repeat(300)}@fixture.example`, role: "member" });
    expect(response.status).toBe(400);
    expect((await response.json()).fieldErrors.email).toBe("Use an e-mail address of at most 254 characters.");
    expect(await count("invitations")).toBe(0);
  });

  it("withdraws an invitation whose mail the relay refuses, saying so on the address (RFC 2606: .invalid has no mailboxes)", async () => {
    const response = await owner.post("/api/crew/invitations", { email: "nobody@refused.invalid", role: "member" });
    expect(response.status).toBe(422);
    expect((await response.json()).fieldErrors.email).toBe(
      "The invitation mail could not be sent to this address, so no invitation was made: check the address and try again.",
    );
    expect(await count("invitations")).toBe(0);
    expect((await owner.get("/api/crew/invitations")).status).toBe(200);
  });
});

async function sessionOf(userId: string): Promise<string> {
  return (await testDb("sessions").where({ user_id: userId }).orderBy("created_at", "desc").first()).id;
}
