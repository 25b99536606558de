import { afterAll, beforeAll, describe, expect, it } from "vitest";
import pg from "pg";
import { openDatabase, migrateAndSeed } from "@/scripts/services/migrate";

// A scratch database of its own, so rolling back never touches the one the other suites use.
const base = new URL(process.env.DATABASE_URL ?? "");
const scratchName = `spanwright_scratch_${process.pid}`;
const scratchUrl = Object.assign(new URL(base.href), { pathname: `/${scratchName}` }).href;

async function admin(sql: string) {
  const client = new pg.Client({ connectionString: Object.assign(new URL(base.href), { pathname: "/postgres" }).href });
  await client.connect();
  try {
    await client.query(sql);
  } finally {
    await client.end();
  }
}

beforeAll(() => admin(`CREATE DATABASE "${scratchName}"`));
afterAll(() => admin(`DROP DATABASE IF EXISTS "${scratchName}" WITH (FORCE)`));

describe("migrations", () => {
  it("roll forward, back to zero, and forward again", async () => {
    const database = openDatabase(scratchUrl);
    try {
      const [, applied] = await database.migrate.latest();
      expect(applied.length).toBeGreaterThan(0);
      await database.migrate.rollback(undefined, true);
      expect(await database.migrate.currentVersion()).toBe("none");
      expect(await database.schema.hasTable("crews")).toBe(false);
      const [, again] = await database.migrate.latest();
      expect(again).toEqual(applied);
    } finally {
      await database.destroy();
    }
  });

  it("seed the demo crew into an empty database only, never twice", async () => {
    await migrateAndSeed(scratchUrl);
    const second = await migrateAndSeed(scratchUrl);
    expect(second.seeded).toBe(false);
    const database = openDatabase(scratchUrl);
    try {
      const crews = await database("crews").count<{ count: string }[]>({ count: "*" });
      expect(Number(crews[0].count)).toBe(1);
    } finally {
      await database.destroy();
    }
  });
});
