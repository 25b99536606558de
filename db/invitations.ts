import "server-only";
import { db } from "./knex";
import { isUuid } from "@/lib/validations/ids";
import type { Role } from "@/lib/roles";
import { INVITATION_DAYS, invitationProblem, type InvitationProblem } from "@/lib/invitation-state";

export interface Invitation {
  id: string;
  crewId: string;
  crewName: string;
  email: string;
  role: Role;
  createdAt: Date;
  expiresAt: Date;
  acceptedAt: Date | null;
  revokedAt: Date | null;
}

const columns = {
  id: "invitations.id",
  crewId: "invitations.crew_id",
  crewName: "crews.name",
  email: "invitations.email",
  role: "invitations.role",
  createdAt: "invitations.created_at",
  expiresAt: "invitations.expires_at",
  acceptedAt: "invitations.accepted_at",
  revokedAt: "invitations.revoked_at",
};

const withCrew = () => db("invitations").join("crews", "crews.id", "invitations.crew_id");

export async function createInvitation(input: { crewId: string; email: string; role: Role; tokenHash: string; invitedBy: string }): Promise<Invitation> {
  const [{ id }] = await db("invitations")
    .insert({
      crew_id: input.crewId,
      email: input.email,
      role: input.role,
      token_hash: input.tokenHash,
      invited_by: input.invitedBy,
      expires_at: db.raw("now() + make_interval(days => ?)", [INVITATION_DAYS]),
    })
    .returning("id");
  return withCrew().where("invitations.id", id).first(columns);
}

/** Deletes an invitation whose mail the relay refused: nobody received its link, so nothing should be left to accept. */
export async function withdrawUnsentInvitation(crewId: string, id: string): Promise<void> {
  await db("invitations").where({ crew_id: crewId, id }).whereNull("accepted_at").delete();
}

/** Invitations of the crew not yet accepted or revoked, newest first. */
export function openInvitationsOf(crewId: string): Promise<Invitation[]> {
  return withCrew()
    .where("invitations.crew_id", crewId)
    .whereNull("accepted_at")
    .whereNull("revoked_at")
    .orderBy("invitations.created_at", "desc")
    .select(columns);
}

export async function revokeInvitation(crewId: string, id: string): Promise<boolean> {
  if (!isUuid(id)) return false;
  return (await db("invitations").where({ crew_id: crewId, id }).whereNull("accepted_at").whereNull("revoked_at").update({ revoked_at: db.fn.now() })) > 0;
}

export async function invitationByTokenHash(tokenHash: string): Promise<Invitation | null> {
  return (await withCrew().where("invitations.token_hash", tokenHash).first(columns)) ?? null;
}

export type AcceptOutcome = "joined" | InvitationProblem | "wrong_email" | "last_owner";

/**
 * Joins the person to the crew once: the invitation and the crew's memberships are locked, checked and
 * changed in one transaction. The rule of every role change holds here too: the crew keeps an owner, so its
 * last owner cannot take a lesser role by accepting an invitation to their own crew.
 */
export async function acceptInvitation(tokenHash: string, user: { id: string; email: string }): Promise<{ outcome: AcceptOutcome; crewId?: string }> {
  return db.transaction(async (trx) => {
    const row = await trx("invitations").where({ token_hash: tokenHash }).forUpdate().first();
    const problem = invitationProblem(row ? { revokedAt: row.revoked_at, acceptedAt: row.accepted_at, expiresAt: new Date(row.expires_at) } : null);
    if (problem) return { outcome: problem };
    if (row.email !== user.email.toLowerCase()) return { outcome: "wrong_email" };
    const members: { user_id: string; role: Role }[] = await trx("crew_members").where({ crew_id: row.crew_id }).forUpdate().select("user_id", "role");
    const owners = members.filter((m) => m.role === "owner");
    if (row.role !== "owner" && owners.length === 1 && owners[0].user_id === user.id) return { outcome: "last_owner" };
    await trx("crew_members").insert({ crew_id: row.crew_id, user_id: user.id, role: row.role }).onConflict(["crew_id", "user_id"]).merge({ role: row.role });
    await trx("invitations").where({ id: row.id }).update({ accepted_at: trx.fn.now(), accepted_by: user.id });
    return { outcome: "joined", crewId: row.crew_id };
  });
}
