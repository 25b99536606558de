import "server-only";
import { db } from "./knex";

export interface DatabaseHealth {
  reachable: boolean;
  latestMigration: string | null;
}

export async function databaseHealth(): Promise<DatabaseHealth> {
  try {
    const row = await db("knex_migrations").select("name").orderBy("id", "desc").first();
    return { reachable: true, latestMigration: row?.name ?? null };
  } catch {
    return { reachable: false, latestMigration: null };
  }
}
