import "server-only";
import knex, { type Knex } from "knex";
import PostgresClient, { type StatementQuery } from "knex/lib/dialects/postgres/index.js";
import { sha256Hex } from "@/lib/sha256";
import { databaseUrl } from "./config";

/**
 * knex's PostgreSQL client with every statement named by its text, so PostgreSQL parses and plans it once on each
 * connection and reuses the plan afterwards: planning a request's queries cost more than running them on the crew's
 * small tables. Values always travel as parameters, so a statement's text, and its name, are the same for every crew.
 */
class PreparedStatementsClient extends PostgresClient {
  override _query(connection: unknown, query: StatementQuery) {
    query.options = { name: `q${sha256Hex(query.sql).slice(0, 24)}`, ...query.options };
    return super._query(connection, query);
  }
}

// One pool per server process; kept on globalThis so hot reloads in development do not leak pools.
const globalForDb = globalThis as unknown as { spanwrightDb?: Knex };

export const db: Knex =
  globalForDb.spanwrightDb ?? (globalForDb.spanwrightDb = knex({ client: PreparedStatementsClient, connection: databaseUrl(), pool: { min: 0, max: 10 } }));
