import crypto from "node:crypto";

/** The public name of a session, matching the database's encode(sha256(id), 'hex'). */
export function sessionHandle(sessionId: string): string {
  return crypto.createHash("sha256").update(sessionId).digest("hex");
}
