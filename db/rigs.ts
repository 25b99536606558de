import "server-only";
import type { Knex } from "knex";
import { db } from "./knex";
import type { RigResult } from "@/physics";
import type { RevisionMeta, RigListQuery } from "@/lib/validations/rigs";

export type { RevisionMeta };
import type { RevisionSnapshot } from "@/lib/planner/kit";
import { revisionRow, type NewRevision } from "@/lib/planner/revision-row";
import { recordStep, type Actor } from "./audit-log";

export type { NewRevision };

// Rigs and their revisions. A revision is written once and never changed (a trigger refuses it); a
// rig's current revision is its highest-numbered one. Every query is scoped by crew id.

export interface Revision extends RevisionMeta {
  rigId: string;
  inputs: Record<string, unknown>;
  snapshot: RevisionSnapshot;
  result: RigResult;
}

export interface RigRow {
  id: string;
  name: string;
  siteId: string | null;
  siteName: string | null;
  startedBy: string | null;
  createdAt: string;
  /** The signed-off revision this rig was started from, if it was. */
  reusedFromRevisionId: string | null;
  revisionCount: number;
  head: RevisionMeta;
}

const metaColumns = (table: string) => [
  `${table}.id`,
  `${table}.number`,
  `${table}.state`,
  db.raw(`${table}.based_on_id as "basedOnId"`),
  db.raw(`${table}.engine_version as "engineVersion"`),
  db.raw(`${table}.span_m as "spanM"`),
  db.raw(`${table}.mainline_name as "mainlineName"`),
  db.raw(`${table}.created_at as "createdAt"`),
  db.raw(`${table}.author_id as "authorId"`),
];

const revisionsOf = (crewId: string, rigId: string) =>
  db("rig_revisions").leftJoin("users", "users.id", "rig_revisions.author_id").where({ "rig_revisions.crew_id": crewId, "rig_revisions.rig_id": rigId });

export function listRevisions(crewId: string, rigId: string): Promise<RevisionMeta[]> {
  return revisionsOf(crewId, rigId)
    .select([...metaColumns("rig_revisions"), db.raw('users.name as "authorName"')])
    .orderBy("rig_revisions.number", "desc");
}

export async function findRevision(crewId: string, rigId: string, revisionId: string): Promise<Revision | null> {
  const row = await revisionsOf(crewId, rigId)
    .where("rig_revisions.id", revisionId)
    .first([
      ...metaColumns("rig_revisions"),
      db.raw('users.name as "authorName"'),
      db.raw('rig_revisions.rig_id as "rigId"'),
      "rig_revisions.inputs",
      "rig_revisions.snapshot",
      "rig_revisions.result",
    ]);
  return row ?? null;
}

async function headOf(trx: Knex | Knex.Transaction, crewId: string, rigId: string): Promise<{ id: string; number: number; state: string } | null> {
  return (await trx("rig_revisions").where({ crew_id: crewId, rig_id: rigId }).orderBy("number", "desc").first("id", "number", "state")) ?? null;
}

// The rigs list reads each rig with its current revision (the highest number) beside it.
function rigsWithHead(crewId: string) {
  return db("rigs")
    .joinRaw(`cross join lateral (select * from rig_revisions rr where rr.crew_id = rigs.crew_id and rr.rig_id = rigs.id order by rr.number desc limit 1) head`)
    .leftJoin("sites", function () {
      this.on("sites.id", "=", "rigs.site_id").andOn("sites.crew_id", "=", "rigs.crew_id");
    })
    .leftJoin({ starter: "users" }, "starter.id", "rigs.created_by")
    .leftJoin({ author: "users" }, "author.id", "head.author_id")
    .where("rigs.crew_id", crewId);
}

const rigColumns = [
  "rigs.id",
  "rigs.name",
  db.raw('rigs.site_id as "siteId"'),
  db.raw('sites.name as "siteName"'),
  db.raw('starter.name as "startedBy"'),
  db.raw('rigs.created_at as "createdAt"'),
  db.raw('rigs.reused_from_revision_id as "reusedFromRevisionId"'),
  db.raw('(select count(*)::int from rig_revisions c where c.crew_id = rigs.crew_id and c.rig_id = rigs.id) as "revisionCount"'),
  db.raw(
    `json_build_object('id', head.id, 'number', head.number, 'state', head.state, 'basedOnId', head.based_on_id, 'engineVersion', head.engine_version,
      'spanM', head.span_m, 'mainlineName', head.mainline_name, 'authorId', head.author_id, 'authorName', author.name, 'createdAt', head.created_at) as head`,
  ),
];

const SORTS: Record<RigListQuery["sort"], { column: string; order: "asc" | "desc" }[]> = {
  updated: [{ column: "head.created_at", order: "desc" }],
  name: [{ column: "rigs.name", order: "asc" }],
  span: [{ column: "head.span_m", order: "desc" }],
};

export interface RigAuthor {
  id: string;
  name: string;
}

