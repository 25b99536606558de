// knex's own PostgreSQL client class, which knex ships untyped; db/knex.ts extends it.
declare module "knex/lib/dialects/postgres/index.js" {
  import type { Knex } from "knex";

  export interface StatementQuery {
    sql: string;
    bindings?: readonly unknown[];
    options?: Record<string, unknown>;
  }

  export default class PostgresClient extends Knex.Client {
    /** Sends one statement: `options` are merged into pg's query config (its `name` makes it a prepared statement). */
    _query(connection: unknown, query: StatementQuery): Promise<unknown>;
  }
}
