import fs from "node:fs/promises";
import path from "node:path";

export interface StoredMessage {
  id: string;
  receivedAt: string;
  from: string;
  to: string[];
  subject: string;
  text: string;
  html: string;
}

/** The folder the local SMTP fake writes to; unset in a real deployment, where the mailbox does not exist. */
export function mailboxDir(): string | null {
  return process.env.DEV_MAILBOX_DIR || null;
}

export async function readMailbox(): Promise<StoredMessage[]> {
  const dir = mailboxDir();
  if (!dir) return [];
  const files = (await fs.readdir(dir).catch(() => [] as string[])).filter((f) => f.endsWith(".json"));
  const messages = await Promise.all(files.map(async (f) => JSON.parse(await fs.readFile(path.join(dir, f), "utf8")) as StoredMessage));
  return messages.sort((a, b) => b.receivedAt.localeCompare(a.receivedAt));
}
