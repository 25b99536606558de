import { execFile } from "node:child_process";
import path from "node:path";
import { promisify } from "node:util";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import example from "@/physics/examples/quarry-highline.json";
import { asServerUserCommand, ensurePostgresBinaries, serverStartArgs } from "@/scripts/services/postgres";
import { AppClient } from "../integration/support/http";
import { createCrew, FIXTURE_PASSWORD, testDb, type FixtureCrew } from "../integration/support/fixtures";
import { MODELS } from "../integration/support/samples";

// The database goes away in the middle of a load run and comes back: while it is down every request that needs
// it answers 503 with a message (never 500, never a dropped connection), the app heals by itself within 5 s of
// the database's return, every write is whole or absent, and the server never stops answering.

const run = promisify(execFile);
const DATA_DIR = process.env.PG_DATA_DIR;
const PORT = Number(new URL(process.env.DATABASE_URL ?? "postgres://x@127.0.0.1:1/x").port);
const WORKERS = 6;
const HEAL_LIMIT_MS = 5000;

async function pgCtl(args: string[]): Promise<void> {
  const [command, commandArgs] = asServerUserCommand(path.join(await ensurePostgresBinaries(), "pg_ctl"), args);
  await run(command, commandArgs);
}
/** A fast shutdown: PostgreSQL cuts every connection and rolls back what was in flight, as a crash or failover would. */
const stopDatabase = () => pgCtl(["stop", "-D", DATA_DIR!, "-m", "fast", "-w"]);
const startDatabase = () => pgCtl(serverStartArgs(DATA_DIR!, PORT, "test"));

type Kind = "health" | "list" | "model" | "rig";
interface Answer {
  kind: Kind;
  sentAt: number;
  status: number;
  error?: string;
  name?: string;
}

const wait = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));
const now = () => performance.now();

let crew: FixtureCrew;
let rigger: AppClient;
afterAll(() => testDb.destroy());
beforeAll(async () => {
  crew = await createCrew("faults");
  rigger = await AppClient.signedIn(crew.people.rigger.email, FIXTURE_PASSWORD);
});

/** One request of the mix: the health route, an authenticated list, and two writes, each named so it can be found. */
async function send(kind: Kind, serial: number): Promise<Answer> {
  const sentAt = now();
  const name = `Outage ${kind} ${serial}`;
  try {
    const response =
      kind === "health"
        ? await rigger.get("/api/health")
        : kind === "list"
          ? await rigger.get("/api/kit/models")
          : kind === "model"
            ? await rigger.post("/api/kit/models", { kind: "sling", notes: "", ...MODELS.sling, name })
            : await rigger.post("/api/rigs", { name, siteId: null, inputs: example });
    const text = await response.text();
    const error = response.status >= 400 ? (JSON.parse(text) as { error?: string }).error : undefined;
    return { kind, sentAt, status: response.status, error, name };
  } catch (failure) {
    // The server dropped the connection or is gone: status 0.
    return { kind, sentAt, status: 0, error: String(failure), name };
  }
}

describe.skipIf(!DATA_DIR)("PostgreSQL stopped in the middle of a load run", () => {
  const answers: Answer[] = [];
  let stoppedAt = 0;
  let startedAt = 0;

  beforeAll(async () => {
    let running = true;
    let serial = 0;
    const kinds: Kind[] = ["health", "list", "model", "rig"];
    const workers = Array.from({ length: WORKERS }, async () => {
      while (running) {
        const n = serial++;
        answers.push(await send(kinds[n % kinds.length], n));
      }
    });
    await wait(2000);
    await stopDatabase();
    stoppedAt = now();
    await wait(4000);
    await startDatabase();
    startedAt = now();
    await wait(HEAL_LIMIT_MS + 3000);
    running = false;
    await Promise.all(workers);
  }, 60_000);

  it("never answers 5xx other than 503, never drops a connection, and says why while the database is down", () => {
    const down = answers.filter((a) => a.sentAt > stoppedAt && a.sentAt < startedAt - 500);
    expect(down.length).toBeGreaterThan(20);
    for (const answer of answers) {
      expect(answer.status, JSON.stringify(answer)).not.toBe(0);
      if (answer.status >= 500) {
        expect(answer.status, JSON.stringify(answer)).toBe(503);
        expect(answer.error, JSON.stringify(answer)).toMatch(/database is not answering.*Try again/);
      }
    }
    // Every request needs the database (the session at least), so each is refused while it is down.
    expect(down.filter((a) => a.status !== 503).map((a) => `${a.kind} ${a.status}`)).toEqual([]);
  });

  it(`heals by itself within ${HEAL_LIMIT_MS / 1000} s of the database's return`, () => {
    const afterStart = answers.filter((a) => a.sentAt >= startedAt).sort((a, b) => a.sentAt - b.sentAt);
    // The first request from which every later one succeeded.
    let healed = afterStart.length;
    while (healed > 0 && afterStart[healed - 1].status < 400) healed--;
    expect(healed, "some request failed at the end of the run").toBeLessThan(afterStart.length);
    const healMs = healed === 0 ? 0 : afterStart[healed].sentAt - startedAt;
    console.log(`faults: ${answers.length} requests; healed ${Math.round(healMs)} ms after PostgreSQL was back`);
    expect(healMs).toBeLessThanOrEqual(HEAL_LIMIT_MS);
  });

  it("keeps every write whole or absent: a 201 is stored with all its rows, one refused while the database was down left nothing", async () => {
    const writes = answers.filter((a) => a.kind === "model" || a.kind === "rig");
    const models = new Set((await testDb("gear_models").where({ crew_id: crew.id }).select("name")).map((r) => r.name as string));
    const rigs = new Set((await testDb("rigs").where({ crew_id: crew.id }).select("name")).map((r) => r.name as string));
    for (const write of writes) {
      const stored = (write.kind === "model" ? models : rigs).has(write.name!);
      if (write.status === 201) expect(stored, JSON.stringify(write)).toBe(true);
      // A write in flight as the database stopped may have committed with its answer lost; one sent while it was down cannot have.
      else if (write.sentAt > stoppedAt && write.sentAt < startedAt) expect(stored, JSON.stringify(write)).toBe(false);
    }
    const [{ bare }] = await testDb("rigs")
      .where({ crew_id: crew.id })
      .whereNotExists(testDb("rig_revisions").whereRaw("rig_revisions.rig_id = rigs.id"))
      .count<{ bare: string }[]>({ bare: "*" });
    expect(Number(bare), "rigs stored without their first revision").toBe(0);
    expect(writes.filter((w) => w.status === 201).length).toBeGreaterThan(10);
  });

  it("keeps the server running: it answers as before once the database is back", async () => {
    const health = await rigger.get("/api/health");
    expect(health.status).toBe(200);
    expect((await rigger.get("/api/kit/models")).status).toBe(200);
  });
});
