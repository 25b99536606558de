import path from "node:path";
import type { Knex } from "knex";
import { databaseUrl } from "./db/config";

const config: Knex.Config = {
  client: "pg",
  connection: databaseUrl(),
  pool: { min: 0, max: 10 },
  migrations: {
    directory: path.join(__dirname, "migrations"),
    loadExtensions: [".ts"],
    extension: "ts",
    tableName: "knex_migrations",
  },
  seeds: { directory: path.join(__dirname, "seeds"), loadExtensions: [".ts"] },
};

export default config;
