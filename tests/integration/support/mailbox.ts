import fs from "node:fs/promises";
import path from "node:path";
import type { StoredMessage } from "@/lib/mail/mailbox";

async function messagesTo(address: string): Promise<StoredMessage[]> {
  const dir = process.env.DEV_MAILBOX_DIR;
  if (!dir) throw new Error("DEV_MAILBOX_DIR is not set: run the suites with npm test.");
  const files = (await fs.readdir(dir)).filter((f) => f.endsWith(".json"));
  const messages = await Promise.all(files.map(async (f) => JSON.parse(await fs.readFile(path.join(dir, f), "utf8")) as StoredMessage));
  return messages.filter((m) => m.to.includes(address)).sort((a, b) => b.id.localeCompare(a.id));
}

/** The tokens of the links (under `pathPrefix`) in the messages to this address, once `count` arrived. */
async function tokensTo(address: string, pathPrefix: string, count: number, timeoutMs: number): Promise<string[]> {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    const mine = await messagesTo(address);
    if (mine.length >= count) return mine.map((m) => linkIn(m, pathPrefix).searchParams.get("token")!);
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error(`Fewer than ${count} e-mails to ${address} arrived within ${timeoutMs} ms.`);
}

/** The tokens of the e-mail confirmation links sent to this address, once `count` arrived. */
export const allLinksTo = (address: string, count: number, timeoutMs = 5000) => tokensTo(address, "/confirm-email?token=", count, timeoutMs);

/** The tokens of the password reset links sent to this address, once `count` arrived. */
export const resetLinksTo = (address: string, count: number, timeoutMs = 5000) => tokensTo(address, "/reset-password?token=", count, timeoutMs);

/** Waits for the newest message the local SMTP fake kept for this address. */
export async function latestMailTo(address: string, timeoutMs = 5000): Promise<StoredMessage> {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    const mine = await messagesTo(address);
    if (mine.length) return mine[0];
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error(`No e-mail to ${address} arrived within ${timeoutMs} ms.`);
}

export function linkIn(message: StoredMessage, pathPrefix: string): URL {
  const match = message.text.match(new RegExp(`https?://\\S+${pathPrefix.replace(/[/?]/g, "\\$&")}\\S+`));
  if (!match) throw new Error(`No ${pathPrefix} link in "${message.subject}".`);
  return new URL(match[0]);
}
