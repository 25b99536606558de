import "server-only";
import type { Knex } from "knex";

/**
 * Inserts a row once per idempotency key: a write replayed with the same key (a phone resending what it
 * queued offline) finds the row the first one made and changes nothing.
 */
export async function insertOnce<Row>(trx: Knex.Transaction, table: string, row: Record<string, unknown>): Promise<{ row: Row; replayed: boolean }> {
  const [inserted] = await trx(table).insert(row).onConflict(["crew_id", "idempotency_key"]).ignore().returning("*");
  if (inserted) return { row: inserted as Row, replayed: false };
  const existing = await trx(table).where({ crew_id: row.crew_id, idempotency_key: row.idempotency_key }).first();
  return { row: existing as Row, replayed: true };
}

/**
 * The row a write with this key made earlier, if it landed: its replay answers "landed before" even when
 * the revision has moved on since (superseded, say), instead of a refusal for a write that is in fact kept.
 */
export async function landedBefore<Row>(trx: Knex.Transaction, table: string, crewId: string, idempotencyKey: string | null): Promise<Row | null> {
  if (!idempotencyKey) return null;
  return ((await trx(table).where({ crew_id: crewId, idempotency_key: idempotencyKey }).first()) as Row | undefined) ?? null;
}
