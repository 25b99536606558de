import knex, { type Knex } from "knex";
import knexConfig from "../../knexfile";
import { StackError } from "./fail";

export function openDatabase(url: string): Knex {
  return knex({ ...knexConfig, connection: url });
}

/** Brings the schema up to date, then seeds the demo crew only into a database with no crews. */
export async function migrateAndSeed(url: string): Promise<{ seeded: boolean }> {
  const database = openDatabase(url);
  try {
    try {
      await database.migrate.latest();
    } catch (error) {
      throw new StackError(
        `A database migration failed (${(error as Error).message.split("\n")[0]}): nothing past the last good migration was applied; fix the migration, then run the command again.`,
      );
    }
    return await seedIfEmpty(database);
  } finally {
    await database.destroy();
  }
}

/** Runs the demo seeds only into a database that has no crews yet: never over real data. */
export async function seedIfEmpty(database: Knex): Promise<{ seeded: boolean }> {
  const { count } = (await database("crews").count<{ count: string }[]>({ count: "*" }))[0];
  if (Number(count) > 0) return { seeded: false };
  await database.seed.run();
  return { seeded: true };
}
