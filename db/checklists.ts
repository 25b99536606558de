import "server-only";
import crypto from "node:crypto";
import type { Knex } from "knex";
import { db } from "./knex";
import { recordStep, type Actor } from "./audit-log";
import { insertOnce, landedBefore } from "./idempotent";

// The crew's on-site checklist and its runs on signed-off revisions. A run keeps the items as they
// read when it started; each tick is kept with who made it and when, and an item reads its latest tick.

export interface ChecklistItem {
  id: string;
  text: string;
}

export interface ItemState extends ChecklistItem {
  checked: boolean;
  tickedBy: string | null;
  tickedAt: string | null;
}

export interface ChecklistRun {
  id: string;
  revisionId: string;
  startedByName: string;
  startedAt: string;
  items: ItemState[];
}

export async function checklistTemplate(crewId: string): Promise<{ items: ChecklistItem[]; updatedAt: string | null }> {
  const row = await db("checklist_templates").where({ crew_id: crewId }).first("items", db.raw('updated_at as "updatedAt"'));
  return row ? { items: row.items, updatedAt: row.updatedAt } : { items: [], updatedAt: null };
}

/** Replaces the crew's items (an item keeps its id while its text is edited, so runs started before still read it). */
export async function saveChecklistTemplate(crewId: string, actor: Actor, items: { id?: string; text: string }[]): Promise<ChecklistItem[]> {
  const withIds = items.map((item) => ({ id: item.id ?? crypto.randomUUID(), text: item.text }));
  await db.transaction(async (trx) => {
    await trx("checklist_templates")
      .insert({ crew_id: crewId, items: JSON.stringify(withIds), updated_by: actor.id, updated_at: trx.fn.now() })
      .onConflict("crew_id")
      .merge();
    await recordStep(trx, actor, { crewId, action: "checklist_changed", detail: { items: withIds.length } });
  });
  return withIds;
}

export type OnSiteWrite<T> = { outcome: "done"; value: T; replayed: boolean } | { outcome: "not_found" } | { outcome: "refused"; message: string };

/** The revision's state, locked against a sign-off superseding it while an on-site write lands. */
export async function lockedRevisionState(trx: Knex.Transaction, crewId: string, rigId: string, revisionId: string) {
  return (
    (await trx("rig_revisions")
      .where({ crew_id: crewId, rig_id: rigId, id: revisionId })
      .forShare()
      .first("id", "number", "state", "inputs", "mainline_name")) ?? null
  );
}

/** Why on-site work may not be recorded on a revision: only the signed-off revision is rigged. */
export function onSiteRefusal(revision: { number: number; state: string }, what: string): string | null {
  if (revision.state === "signed_off") return null;
  if (revision.state === "superseded") return `Revision ${revision.number} has been superseded by a newer sign-off: ${what} on the signed-off revision.`;
  return `Revision ${revision.number} is not signed off: ${what} only on a signed-off revision, the one that is rigged.`;
}

export function startRun(crewId: string, rigId: string, revisionId: string, actor: Actor, idempotencyKey: string | null): Promise<OnSiteWrite<string>> {
  return db.transaction(async (trx) => {
    const revision = await lockedRevisionState(trx, crewId, rigId, revisionId);
    if (!revision) return { outcome: "not_found" };
    const earlier = await landedBefore<{ id: string }>(trx, "checklist_runs", crewId, idempotencyKey);
    if (earlier) return { outcome: "done", value: earlier.id, replayed: true };
    const refusal = onSiteRefusal(revision, "run the checklist");
    if (refusal) return { outcome: "refused", message: refusal };
    const template = await trx("checklist_templates").where({ crew_id: crewId }).first("items");
    if (!template?.items.length) return { outcome: "refused", message: "The crew has no checklist yet: a lead writes it on the crew's Checklist page." };
    const { row, replayed } = await insertOnce<{ id: string }>(trx, "checklist_runs", {
      crew_id: crewId,
      rig_id: rigId,
      revision_id: revisionId,
      items: JSON.stringify(template.items),
      started_by_id: actor.id,
      started_by_name: actor.name,
      idempotency_key: idempotencyKey,
    });
    if (!replayed) await recordStep(trx, actor, { crewId, rigId, revisionId, action: "checklist_started", detail: { runId: row.id } });
    return { outcome: "done", value: row.id, replayed };
  });
}

export function tickItem(
  crewId: string,
  rigId: string,
  revisionId: string,
  runId: string,
  tick: { itemId: string; checked: boolean; idempotencyKey: string | null },
  actor: Actor,
): Promise<OnSiteWrite<null>> {
  return db.transaction(async (trx) => {
    const revision = await lockedRevisionState(trx, crewId, rigId, revisionId);
    const run = revision && (await trx("checklist_runs").where({ crew_id: crewId, id: runId, revision_id: revisionId }).first("items"));
    if (!revision || !run) return { outcome: "not_found" };
    if (await landedBefore(trx, "checklist_ticks", crewId, tick.idempotencyKey)) return { outcome: "done", value: null, replayed: true };
    const refusal = onSiteRefusal(revision, "tick the checklist");
    if (refusal) return { outcome: "refused", message: refusal };
    const item = (run.items as ChecklistItem[]).find((i) => i.id === tick.itemId);
    if (!item) return { outcome: "refused", message: "That item is not on this checklist: reload the rig to see the checklist as it was started." };
    const { replayed } = await insertOnce(trx, "checklist_ticks", {
      crew_id: crewId,
      run_id: runId,
      item_id: tick.itemId,
      checked: tick.checked,
      ticked_by_id: actor.id,
      ticked_by_name: actor.name,
      idempotency_key: tick.idempotencyKey,
    });
    if (!replayed) {
      await recordStep(trx, actor, { crewId, rigId, revisionId, action: "checklist_ticked", note: `${tick.checked ? "Ticked" : "Unticked"}: ${item.text}` });
    }
    return { outcome: "done", value: null, replayed };
  });
}

/** The runs on a revision, newest first, each item with its latest tick. */
export async function runsOf(crewId: string, revisionId: string): Promise<ChecklistRun[]> {
  const runs = await db("checklist_runs")
    .where({ crew_id: crewId, revision_id: revisionId })
    .orderBy("started_at", "desc")
    .select("id", db.raw('revision_id as "revisionId"'), db.raw('started_by_name as "startedByName"'), db.raw('started_at as "startedAt"'), "items");
  if (!runs.length) return [];
  const ticks = await db("checklist_ticks")
    .where({ crew_id: crewId })
    .whereIn(
      "run_id",
      runs.map((r) => r.id),
    )
    .orderBy("id")
    .select("run_id", "item_id", "checked", "ticked_by_name", "ticked_at");
  return runs.map((run) => {
    const latest = new Map<string, (typeof ticks)[number]>();
    for (const t of ticks) if (t.run_id === run.id) latest.set(t.item_id, t);
    return {
      ...run,
      items: (run.items as ChecklistItem[]).map((item) => {
        const t = latest.get(item.id);
        return { ...item, checked: t?.checked ?? false, tickedBy: t?.ticked_by_name ?? null, tickedAt: t?.ticked_at ?? null };
      }),
    };
  });
}
