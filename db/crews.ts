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

const crewColumns = ["crews.id", "crews.name", "crews.units"];

export async function membershipsOf(userId: string): Promise<Membership[]> {
  const rows = await db("crew_members")
    .join("crews", "crews.id", "crew_members.crew_id")
    .where("crew_members.user_id", userId)
    .select([...crewColumns, "crew_members.role"])
    .orderBy("crews.name");
  return rows.map(({ role, ...crew }) => ({ crew, role }));
}

export async function membershipIn(userId: string, crewId: string): Promise<Membership | null> {
  if (!/^[0-9a-f-]{36}$/i.test(crewId)) return null;
  const row = await db("crew_members")
    .join("crews", "crews.id", "crew_members.crew_id")
    .where({ "crew_members.user_id": userId, "crew_members.crew_id": crewId })
    .first([...crewColumns, "crew_members.role"]);
  if (!row) return null;
  const { role, ...crew } = row;
  return { crew, role };
}
