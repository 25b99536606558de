import "server-only";
import crypto from "node:crypto";
import type { Knex } from "knex";
import { db } from "./knex";

export interface UserRow {
  id: string;
  email: string;
  name: string;
  password_hash: string;
}

export async function findUserByEmail(email: string): Promise<UserRow | null> {
  return (await db<UserRow>("users").where({ email: email.toLowerCase() }).first()) ?? null;
}

export async function findUserById(id: string): Promise<UserRow | null> {
  return (await db<UserRow>("users").where({ id }).first()) ?? null;
}

/** Creates the person; null when the e-mail is already taken. */
export async function createUser(input: { email: string; name: string; passwordHash: string }): Promise<UserRow | null> {
  const rows = await db<UserRow>("users")
    .insert({ id: crypto.randomUUID(), email: input.email.toLowerCase(), name: input.name, password_hash: input.passwordHash })
    .onConflict("email")
    .ignore()
    .returning("*");
  return rows[0] ?? null;
}

export async function renameUser(userId: string, name: string): Promise<void> {
  await db("users").where({ id: userId }).update({ name });
}

/** True when another account already signs in with this e-mail. */
export async function emailTaken(email: string, exceptUserId: string): Promise<boolean> {
  return Boolean(await db("users").where({ email: email.toLowerCase() }).whereNot({ id: exceptUserId }).first("id"));
}

/** Sets the password hash; inside a transaction pass it as `executor`, so the query runs on its connection. */
export async function setPasswordHash(userId: string, passwordHash: string, executor: Knex | Knex.Transaction = db): Promise<void> {
  await executor("users").where({ id: userId }).update({ password_hash: passwordHash });
}

// Pages name a session by a hash of its id: the id itself is the cookie's secret.
const sessionHandle = "encode(sha256(id::bytea), 'hex')";

export interface SessionRow {
  handle: string;
  createdAt: Date;
  expiresAt: Date;
  userAgent: string | null;
}

export function sessionsOf(userId: string): Promise<SessionRow[]> {
  return db("sessions")
    .where({ user_id: userId })
    .where("expires_at", ">", db.fn.now())
    .orderBy("created_at", "desc")
    .select({ handle: db.raw(sessionHandle), createdAt: "created_at", expiresAt: "expires_at", userAgent: "user_agent" });
}

export async function recordSessionAgent(sessionId: string, userAgent: string | null): Promise<void> {
  await db("sessions")
    .where({ id: sessionId })
    .update({ user_agent: userAgent?.slice(0, 300) ?? null });
}

export async function deleteSessionOf(userId: string, handle: string): Promise<boolean> {
  return (await db("sessions").where({ user_id: userId }).whereRaw(`${sessionHandle} = ?`, [handle]).delete()) > 0;
}
