import { RequestError } from "@/lib/http-errors";
import { refundAttempt, spendAttempt } from "@/lib/rate-limit";
import { findUserById } from "@/db/users";
import { verifyPassword } from "./passwords";

/**
 * Refuses with 400 on the "Current password" field unless it is the signed-in person's password. Attempts
 * are limited like sign-ins, so a session left open cannot be used to guess the password.
 */
export async function assertCurrentPassword(userId: string, password: string | undefined, why: string): Promise<void> {
  if (!password) throw new RequestError(400, `Enter your current password ${why}.`, { currentPassword: `Enter your current password ${why}.` });
  await spendAttempt(["currentPassword", userId]);
  const row = await findUserById(userId);
  if (!row || !(await verifyPassword(row.password_hash, password))) {
    throw new RequestError(400, "Your current password is not right.", { currentPassword: "This is not your current password." });
  }
  await refundAttempt("currentPassword", userId);
}
