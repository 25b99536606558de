import { RateLimiterPostgres, RateLimiterRes } from "rate-limiter-flexible";
import { pgPool } from "@/db/pg-pool";
import { RequestError } from "./http-errors";

// Failed sign-ins: 5 an account and 20 an address in 15 minutes (OWASP's advice is a small number
// per account and a larger one per source address). Counters live in PostgreSQL so every web
// instance shares them.
const WINDOW_SECONDS = 15 * 60;

const limiter = (keyPrefix: string, points: number) =>
  new RateLimiterPostgres({
    storeClient: pgPool,
    storeType: "pool",
    tableName: "rate_limits",
    tableCreated: true,
    keyPrefix,
    points,
    duration: WINDOW_SECONDS,
  });

const globalForLimits = globalThis as unknown as { spanwrightLimits?: { account: RateLimiterPostgres; address: RateLimiterPostgres } };
const limits = (globalForLimits.spanwrightLimits ??= { account: limiter("signin_account", 5), address: limiter("signin_address", 20) });

function tooMany(msBeforeNext: number): RequestError {
  const seconds = Math.max(1, Math.ceil(msBeforeNext / 1000));
  return new RequestError(
    429,
    `Too many failed sign-ins. Wait ${Math.ceil(seconds / 60)} minute(s) and try again, or reset your password.`,
    {},
    { "Retry-After": String(seconds) },
  );
}

/** Throws 429 with Retry-After when the account or the address has used up its failures. */
export async function assertSignInAllowed(email: string, address: string): Promise<void> {
  const [account, source] = await Promise.all([limits.account.get(email), limits.address.get(address)]);
  const blocked = [account, source].filter((r): r is RateLimiterRes => r !== null && r.remainingPoints <= 0);
  if (blocked.length) throw tooMany(Math.max(...blocked.map((r) => r.msBeforeNext)));
}

export async function recordFailedSignIn(email: string, address: string): Promise<void> {
  await Promise.all([limits.account.penalty(email, 1), limits.address.penalty(address, 1)]);
}

export async function clearFailedSignIns(email: string): Promise<void> {
  await limits.account.delete(email);
}

/** The caller's address as the proxy in front reports it, else a fixed key for direct loopback use. */
export function clientAddress(request: Request): string {
  return request.headers.get("x-forwarded-for")?.split(",")[0]?.trim() || request.headers.get("x-real-ip") || "direct";
}
