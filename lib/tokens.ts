import crypto from "node:crypto";

// Tokens sent by e-mail: 32 random bytes for the link, only their SHA-256 kept in the database.
export function newToken(): { token: string; tokenHash: string } {
  const token = crypto.randomBytes(32).toString("base64url");
  return { token, tokenHash: hashToken(token) };
}

export function hashToken(token: string): string {
  return crypto.createHash("sha256").update(token).digest("hex");
}
