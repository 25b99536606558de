import "server-only";
import pg from "pg";
import { databaseUrl } from "./config";

// The session store's own small pool: lucia's PostgreSQL adapter speaks to a pg Pool directly.
const globalForPool = globalThis as unknown as { spanwrightPgPool?: pg.Pool };

function sessionPool(): pg.Pool {
  const pool = new pg.Pool({ connectionString: databaseUrl(), max: 5 });
  // An idle connection the server cuts (a restart, a failover) is dropped from the pool; without a listener
  // pg's "error" event would end the whole process.
  pool.on("error", (error) => console.error(`spanwright: a pooled database connection was lost (${error.message}); the next request opens a new one.`));
  return pool;
}

export const pgPool: pg.Pool = globalForPool.spanwrightPgPool ?? (globalForPool.spanwrightPgPool = sessionPool());
