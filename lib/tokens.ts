import crypto from "node:crypto";
import { sha256Hex } from "./sha256";

// Secrets sent in links or kept in cookies. Only their SHA-256 is stored or shown: whoever reads the
// database or a page cannot use it to sign in, reset a password or open a shared table.

/** A new link secret: 32 random bytes, base64url, and the hash the database keeps. */
export function newToken(): { token: string; tokenHash: string } {
  const token = crypto.randomBytes(32).toString("base64url");
  return { token, tokenHash: hashToken(token) };
}

/** The stored form of a link secret. */
export const hashToken = (token: string): string => sha256Hex(token);

/** The public name of a session, matching the database's encode(sha256(id), 'hex'): the id itself is the cookie's secret. */
export const sessionHandle = (sessionId: string): string => sha256Hex(sessionId);
