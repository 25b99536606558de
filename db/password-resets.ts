import "server-only";
import type { Knex } from "knex";
import { db } from "./knex";
import { setPasswordHash } from "./users";

export async function createPasswordReset(userId: string, tokenHash: string): Promise<void> {
  await db("password_resets").insert({ user_id: userId, token_hash: tokenHash, expires_at: db.raw("now() + interval '1 hour'") });
}

export type ResetOutcome = { outcome: "ok"; userId: string } | { outcome: "unknown" | "expired" | "used" };

async function whyNotUsable(trx: Knex.Transaction, tokenHash: string): Promise<ResetOutcome> {
  const row = await trx("password_resets").where({ token_hash: tokenHash }).first("used_at", "expires_at");
  if (!row) return { outcome: "unknown" };
  return { outcome: row.used_at ? "used" : "expired" };
}

/**
 * Spends a reset token (valid once, within the hour it was issued) and sets the new password in the
 * same transaction. The person's row is locked first, so resets of one person run one after another: two
 * of their links opened at once would otherwise each hold its own link's row and wait for the other's
 * (a deadlock). The token is then claimed by one conditional UPDATE; every query runs on the transaction's
 * own connection, since a query on the pool from inside a transaction needs a second connection and many at
 * once drain the pool. The person's other unused links are spent too, and every session ends: whoever knew
 * the old password may be signed in.
 */
export async function resetPassword(tokenHash: string, passwordHash: string): Promise<ResetOutcome> {
  return db.transaction(async (trx) => {
    const owner = trx("password_resets").where({ token_hash: tokenHash }).select("user_id");
    const person = await trx("users").whereIn("id", owner).forUpdate().first("id");
    if (!person) return { outcome: "unknown" };
    const claimed: { user_id: string }[] = await trx("password_resets")
      .where({ token_hash: tokenHash })
      .whereNull("used_at")
      .where("expires_at", ">", trx.fn.now())
      .update({ used_at: trx.fn.now() })
      .returning("user_id");
    if (claimed.length === 0) return whyNotUsable(trx, tokenHash);
    const userId = claimed[0].user_id;
    await trx("password_resets").where({ user_id: userId }).whereNull("used_at").update({ used_at: trx.fn.now() });
    await setPasswordHash(userId, passwordHash, trx);
    await trx("sessions").where({ user_id: userId }).delete();
    return { outcome: "ok", userId };
  });
}
