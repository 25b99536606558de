import crypto from "node:crypto";

/** The SHA-256 of some text or bytes, as 64 lowercase hex digits (what PostgreSQL's encode(sha256(…), 'hex') gives). */
export const sha256Hex = (data: string | Uint8Array): string => crypto.createHash("sha256").update(data).digest("hex");
