import "server-only";
import { db } from "./knex";
import type { SlipTest } from "@/lib/validations/slip-tests";
import { toSlipResults, type SlipTableTest } from "@/lib/slip-table";
import type { ForceUnit, SlipOnset, SlipResult } from "@/physics";

// Slip tests and the read-only links to a crew's slip table. Every query is scoped by crew id.

export interface SlipTestRow extends SlipTableTest {
  ropeModelId: string | null;
  ropeModelName: string | null;
  forceUnit: ForceUnit;
  testedOn: string;
  testerName: string;
  notes: string;
  traceUploadId: string | null;
  detectedResult: "slipped" | "held" | null;
  detectedForceN: number | null;
}

const columns = [
  "slip_tests.id",
  db.raw('slip_tests.device_model_id as "deviceId"'),
  db.raw('device.name as "deviceName"'),
  db.raw('slip_tests.rope_model_id as "ropeModelId"'),
  db.raw('rope.name as "ropeModelName"'),
  db.raw('slip_tests.rope_diameter_mm::float8 as "ropeDiameterMm"'),
  "slip_tests.result",
  db.raw('slip_tests.force_n as "forceN"'),
  db.raw('slip_tests.force_unit as "forceUnit"'),
  db.raw('slip_tests.tested_on::text as "testedOn"'),
  db.raw('users.name as "testerName"'),
  "slip_tests.notes",
  db.raw('slip_tests.trace_upload_id as "traceUploadId"'),
  db.raw('slip_tests.detected_result as "detectedResult"'),
  db.raw('slip_tests.detected_force_n as "detectedForceN"'),
];

const testsOf = (crewId: string) =>
  db("slip_tests")
    .join({ device: "gear_models" }, "device.id", "slip_tests.device_model_id")
    .leftJoin({ rope: "gear_models" }, "rope.id", "slip_tests.rope_model_id")
    .join("users", "users.id", "slip_tests.tested_by")
    .where("slip_tests.crew_id", crewId);

export interface SlipTestFilter {
  deviceId?: string;
  ropeDiameterMm?: number;
}

export function listSlipTests(crewId: string, filter: SlipTestFilter = {}): Promise<SlipTestRow[]> {
  const query = testsOf(crewId)
    .select(columns)
    .orderBy([
      { column: "slip_tests.tested_on", order: "desc" },
      { column: "slip_tests.created_at", order: "desc" },
    ]);
  if (filter.deviceId) query.where("slip_tests.device_model_id", filter.deviceId);
  if (filter.ropeDiameterMm !== undefined) query.where("slip_tests.rope_diameter_mm", filter.ropeDiameterMm);
  return query;
}

/** The crew's bench results as the engine's brake check reads them: what the planner passes to checkBrake. */
export async function benchResults(crewId: string): Promise<SlipResult[]> {
  return toSlipResults(await listSlipTests(crewId));
}

export async function findSlipTest(crewId: string, id: string): Promise<SlipTestRow | null> {
  return (await testsOf(crewId).where("slip_tests.id", id).first(columns)) ?? null;
}

export interface NewSlipTest extends Omit<SlipTest, "force"> {
  forceN: number;
  testedBy: string;
  detected: { onset: SlipOnset; engineVersion: string } | null;
}

export async function insertSlipTest(crewId: string, test: NewSlipTest): Promise<SlipTestRow> {
  const [{ id }] = await db("slip_tests")
    .insert({
      crew_id: crewId,
      device_model_id: test.deviceModelId,
      rope_model_id: test.ropeModelId ?? null,
      rope_diameter_mm: test.ropeDiameterMm,
      result: test.result,
      force_n: test.forceN,
      force_unit: test.forceUnit,
      tested_on: test.testedOn,
      tested_by: test.testedBy,
      notes: test.notes,
      trace_upload_id: test.traceUploadId ?? null,
      detected_result: test.detected?.onset.kind ?? null,
      detected_force_n: test.detected?.onset.forceN ?? null,
      engine_version: test.detected?.engineVersion ?? null,
    })
    .returning("id");
  return (await findSlipTest(crewId, id))!;
}

/** Publishes a new read-only link to the crew's slip table by its token's hash, revoking any earlier link. */
export async function publishSlipTable(crewId: string, userId: string, tokenHash: string): Promise<void> {
  await db.transaction(async (trx) => {
    // The crew's row is locked first, so that parallel publishing takes turns and leaves one live link.
    await trx("crews").where({ id: crewId }).forUpdate().first("id");
    await trx("slip_table_links").where({ crew_id: crewId }).whereNull("revoked_at").update({ revoked_at: trx.fn.now() });
    await trx("slip_table_links").insert({ crew_id: crewId, token_sha256: tokenHash, created_by: userId });
  });
}

export async function revokeSlipTable(crewId: string): Promise<number> {
  return db("slip_table_links").where({ crew_id: crewId }).whereNull("revoked_at").update({ revoked_at: db.fn.now() });
}

export async function slipTableLinkOf(crewId: string): Promise<{ createdAt: string; createdBy: string } | null> {
  const row = await db("slip_table_links")
    .join("users", "users.id", "slip_table_links.created_by")
    .where({ "slip_table_links.crew_id": crewId })
    .whereNull("slip_table_links.revoked_at")
    .first(db.raw('slip_table_links.created_at as "createdAt"'), db.raw('users.name as "createdBy"'));
  return row ?? null;
}

/** The crew behind a live link, by its token's hash; null for an unknown or revoked one. */
export async function crewOfSlipTableLink(tokenHash: string): Promise<{ id: string; name: string; units: "si" | "us" } | null> {
  const row = await db("slip_table_links")
    .join("crews", "crews.id", "slip_table_links.crew_id")
    .where({ "slip_table_links.token_sha256": tokenHash })
    .whereNull("slip_table_links.revoked_at")
    .first("crews.id", "crews.name", "crews.units");
  return row ?? null;
}
