import type { Knex } from "knex";
import { databaseUrl } from "./db/config";
import { migrationSource } from "./migrations";
import { seedSource } from "./seeds";

const config: Knex.Config = {
  client: "pg",
  connection: databaseUrl(),
  pool: { min: 0, max: 10 },
  migrations: { migrationSource, tableName: "knex_migrations" },
  seeds: { seedSource },
};

export default config;
