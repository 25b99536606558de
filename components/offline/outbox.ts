import { callApi, type ApiAnswer } from "@/components/forms/call-api";
import { StorageUnavailable, readAll, remove, write } from "./storage";

// Writes made on site with no signal (checklist ticks, load-cell readings) wait here, in the order they
// were made, and are sent when the connection returns. Each carries its idempotency key, so a write sent
// twice (the answer lost on a weak signal, a second tab) lands once. A write the server refuses is kept
// with the server's reason until the member discards it: nothing made on site disappears unseen.

/** What a queued write was, for showing it beside the server's figures before it lands. */
export type WriteTarget =
  { kind: "tick"; runId: string; itemId: string; checked: boolean } | { kind: "reading"; revisionId: string; measuredN: number; anchor: "a" | "b" };

export interface QueuedWrite {
  /** The write's idempotency key, also its key in the store. */
  key: string;
  /** Position in the queue: writes are sent oldest first. */
  order: number;
  madeAt: string;
  url: string;
  body: Record<string, unknown>;
  /** The write in words: "Tick 'Anchor slings inspected' on Harbour Wall highline". */
  what: string;
  rigId: string;
  target: WriteTarget;
  refusal: { status: number; reason: string; at: string } | null;
}

export type NewWrite = Pick<QueuedWrite, "url" | "body" | "what" | "rigId" | "target">;

export type SendOutcome =
  { outcome: "sent"; body: Record<string, unknown> } | { outcome: "queued" } | { outcome: "refused"; error: string; fieldErrors: Record<string, string> };

const CHANGED = "spanwright:queued-writes";
let lastOrder = 0;
// Whether the last write sent reached the server: a browser may say it is online with no signal at all.
let reachable = true;

function notify() {
  if (typeof window !== "undefined") window.dispatchEvent(new Event(CHANGED));
}

/** False once a write found no connection, until one reaches the server again. */
export const serverReachable = () => reachable;

// Every write goes through here, so the queue knows whether the server can be reached.
async function post(url: string, body: Record<string, unknown>): Promise<ApiAnswer> {
  const answer = await callApi("POST", url, body);
  const now = answer.ok || answer.status !== 0;
  if (now !== reachable) {
    reachable = now;
    notify();
  }
  return answer;
}

/** Calls `listener` whenever the queue, or whether the server can be reached, changes in this tab. */
export function onQueueChange(listener: () => void): () => void {
  window.addEventListener(CHANGED, listener);
  return () => window.removeEventListener(CHANGED, listener);
}

/** The queue, oldest first: writes waiting to be sent and writes the server refused. */
export async function queuedWrites(): Promise<QueuedWrite[]> {
  return (await readAll<QueuedWrite>("queued-writes")).sort((a, b) => a.order - b.order);
}

async function enqueue(newWrite: NewWrite, key: string): Promise<void> {
  // Strictly increasing even within one millisecond, so the order survives a reload.
  lastOrder = Math.max(Date.now(), lastOrder + 1);
  const queued: QueuedWrite = { ...newWrite, key, order: lastOrder, madeAt: new Date().toISOString(), refusal: null };
  await write("queued-writes", key, queued);
  notify();
}

const isOffline = () => typeof navigator !== "undefined" && navigator.onLine === false;

/**
 * Sends a write now, or queues it when there is no connection (or when older writes still wait, so the
 * order holds). A write that cannot be queued either (storage full or refused) is refused in words.
 */
export async function sendOrQueue(newWrite: NewWrite): Promise<SendOutcome> {
  const key = crypto.randomUUID();
  const body = { ...newWrite.body, idempotencyKey: key };
  const withKey = { ...newWrite, body };
  let waiting = false;
  try {
    waiting = (await queuedWrites()).some((w) => !w.refusal);
  } catch {
    // No storage: the write can still be sent while online.
  }
  if (!waiting && !isOffline()) {
    const answer = await post(newWrite.url, body);
    if (answer.ok) return { outcome: "sent", body: answer.body };
    if (answer.status !== 0) return { outcome: "refused", error: answer.error, fieldErrors: answer.fieldErrors };
  }
  try {
    await enqueue(withKey, key);
  } catch (error) {
    const why = error instanceof StorageUnavailable ? error.message : "It could not be kept on this phone.";
    return { outcome: "refused", error: `There is no connection and the write could not be kept to send later: ${why} Nothing was saved.`, fieldErrors: {} };
  }
  if (!isOffline()) void sendQueued();
  return { outcome: "queued" };
}

export interface SendSummary {
  sent: number;
  refused: number;
  /** Why sending stopped with writes still waiting (no connection, signed out), or null when none wait. */
  stoppedBecause: string | null;
}

// The server's answer says the write itself will never land: keep it, with the reason, for the member.
const isRefusal = (answer: Extract<ApiAnswer, { ok: false }>) => answer.status >= 400 && answer.status < 500 && ![401, 408, 429].includes(answer.status);

let sending: Promise<SendSummary> | null = null;

/** Sends the waiting writes oldest first; stops at the first that cannot reach the server, to try again later. */
export function sendQueued(): Promise<SendSummary> {
  sending ??= sendInOrder().finally(() => {
    sending = null;
  });
  return sending;
}

async function sendInOrder(): Promise<SendSummary> {
  const summary: SendSummary = { sent: 0, refused: 0, stoppedBecause: null };
  for (const queued of await queuedWrites()) {
    if (queued.refusal) continue;
    const answer = await post(queued.url, queued.body);
    if (answer.ok) {
      await remove("queued-writes", queued.key);
      summary.sent += 1;
    } else if (isRefusal(answer)) {
      await write("queued-writes", queued.key, { ...queued, refusal: { status: answer.status, reason: answer.error, at: new Date().toISOString() } });
      summary.refused += 1;
    } else {
      summary.stoppedBecause =
        answer.status === 0
          ? "No connection yet."
          : answer.status === 401
            ? "Sign in again to send the writes waiting on this phone."
            : `The server answered ${answer.status}: ${answer.error}`;
      break;
    }
    notify();
  }
  notify();
  return summary;
}

/** Removes a refused write the member has read. */
export async function discardQueued(key: string): Promise<void> {
  await remove("queued-writes", key);
  notify();
}
