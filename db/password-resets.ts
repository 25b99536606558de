import { db } from "./knex";

export async function createPasswordReset(userId: string, tokenHash: string): Promise<void> {
  await db("password_resets").insert({ user_id: userId, token_hash: tokenHash, expires_at: db.raw("now() + interval '1 hour'") });
}

export type ResetOutcome = { outcome: "ok"; userId: string } | { outcome: "unknown" | "expired" | "used" };

/** Spends a reset token: valid once, within the hour it was issued. */
export async function consumePasswordReset(tokenHash: string, apply: (userId: string) => Promise<void>): Promise<ResetOutcome> {
  return db.transaction(async (trx) => {
    const row = await trx("password_resets").where({ token_hash: tokenHash }).forUpdate().first();
    if (!row) return { outcome: "unknown" };
    if (row.used_at) return { outcome: "used" };
    if (new Date(row.expires_at) <= new Date()) return { outcome: "expired" };
    await trx("password_resets").where({ token_hash: tokenHash }).update({ used_at: trx.fn.now() });
    await apply(row.user_id);
    return { outcome: "ok", userId: row.user_id };
  });
}
