import { RateLimiterPostgres, RateLimiterRes } from "rate-limiter-flexible";
import { pgPool } from "@/db/pg-pool";
import { RequestError } from "./http-errors";
import { sha256Hex } from "./sha256";

// Attempts counted per key in PostgreSQL, so every web instance shares them. An attempt is counted before it
// is checked (one atomic upsert), so parallel attempts cannot all slip past the limit; a sign-in that
// succeeds gives its point back. Keys are hashed: an e-mail of any length fits the table's key column.
// Sign-ins: 5 failures an account and 20 an address in 15 minutes (OWASP's advice is a small number per
// account and a larger one per source address). Mails to one address and wrong current passwords are
// limited so that the app cannot be used to flood a mailbox or to guess a signed-in person's password.

interface Rule {
  points: number;
  durationS: number;
  refusal: (minutes: number) => string;
}

const signInRefusal = (minutes: number) => `Too many failed sign-ins. Wait ${minutes} minute(s) and try again, or reset your password.`;

const RULES = {
  signInAccount: { points: 5, durationS: 15 * 60, refusal: signInRefusal },
  signInAddress: { points: 20, durationS: 15 * 60, refusal: signInRefusal },
  linkMail: {
    points: 5,
    durationS: 60 * 60,
    refusal: (minutes: number) =>
      `Several e-mails with a link were sent to this address in the last hour. Use the newest, or wait ${minutes} minute(s) before asking for another.`,
  },
  currentPassword: {
    points: 5,
    durationS: 15 * 60,
    refusal: (minutes: number) => `Too many wrong current passwords. Wait ${minutes} minute(s) and try again, or sign out and reset your password.`,
  },
} satisfies Record<string, Rule>;

export type LimitName = keyof typeof RULES;

const globalForLimits = globalThis as unknown as { spanwrightLimiters?: Map<LimitName, RateLimiterPostgres> };
const limiters = (globalForLimits.spanwrightLimiters ??= new Map());

function limiter(name: LimitName): RateLimiterPostgres {
  let found = limiters.get(name);
  if (!found) {
    const rule = RULES[name];
    found = new RateLimiterPostgres({
      storeClient: pgPool,
      storeType: "pool",
      tableName: "rate_limits",
      tableCreated: true,
      keyPrefix: name,
      points: rule.points,
      duration: rule.durationS,
    });
    limiters.set(name, found);
  }
  return found;
}

const keyOf = (key: string) => sha256Hex(key.toLowerCase());

function tooMany(name: LimitName, msBeforeNext: number): RequestError {
  const seconds = Math.max(1, Math.ceil(msBeforeNext / 1000));
  return new RequestError(429, RULES[name].refusal(Math.ceil(seconds / 60)), {}, { "Retry-After": String(seconds) });
}

/** Counts one attempt against each limit and key; throws 429 with Retry-After when any has none left. */
export async function spendAttempt(...attempts: [LimitName, string][]): Promise<void> {
  const outcomes = await Promise.allSettled(attempts.map(([name, key]) => limiter(name).consume(keyOf(key))));
  const refused = outcomes.flatMap((outcome, i) => (outcome.status === "rejected" ? [{ name: attempts[i][0], reason: outcome.reason as unknown }] : []));
  if (refused.length === 0) return;
  const fault = refused.find((r) => !(r.reason instanceof RateLimiterRes));
  if (fault) throw fault.reason;
  const longest = refused.reduce((a, b) => ((a.reason as RateLimiterRes).msBeforeNext >= (b.reason as RateLimiterRes).msBeforeNext ? a : b));
  throw tooMany(longest.name, (longest.reason as RateLimiterRes).msBeforeNext);
}

/** Gives back the point an attempt that succeeded spent. */
export async function refundAttempt(name: LimitName, key: string): Promise<void> {
  await limiter(name).reward(keyOf(key), 1);
}

/** Forgets a key's count (an account's failures once its password was right). */
export async function clearAttempts(name: LimitName, key: string): Promise<void> {
  await limiter(name).delete(keyOf(key));
}
