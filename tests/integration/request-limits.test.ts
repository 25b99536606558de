import fs from "node:fs";
import path from "node:path";
import { afterAll, describe, expect, it } from "vitest";
import { AppClient } from "./support/http";
import { createCrew, FIXTURE_PASSWORD, testDb } from "./support/fixtures";

// Unbounded work per request: every body is counted as it arrives and refused past its cap with a JSON 413,
// JSON is refused past a nesting depth before it is parsed, and the engine's lists are bounded.
afterAll(() => testDb.destroy());

const MiB = 1024 * 1024;
const example = JSON.parse(fs.readFileSync(path.join(process.cwd(), "physics/examples/quarry-highline.json"), "utf8"));
const stretchPoints = (n: number) => Array.from({ length: n }, (_, i) => ({ tensionKN: i, elongationPct: i / 100 }));
const json = { "content-type": "application/json" };

/** `bytes` spaces as a stream, so that the request is chunked with no Content-Length. */
function chunkedBody(bytes: number): ReadableStream<Uint8Array> {
  const chunk = new Uint8Array(64 * 1024).fill(0x20);
  let sent = 0;
  return new ReadableStream({
    pull(controller) {
      if (sent >= bytes) return controller.close();
      controller.enqueue(chunk);
      sent += chunk.byteLength;
    },
  });
}

describe("bounded request bodies", () => {
  it("refuses a JSON body over 1 MiB with a JSON 413, announced or chunked", async () => {
    const anyone = new AppClient();
    const announced = await anyone.post("/api/auth/sign-in", " ".repeat(2 * MiB), json);
    expect(announced.status).toBe(413);
    expect((await announced.json()).error).toMatch(/at most 1 MiB/);
    const chunked = await anyone.post("/api/auth/sign-in", chunkedBody(100 * MiB), json);
    expect(chunked.status).toBe(413);
    expect((await chunked.json()).error).toMatch(/at most 1 MiB/);
  });

  it("refuses an upload with no length once it passes the cap of its purpose", async () => {
    const crew = await createCrew("limits-upload");
    const rigger = await AppClient.signedIn(crew.people.rigger.email, FIXTURE_PASSWORD);
    const chunked = await rigger.post("/api/slip-tests/traces", chunkedBody(80 * MiB), { "content-type": "multipart/form-data; boundary=x" });
    expect(chunked.status).toBe(413);
    expect((await chunked.json()).error).toMatch(/trace files may be at most 64 MiB/);
  });

  it("refuses JSON nested deeper than any form sends, and bounds the engine's lists", async () => {
    const crew = await createCrew("limits-compute");
    const member = await AppClient.signedIn(crew.people.member.email, FIXTURE_PASSWORD);
    const deep = await member.post("/api/compute", "[".repeat(100_000) + "]".repeat(100_000), json);
    expect(deep.status).toBe(400);
    expect((await deep.json()).error).toMatch(/more than 32 levels deep/);
    const many = await member.post("/api/compute", { ...example, mainline: { ...example.mainline, stretchPoints: stretchPoints(60) } });
    expect(many.status).toBe(400);
    const body = await many.json();
    expect(body.allowed).toBe("at most 50 points");
    expect(body.error).toMatch(/^The engine cannot check this rig\. .*: allowed is at most 50 points\.$/);
    const huge = await member.post("/api/compute", { ...example, mainline: { ...example.mainline, stretchPoints: stretchPoints(200_000) } });
    expect(huge.status).toBe(413);
  });

  it("refuses bad JSON text to the engine (now checked on its worker thread) with the refusals every route gives", async () => {
    const crew = await createCrew("limits-compute-text");
    const member = await AppClient.signedIn(crew.people.member.email, FIXTURE_PASSWORD);
    const cases: [string, RegExp][] = [
      ['{"name": ', /^The request body is not valid JSON\.$/],
      [JSON.stringify({ ...example, name: "Quarry\u0000" }), /NUL character \(code 0\)/],
      ['{"name": "Quarry \\ud800"}', /half of a character/],
    ];
    for (const [body, message] of cases) {
      const refused = await member.post("/api/compute", body, json);
      expect(refused.status).toBe(400);
      expect((await refused.json()).error).toMatch(message);
    }
  });
});
