import { hash, verify } from "@node-rs/argon2";

// argon2id with the library's defaults (19 MiB, 2 passes), the parameters OWASP recommends.
export function hashPassword(password: string): Promise<string> {
  return hash(password);
}

export async function verifyPassword(passwordHash: string, password: string): Promise<boolean> {
  try {
    return await verify(passwordHash, password);
  } catch {
    return false;
  }
}

// A hash to verify against when the e-mail is unknown, so both paths take the same time.
let decoy: Promise<string> | null = null;
export function decoyHash(): Promise<string> {
  decoy ??= hash("decoy-password-never-used");
  return decoy;
}
