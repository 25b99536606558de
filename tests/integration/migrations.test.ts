import { afterAll, beforeAll, describe, expect, it } from "vitest";
import pg from "pg";
import { openDatabase, migrateAndSeed } from "@/scripts/services/migrate";
import { createCrew, testDb } from "./support/fixtures";

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
afterAll(async () => {
  await admin(`DROP DATABASE IF EXISTS "${scratchName}" WITH (FORCE)`);
  await testDb.destroy();
});

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

describe("the schema keeps each crew's Kit to itself", () => {
  /** The database's refusal of a statement, or null when it went through. */
  const refusal = (statement: Promise<unknown>) =>
    statement.then(
      () => null,
      (error: Error) => error.message,
    );

  it("refuses an item, an inspection, a file or a slip test of one crew on another crew's gear, and keeps a crew's own", async () => {
    const [mine, theirs] = [await createCrew("keys-mine"), await createCrew("keys-theirs")];
    const model = async (crewId: string) =>
      (await testDb("gear_models").insert({ crew_id: crewId, kind: "brake", name: "Key test cam", specs: {} }).returning("id"))[0].id as string;
    const [myModel, theirModel] = [await model(mine.id), await model(theirs.id)];
    const item = (crewId: string, modelId: string) =>
      testDb("gear_items")
        .insert({ crew_id: crewId, model_id: modelId, label: `K-${crewId.slice(0, 8)}`, in_service_since: "2026-01-01" })
        .returning("id");
    const myItem = (await item(mine.id, myModel))[0].id as string;
    const test = (crewId: string, over: Record<string, string>) =>
      testDb("slip_tests").insert({
        crew_id: crewId,
        device_model_id: myModel,
        rope_diameter_mm: 10.5,
        result: "held",
        force_n: 6000,
        force_unit: "kN",
        tested_on: "2026-11-20",
        tested_by: mine.people.owner.id,
        ...over,
      });

    const foreignKey = /violates foreign key constraint "\w+_crew_id_\w+_foreign"/;
    expect(await refusal(item(theirs.id, myModel))).toMatch(foreignKey);
    expect(
      await refusal(
        testDb("gear_inspections").insert({
          crew_id: theirs.id,
          item_id: myItem,
          inspected_on: "2026-11-01",
          result: "pass",
          inspected_by: theirs.people.owner.id,
        }),
      ),
    ).toMatch(foreignKey);
    expect(
      await refusal(
        testDb("uploads").insert({
          crew_id: theirs.id,
          item_id: myItem,
          purpose: "photo",
          file_name: "x.png",
          content_type: "image/png",
          byte_size: 1,
          sha256: "0",
          storage_key: "k",
          uploaded_by: theirs.people.owner.id,
        }),
      ),
    ).toMatch(foreignKey);
    expect(await refusal(test(theirs.id, { device_model_id: myModel }))).toMatch(foreignKey);
    expect(await refusal(test(mine.id, { rope_model_id: theirModel }))).toMatch(foreignKey);
    expect(await refusal(test(mine.id, {}))).toBeNull();
  });
});