export async function listRigs(crewId: string, query: RigListQuery): Promise<{ rigs: RigRow[]; total: number }> {
  const filtered = rigsWithHead(crewId);
  if (query.q) filtered.whereILike("rigs.name", `%${query.q.replace(/[\\%_]/g, (c) => `\\${c}`)}%`);
  if (query.siteId) filtered.where("rigs.site_id", query.siteId);
  if (query.state) filtered.where("head.state", query.state);
  if (query.mainline) filtered.where("head.mainline_name", query.mainline);
  if (query.spanMinM !== undefined) filtered.where("head.span_m", ">=", query.spanMinM);
  if (query.spanMaxM !== undefined) filtered.where("head.span_m", "<=", query.spanMaxM);
  if (query.startedBy) filtered.where("rigs.created_by", query.startedBy);
  const [{ total }] = await filtered.clone().clearSelect().count<{ total: number }[]>({ total: "*" });
  const rigs = await filtered
    .select(rigColumns)
    .orderBy([...SORTS[query.sort], { column: "rigs.id", order: "asc" }])
    .limit(query.pageSize)
    .offset((query.page - 1) * query.pageSize);
  return { rigs, total: Number(total) };
}

/** What the rigs list can be filtered by: the crew's mainlines (as the revisions name them) and who started rigs. */
export async function rigFilterChoices(crewId: string): Promise<{ mainlines: string[]; starters: RigAuthor[] }> {
  const [mainlines, starters] = await Promise.all([
    db("rig_revisions").where({ crew_id: crewId }).distinct("mainline_name").orderBy("mainline_name"),
    db("rigs").join("users", "users.id", "rigs.created_by").where("rigs.crew_id", crewId).distinct("users.id", "users.name").orderBy("users.name"),
  ]);
  return { mainlines: mainlines.map((r: { mainline_name: string }) => r.mainline_name), starters };
}

export async function findRig(crewId: string, id: string): Promise<RigRow | null> {
  return (await rigsWithHead(crewId).where("rigs.id", id).first(rigColumns)) ?? null;
}

/** Starts a rig with its first revision; `reusedFromRevisionId` links a rig started from a signed-off one ("use this rig"). */
export async function createRig(
  crewId: string,
  actor: Actor,
  revision: NewRevision,
  reusedFromRevisionId: string | null = null,
): Promise<{ rigId: string; revisionId: string }> {
  return db.transaction(async (trx) => {
    const [{ id: rigId }] = await trx("rigs")
      .insert({ crew_id: crewId, site_id: revision.siteId, name: revision.name, created_by: actor.id, reused_from_revision_id: reusedFromRevisionId })
      .returning("id");
    const [{ id: revisionId }] = await trx("rig_revisions")
      .insert({ ...revisionRow(crewId, rigId, actor.id, revision), number: 1 })
      .returning("id");
    await recordStep(trx, actor, {
      crewId,
      rigId,
      revisionId,
      action: "rig_started",
      detail: reusedFromRevisionId ? { reusedFrom: reusedFromRevisionId } : null,
    });
    if (reusedFromRevisionId) {
      const source = await trx("rig_revisions").where({ crew_id: crewId, id: reusedFromRevisionId }).first("rig_id");
      await recordStep(trx, actor, { crewId, rigId: source.rig_id, revisionId: reusedFromRevisionId, action: "reused", detail: { newRigId: rigId } });
    }
    return { rigId, revisionId };
  });
}

export type RevisionSave =
  { outcome: "saved"; revisionId: string } | { outcome: "stale"; currentId: string } | { outcome: "in_review"; number: number } | { outcome: "not_found" };

/**
 * Saves a new revision on top of `basedOnId`. The rig's row is locked first, so of two saves based on
 * the same revision exactly one lands; the other learns which revision is current now.
 */
export async function saveRevision(crewId: string, rigId: string, actor: Actor, basedOnId: string, revision: NewRevision): Promise<RevisionSave> {
  return db.transaction(async (trx) => {
    const rig = await trx("rigs").where({ crew_id: crewId, id: rigId }).forUpdate().first("id");
    if (!rig) return { outcome: "not_found" };
    const head = await headOf(trx, crewId, rigId);
    if (!head) return { outcome: "not_found" };
    if (head.id !== basedOnId) return { outcome: "stale", currentId: head.id };
    // A revision in review is what the lead is reading: it is returned or signed off before the rig changes.
    if (head.state === "in_review") return { outcome: "in_review", number: head.number };
    const [{ id }] = await trx("rig_revisions")
      .insert({ ...revisionRow(crewId, rigId, actor.id, revision), number: head.number + 1, based_on_id: basedOnId })
      .returning("id");
    await trx("rigs").where({ crew_id: crewId, id: rigId }).update({ name: revision.name, site_id: revision.siteId });
    await recordStep(trx, actor, { crewId, rigId, revisionId: id, action: "revision_saved" });
    return { outcome: "saved", revisionId: id };
  });
}

/** Where a revision belongs: its rig's id and name and its number (for links to a reused rig's source). */
export async function revisionPlace(crewId: string, revisionId: string): Promise<{ rigId: string; rigName: string; number: number } | null> {
  const row = await db("rig_revisions")
    .join("rigs", function () {
      this.on("rigs.id", "=", "rig_revisions.rig_id").andOn("rigs.crew_id", "=", "rig_revisions.crew_id");
    })
    .where({ "rig_revisions.crew_id": crewId, "rig_revisions.id": revisionId })
    .first(db.raw('rigs.id as "rigId"'), db.raw('rigs.name as "rigName"'), "rig_revisions.number");
  return row ?? null;
}
