import "server-only";
import pg from "pg";
import { databaseUrl } from "./config";

// The session store's own small pool: lucia's PostgreSQL adapter speaks to a pg Pool directly.
const globalForPool = globalThis as unknown as { spanwrightPgPool?: pg.Pool };

export const pgPool: pg.Pool = globalForPool.spanwrightPgPool ?? (globalForPool.spanwrightPgPool = new pg.Pool({ connectionString: databaseUrl(), max: 5 }));
