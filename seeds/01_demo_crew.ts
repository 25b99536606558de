import crypto from "node:crypto";
import type { Knex } from "knex";
import { hash } from "@node-rs/argon2";

// An invented crew for the demo: the people, the crew and the places are made up.
export const DEMO_CREW_NAME = "Greyrock Highline Collective";
export const DEMO_PASSWORD = "greyrock-demo-2026";
export const DEMO_PEOPLE = [
  { email: "maren@greyrock.example", name: "Maren Oakes", role: "owner" },
  { email: "idris@greyrock.example", name: "Idris Vell", role: "lead" },
  { email: "sol@greyrock.example", name: "Sol Brannock", role: "rigger" },
  { email: "tove@greyrock.example", name: "Tove Harlan", role: "member" },
] as const;

export async function seed(knex: Knex): Promise<void> {
  const passwordHash = await hash(DEMO_PASSWORD);
  await knex.transaction(async (trx) => {
    const [crew] = await trx("crews").insert({ name: DEMO_CREW_NAME, units: "si" }).returning("id");
    for (const person of DEMO_PEOPLE) {
      const id = crypto.randomUUID();
      await trx("users").insert({ id, email: person.email, name: person.name, password_hash: passwordHash });
      await trx("crew_members").insert({ crew_id: crew.id, user_id: id, role: person.role });
    }
  });
}
