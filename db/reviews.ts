import "server-only";
import type { Knex } from "knex";
import { db } from "./knex";
import { latestSubmission, recordStep, type Actor } from "./audit-log";
import { STEP_ACTIONS, STEP_TO, stepRefusal, selfSignOffRefusal, type ReviewStep } from "@/lib/review/steps";
import { contentHash } from "@/lib/review/content-hash";
import type { RevisionState } from "@/lib/validations/rigs";

// Review and sign-off of rig revisions. Every step locks the rig's row first, so steps on one rig
// happen one after another: of many parallel sign-offs of a revision exactly one finds it in review.

export interface SignOff {
  id: string;
  revisionId: string;
  revisionNumber: number;
  signedByName: string;
  signedAt: string;
  statement: string;
  contentHash: string;
  engineVersion: string;
}

export type StepOutcome = { outcome: "done" } | { outcome: "not_found" } | { outcome: "refused"; status: 403 | 409; message: string };

const signOffColumns = [
  "sign_offs.id",
  db.raw('sign_offs.revision_id as "revisionId"'),
  db.raw('rig_revisions.number as "revisionNumber"'),
  db.raw('sign_offs.signed_by_name as "signedByName"'),
  db.raw('sign_offs.signed_at as "signedAt"'),
  "sign_offs.statement",
  db.raw('sign_offs.content_hash as "contentHash"'),
  db.raw('sign_offs.engine_version as "engineVersion"'),
];

const signOffs = (crewId: string) =>
  db("sign_offs")
    .join("rig_revisions", function () {
      this.on("rig_revisions.id", "=", "sign_offs.revision_id").andOn("rig_revisions.crew_id", "=", "sign_offs.crew_id");
    })
    .where("sign_offs.crew_id", crewId);

export async function findSignOff(crewId: string, revisionId: string): Promise<SignOff | null> {
  return (await signOffs(crewId).where("sign_offs.revision_id", revisionId).first(signOffColumns)) ?? null;
}

/** The sign-off that stands for a rig now (its signed-off revision), if any. */
export async function standingSignOff(crewId: string, rigId: string): Promise<SignOff | null> {
  return (await signOffs(crewId).where({ "sign_offs.rig_id": rigId, "rig_revisions.state": "signed_off" }).first(signOffColumns)) ?? null;
}

interface LockedRevision {
  id: string;
  number: number;
  state: RevisionState;
  authorId: string | null;
  inputs: Record<string, unknown>;
  result: unknown;
  engineVersion: string;
}

/** Locks the rig and reads the revision and the rig's latest number, or null when either is not in the crew. */
async function lockRevision(trx: Knex.Transaction, crewId: string, rigId: string, revisionId: string) {
  const rig = await trx("rigs").where({ crew_id: crewId, id: rigId }).forUpdate().first("id");
  if (!rig) return null;
  const revision: LockedRevision | undefined = await trx("rig_revisions")
    .where({ crew_id: crewId, rig_id: rigId, id: revisionId })
    .first("id", "number", "state", db.raw('author_id as "authorId"'), "inputs", "result", db.raw('engine_version as "engineVersion"'));
  if (!revision) return null;
  const latest = await trx("rig_revisions").where({ crew_id: crewId, rig_id: rigId }).max("number as latest").first();
  return { revision, latestNumber: Number(latest?.latest) };
}

export interface StepRequest {
  crewId: string;
  crewName: string;
  rigId: string;
  revisionId: string;
  actor: Actor;
  note: string | null;
  /** For a sign-off: whether the crew lets the one who wrote or submitted a revision sign it off. */
  allowSelfSignOff?: boolean;
  statement?: string;
}

/** Takes one review step on a revision: submit (with a note), return (with comments) or sign off. */
export function takeStep(step: ReviewStep, request: StepRequest): Promise<StepOutcome> {
  const { crewId, rigId, revisionId, actor } = request;
  return db.transaction(async (trx) => {
    const locked = await lockRevision(trx, crewId, rigId, revisionId);
    if (!locked) return { outcome: "not_found" };
    const { revision, latestNumber } = locked;
    const refusal = stepRefusal(step, revision, latestNumber);
    if (refusal) return { outcome: "refused", status: 409, message: refusal };

    if (step === "sign") {
      const submission = await latestSubmission(crewId, revisionId, trx);
      const isOwn = revision.authorId === actor.id || submission?.actorId === actor.id;
      const selfRefusal = selfSignOffRefusal({ isOwn, allowSelfSignOff: request.allowSelfSignOff ?? false, crewName: request.crewName });
      if (selfRefusal) return { outcome: "refused", status: 403, message: selfRefusal };
      const superseded: { id: string }[] = await trx("rig_revisions")
        .where({ crew_id: crewId, rig_id: rigId, state: "signed_off" })
        .update({ state: "superseded" })
        .returning("id");
      for (const { id } of superseded) await recordStep(trx, actor, { crewId, rigId, revisionId: id, action: "superseded", detail: { by: revisionId } });
      await trx("sign_offs").insert({
        crew_id: crewId,
        rig_id: rigId,
        revision_id: revisionId,
        signed_by_id: actor.id,
        signed_by_name: actor.name,
        statement: request.statement,
        content_hash: contentHash(revision),
        engine_version: revision.engineVersion,
      });
    }
    await trx("rig_revisions").where({ crew_id: crewId, id: revisionId }).update({ state: STEP_TO[step] });
    await recordStep(trx, actor, { crewId, rigId, revisionId, action: STEP_ACTIONS[step], note: request.note });
    return { outcome: "done" };
  });
}

/** Leads and owners of the crew, who are asked to review. */
export function reviewers(crewId: string): Promise<{ name: string; email: string }[]> {
  return db("crew_members")
    .join("users", "users.id", "crew_members.user_id")
    .where("crew_members.crew_id", crewId)
    .whereIn("crew_members.role", ["lead", "owner"])
    .select("users.name", "users.email")
    .orderBy("users.name");
}
