import "server-only";
import { db } from "./knex";
import { recordStep, type Actor } from "./audit-log";
import { insertOnce, landedBefore } from "./idempotent";
import { lockedRevisionState, onSiteRefusal, type OnSiteWrite } from "./checklists";
import type { ReadingBody } from "@/lib/validations/review";
import type { Prediction } from "@/lib/review/reading-prediction";

// Load-cell readings on site, each against the revision rigged, with the engine's prediction for it.

export interface TensionReading {
  id: string;
  rigId: string;
  rigName: string;
  revisionId: string;
  revisionNumber: number;
  kind: "pretension" | "walker";
  anchor: "a" | "b";
  measuredN: number;
  sagM: number | null;
  walkerMassKg: number | null;
  walkerPositionM: number | null;
  predictedN: number;
  engineVersion: string;
  mainlineName: string;
  note: string;
  recordedByName: string;
  recordedAt: string;
}

const readingColumns = [
  "tension_readings.id",
  db.raw('tension_readings.rig_id as "rigId"'),
  db.raw('rigs.name as "rigName"'),
  db.raw('tension_readings.revision_id as "revisionId"'),
  db.raw('rig_revisions.number as "revisionNumber"'),
  "tension_readings.kind",
  "tension_readings.anchor",
  db.raw('tension_readings.measured_n as "measuredN"'),
  db.raw('tension_readings.sag_m as "sagM"'),
  db.raw('tension_readings.walker_mass_kg as "walkerMassKg"'),
  db.raw('tension_readings.walker_position_m as "walkerPositionM"'),
  db.raw('tension_readings.predicted_n as "predictedN"'),
  db.raw('tension_readings.engine_version as "engineVersion"'),
  db.raw('tension_readings.mainline_name as "mainlineName"'),
  "tension_readings.note",
  db.raw('tension_readings.recorded_by_name as "recordedByName"'),
  db.raw('tension_readings.recorded_at as "recordedAt"'),
];

const readings = (crewId: string) =>
  db("tension_readings")
    .join("rig_revisions", function () {
      this.on("rig_revisions.id", "=", "tension_readings.revision_id").andOn("rig_revisions.crew_id", "=", "tension_readings.crew_id");
    })
    .join("rigs", function () {
      this.on("rigs.id", "=", "tension_readings.rig_id").andOn("rigs.crew_id", "=", "tension_readings.crew_id");
    })
    .where("tension_readings.crew_id", crewId);

export function readingsOfRevision(crewId: string, revisionId: string): Promise<TensionReading[]> {
  return readings(crewId).where("tension_readings.revision_id", revisionId).orderBy("tension_readings.recorded_at", "desc").select(readingColumns);
}

/** Every reading of the crew, for the chart of predicted against measured per mainline. */
export function crewReadings(crewId: string): Promise<TensionReading[]> {
  return readings(crewId).orderBy(["tension_readings.mainline_name", "tension_readings.recorded_at"]).select(readingColumns);
}

export async function findReading(crewId: string, id: string): Promise<TensionReading> {
  return readings(crewId).where("tension_readings.id", id).first(readingColumns);
}

/** Records a reading on a signed-off revision; `predict` gives the engine's figure from the revision's inputs. */
export async function recordReading(
  crewId: string,
  rigId: string,
  revisionId: string,
  reading: ReadingBody,
  actor: Actor,
  predict: (inputs: Record<string, unknown>) => Prediction,
  engineVersion: string,
): Promise<OnSiteWrite<string> | { outcome: "unpredictable"; field: string; message: string }> {
  return db.transaction(async (trx) => {
    const revision = await lockedRevisionState(trx, crewId, rigId, revisionId);
    if (!revision) return { outcome: "not_found" };
    const earlier = await landedBefore<{ id: string }>(trx, "tension_readings", crewId, reading.idempotencyKey ?? null);
    if (earlier) return { outcome: "done", value: earlier.id, replayed: true };
    const refusal = onSiteRefusal(revision, "readings are recorded");
    if (refusal) return { outcome: "refused", message: refusal };
    const prediction = predict(revision.inputs);
    if (prediction.kind === "refused") return { outcome: "unpredictable", field: prediction.field, message: prediction.message };
    const { row, replayed } = await insertOnce<{ id: string }>(trx, "tension_readings", {
      crew_id: crewId,
      rig_id: rigId,
      revision_id: revisionId,
      kind: reading.kind,
      anchor: reading.anchor,
      measured_n: reading.measuredN,
      sag_m: reading.kind === "pretension" ? reading.sagM : null,
      walker_mass_kg: reading.kind === "walker" ? reading.walkerMassKg : null,
      walker_position_m: reading.kind === "walker" ? reading.walkerPositionM : null,
      predicted_n: prediction.tensionN,
      engine_version: engineVersion,
      mainline_name: revision.mainline_name,
      note: reading.note,
      recorded_by_id: actor.id,
      recorded_by_name: actor.name,
      idempotency_key: reading.idempotencyKey ?? null,
    });
    if (!replayed) await recordStep(trx, actor, { crewId, rigId, revisionId, action: "reading_recorded", detail: { readingId: row.id } });
    return { outcome: "done", value: row.id, replayed };
  });
}
