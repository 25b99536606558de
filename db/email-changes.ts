import "server-only";
import { db } from "./knex";
import { isUniqueViolation } from "./errors";

/** Records a wish to move the account to a new address; only the link sent there completes it. Earlier wishes stop counting. */
export async function createEmailChange(userId: string, newEmail: string, tokenHash: string): Promise<void> {
  await db.transaction(async (trx) => {
    // One change at a time per person: without the lock, parallel requests each spend only the links they
    // can see and several stay live, though only the newest should.
    await trx("users").where({ id: userId }).forUpdate().first("id");
    await trx("email_changes").where({ user_id: userId }).whereNull("used_at").update({ used_at: trx.fn.now() });
    await trx("email_changes").insert({ user_id: userId, new_email: newEmail, token_hash: tokenHash, expires_at: trx.raw("now() + interval '1 hour'") });
  });
}

export type EmailChangeOutcome = { outcome: "ok"; email: string } | { outcome: "unknown" | "expired" | "used" | "taken" };

/**
 * Spends the link (once, within its hour) and moves the account to the address it was sent to, in one
 * transaction on its own connection. An address another account took meanwhile answers "taken", never a fault.
 */
export async function confirmEmailChange(tokenHash: string): Promise<EmailChangeOutcome> {
  try {
    return await db.transaction(async (trx) => {
      const claimed: { user_id: string; new_email: string }[] = await trx("email_changes")
        .where({ token_hash: tokenHash })
        .whereNull("used_at")
        .where("expires_at", ">", trx.fn.now())
        .update({ used_at: trx.fn.now() })
        .returning(["user_id", "new_email"]);
      if (claimed.length === 0) {
        const row = await trx("email_changes").where({ token_hash: tokenHash }).first("used_at");
        return { outcome: !row ? "unknown" : row.used_at ? "used" : "expired" };
      }
      const { user_id: userId, new_email: email } = claimed[0];
      await trx("users").where({ id: userId }).update({ email });
      return { outcome: "ok", email };
    });
  } catch (error) {
    if (isUniqueViolation(error)) return { outcome: "taken" };
    throw error;
  }
}
