import "server-only";
import knex, { type Knex } from "knex";
import { databaseUrl } from "./config";

// One pool per server process; kept on globalThis so hot reloads in development do not leak pools.
const globalForDb = globalThis as unknown as { spanwrightDb?: Knex };

export const db: Knex = globalForDb.spanwrightDb ?? (globalForDb.spanwrightDb = knex({ client: "pg", connection: databaseUrl(), pool: { min: 0, max: 10 } }));
