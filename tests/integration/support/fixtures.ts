import crypto from "node:crypto";
import knex from "knex";
import { hash } from "@node-rs/argon2";
import { ROLES, type Role } from "@/lib/roles";

// Direct access to the test database for setting up crews; every name is unique per call so that
// suites never see each other's rows.
export const testDb = knex({ client: "pg", connection: process.env.DATABASE_URL, pool: { min: 0, max: 4 } });

export const FIXTURE_PASSWORD = "fixture-password-1";
let passwordHash: Promise<string> | null = null;

export interface Person {
  id: string;
  email: string;
  name: string;
  password: string;
}

export async function createPerson(label: string): Promise<Person> {
  passwordHash ??= hash(FIXTURE_PASSWORD);
  const tag = crypto.randomBytes(4).toString("hex");
  const person = { id: crypto.randomUUID(), email: `${label}-${tag}@fixture.example`, name: `${label} ${tag}`, password: FIXTURE_PASSWORD };
  await testDb("users").insert({ id: person.id, email: person.email, name: person.name, password_hash: await passwordHash });
  return person;
}

export interface FixtureCrew {
  id: string;
  name: string;
  people: Record<Role, Person>;
}

/** A crew with one person of each role. */
export async function createCrew(label = "crew"): Promise<FixtureCrew> {
  const name = `${label} ${crypto.randomBytes(3).toString("hex")}`;
  const [{ id }] = await testDb("crews").insert({ name }).returning("id");
  const people = {} as Record<Role, Person>;
  for (const role of ROLES) {
    people[role] = await createPerson(`${role}`);
    await testDb("crew_members").insert({ crew_id: id, user_id: people[role].id, role });
  }
  return { id, name, people };
}
