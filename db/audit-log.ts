import "server-only";
import type { Knex } from "knex";
import { db } from "./knex";
import type { AuditAction } from "@/lib/review/steps";

// The append-only record of each step of a rig's life (a trigger refuses UPDATE and DELETE).

export interface Actor {
  id: string;
  name: string;
}

export interface AuditStep {
  crewId: string;
  rigId?: string | null;
  revisionId?: string | null;
  action: AuditAction;
  note?: string | null;
  detail?: Record<string, unknown> | null;
}

export interface AuditEntry {
  id: string;
  revisionId: string | null;
  revisionNumber: number | null;
  actorName: string;
  action: AuditAction;
  note: string | null;
  at: string;
}

/** Records one step, on the caller's transaction so it lands with the change it describes. */
export async function recordStep(trx: Knex | Knex.Transaction, actor: Actor, step: AuditStep): Promise<void> {
  await trx("audit_log").insert({
    crew_id: step.crewId,
    rig_id: step.rigId ?? null,
    revision_id: step.revisionId ?? null,
    actor_id: actor.id,
    actor_name: actor.name,
    action: step.action,
    note: step.note ?? null,
    detail: step.detail ? JSON.stringify(step.detail) : null,
  });
}

/** A rig's steps, newest first. */
export function rigAuditLog(crewId: string, rigId: string): Promise<AuditEntry[]> {
  return db("audit_log")
    .leftJoin("rig_revisions", function () {
      this.on("rig_revisions.id", "=", "audit_log.revision_id").andOn("rig_revisions.crew_id", "=", "audit_log.crew_id");
    })
    .where({ "audit_log.crew_id": crewId, "audit_log.rig_id": rigId })
    .orderBy("audit_log.id", "desc")
    .select(
      db.raw("audit_log.id::text as id"),
      db.raw('audit_log.revision_id as "revisionId"'),
      db.raw('rig_revisions.number as "revisionNumber"'),
      db.raw('audit_log.actor_name as "actorName"'),
      "audit_log.action",
      "audit_log.note",
      "audit_log.at",
    );
}

/** The note of the latest submission of a revision, and who submitted it. */
export async function latestSubmission(
  crewId: string,
  revisionId: string,
  trx: Knex | Knex.Transaction = db,
): Promise<{ actorId: string; actorName: string; note: string | null; at: string } | null> {
  const row = await trx("audit_log")
    .where({ crew_id: crewId, revision_id: revisionId, action: "submitted" })
    .orderBy("id", "desc")
    .first(db.raw('actor_id as "actorId"'), db.raw('actor_name as "actorName"'), "note", "at");
  return row ?? null;
}
