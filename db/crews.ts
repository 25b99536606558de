import "server-only";
import { db } from "./knex";
import type { Role } from "@/lib/roles";

export interface Crew {
  id: string;
  name: string;
  units: "si" | "us";
}

export interface Membership {
  crew: Crew;
  role: Role;
}

export async function createCrew(name: string, ownerId: string): Promise<Crew> {
  return db.transaction(async (trx) => {
    const [crew] = await trx("crews").insert({ name }).returning(["id", "name", "units"]);
    await trx("crew_members").insert({ crew_id: crew.id, user_id: ownerId, role: "owner" });
    return crew;
  });
}

export interface CrewMember {
  userId: string;
  name: string;
  email: string;
  role: Role;
  joinedAt: Date;
}

export function membersOf(crewId: string): Promise<CrewMember[]> {
  return db("crew_members")
    .join("users", "users.id", "crew_members.user_id")
    .where("crew_members.crew_id", crewId)
    .orderBy("users.name")
    .select({ userId: "users.id", name: "users.name", email: "users.email", role: "crew_members.role", joinedAt: "crew_members.joined_at" });
}

/** The crew's member with this e-mail, or null: an invitation to them would change nothing. */
export async function memberByEmail(crewId: string, email: string): Promise<{ name: string; role: Role } | null> {
  const row = await db("crew_members")
    .join("users", "users.id", "crew_members.user_id")
    .where({ "crew_members.crew_id": crewId, "users.email": email.toLowerCase() })
    .first("users.name", "crew_members.role");
  return row ?? null;
}

export type MembershipChange = "done" | "not_found" | "last_owner";

/**
 * Changes a member's role or removes them, refusing to leave the crew without an owner. The
 * crew's membership rows are locked first so two owners demoting each other cannot both succeed.
 */
export async function changeMembership(crewId: string, userId: string, change: { role: Role } | "remove"): Promise<MembershipChange> {
  return db.transaction(async (trx) => {
    const rows: { user_id: string; role: Role }[] = await trx("crew_members").where({ crew_id: crewId }).forUpdate().select("user_id", "role");
    const target = rows.find((r) => r.user_id === userId);
    if (!target) return "not_found";
    const owners = rows.filter((r) => r.role === "owner").length;
    const losesOwner = target.role === "owner" && (change === "remove" || change.role !== "owner");
    if (losesOwner && owners <= 1) return "last_owner";
    const scope = trx("crew_members").where({ crew_id: crewId, user_id: userId });
    if (change === "remove") await scope.delete();
    else await scope.update({ role: change.role });
    return "done";
  });
}

export interface CrewSettingsRow {
  units: "si" | "us";
  minSafetyFactors: Record<string, number>;
  /** Metres between a walker's lowest point after a fall and the ground. */
  minClearanceM: number;
  allowSelfSignOff: boolean;
}

export async function crewSettings(crewId: string): Promise<CrewSettingsRow> {
  const row = await db("crews").where({ id: crewId }).first("units", "min_safety_factors", "min_clearance_m", "allow_self_sign_off");
  return { units: row.units, minSafetyFactors: row.min_safety_factors, minClearanceM: row.min_clearance_m, allowSelfSignOff: row.allow_self_sign_off };
}

export async function updateCrewSettings(crewId: string, settings: CrewSettingsRow): Promise<void> {
  await db("crews")
    .where({ id: crewId })
    .update({
      units: settings.units,
      min_safety_factors: JSON.stringify(settings.minSafetyFactors),
      min_clearance_m: settings.minClearanceM,
      allow_self_sign_off: settings.allowSelfSignOff,
    });
}
