import "fake-indexeddb/auto";
import { afterEach, beforeEach, describe, expect, it, vi } from "vitest";
import { discardQueued, queuedWrites, sendOrQueue, sendQueued, type NewWrite } from "@/components/offline/outbox";
import { removeAll } from "@/components/offline/storage";

// The queue is checked against an independent model of the server written here: it applies each
// idempotency key once and answers as the on-site routes do (201 new, 200 a replay, 409 refused).
// IndexedDB is fake-indexeddb, an in-memory implementation of the W3C IndexedDB API.

type Fault = "unreachable" | "answer-lost" | null;

class ModelServer {
  applied = new Map<string, Record<string, unknown>>();
  order: string[] = [];
  fault: Fault = null;
  refuse: { status: number; error: string } | null = null;

  fetch = vi.fn(async (_url: string, init?: RequestInit) => {
    if (this.fault === "unreachable") throw new TypeError("Failed to fetch");
    const body = JSON.parse(String(init?.body)) as Record<string, unknown>;
    if (this.refuse) return Response.json({ error: this.refuse.error }, { status: this.refuse.status });
    const key = String(body.idempotencyKey);
    const replayed = this.applied.has(key);
    if (!replayed) {
      this.applied.set(key, body);
      this.order.push(String(body.what));
    }
    // The write landed, but the phone lost the signal before the answer came back.
    if (this.fault === "answer-lost") throw new TypeError("Failed to fetch");
    return Response.json({ replayed }, { status: replayed ? 200 : 201 });
  });
}

const tick = (n: number): NewWrite => ({
  url: "/api/rigs/r/revisions/v/checklists/run/ticks",
  body: { itemId: `item-${n}`, checked: true, what: `tick ${n}` },
  what: `Tick item ${n}`,
  rigId: "r",
  target: { kind: "tick", runId: "run", itemId: `item-${n}`, checked: true },
});

let server: ModelServer;

beforeEach(async () => {
  server = new ModelServer();
  vi.stubGlobal("fetch", server.fetch);
  vi.stubGlobal("window", new EventTarget());
  await removeAll("queued-writes");
});

afterEach(() => vi.unstubAllGlobals());

describe("writes made on site", () => {
  it("are sent at once while the server can be reached, and nothing is queued", async () => {
    expect(await sendOrQueue(tick(1))).toMatchObject({ outcome: "sent" });
    expect(await queuedWrites()).toEqual([]);
    expect(server.applied.size).toBe(1);
  });

  it("wait in the order they were made when there is no connection, then are sent in that order", async () => {
    server.fault = "unreachable";
    for (const n of [1, 2, 3]) expect(await sendOrQueue(tick(n))).toEqual({ outcome: "queued" });
    const queued = await queuedWrites();
    expect(queued.map((w) => w.what)).toEqual(["Tick item 1", "Tick item 2", "Tick item 3"]);
    expect(new Set(queued.map((w) => w.body.idempotencyKey)).size).toBe(3);
    expect(queued.every((w) => w.body.idempotencyKey === w.key)).toBe(true);

    server.fault = null;
    expect(await sendQueued()).toEqual({ sent: 3, refused: 0, stoppedBecause: null });
    expect(server.order).toEqual(["tick 1", "tick 2", "tick 3"]);
    expect(await queuedWrites()).toEqual([]);
  });

  it("queue behind older waiting writes even when the connection is back, so the order holds", async () => {
    server.fault = "unreachable";
    await sendOrQueue(tick(1));
    server.fault = null;
    expect(await sendOrQueue(tick(2))).toEqual({ outcome: "queued" });
    await sendQueued();
    expect(server.order).toEqual(["tick 1", "tick 2"]);
  });

  it("land once when the first send landed but its answer was lost, however often they are sent again", async () => {
    server.fault = "unreachable";
    await sendOrQueue(tick(1));
    server.fault = "answer-lost";
    expect((await sendQueued()).stoppedBecause).toBe("No connection yet.");
    expect(server.applied.size).toBe(1);
    server.fault = null;
    expect(await sendQueued()).toMatchObject({ sent: 1 });
    const [call1, call2] = server.fetch.mock.calls.map(([, init]) => JSON.parse(String(init?.body)).idempotencyKey);
    expect(call1).toBe(call2);
    expect(server.applied.size).toBe(1);
  });

  it("refused by the server are kept with the server's reason until discarded, and later writes still go", async () => {
    server.fault = "unreachable";
    await sendOrQueue(tick(1));
    await sendOrQueue(tick(2));
    server.fault = null;
    server.refuse = { status: 409, error: "Revision 2 was superseded by revision 3: nothing was saved." };
    expect(await sendQueued()).toEqual({ sent: 0, refused: 2, stoppedBecause: null });
    const refused = await queuedWrites();
    expect(refused.map((w) => w.refusal?.reason)).toEqual([server.refuse.error, server.refuse.error]);
    expect(refused[0].refusal?.status).toBe(409);
    // A refused write is not sent again by itself.
    server.refuse = null;
    expect(await sendQueued()).toEqual({ sent: 0, refused: 0, stoppedBecause: null });
    await discardQueued(refused[0].key);
    expect((await queuedWrites()).map((w) => w.what)).toEqual(["Tick item 2"]);
  });

  it("wait, and say why, while the member is signed out or the server is overloaded", async () => {
    server.fault = "unreachable";
    await sendOrQueue(tick(1));
    server.fault = null;
    for (const [status, why] of [
      [401, "Sign in again"],
      [429, "The server answered 429"],
      [503, "The server answered 503"],
    ] as const) {
      server.refuse = { status, error: "busy" };
      expect((await sendQueued()).stoppedBecause).toContain(why);
      expect((await queuedWrites())[0].refusal).toBeNull();
    }
  });

  it("with no storage on the phone: sent while online, refused in words (never lost unseen) when it cannot be kept", async () => {
    vi.stubGlobal("indexedDB", undefined);
    expect(await sendOrQueue(tick(1))).toMatchObject({ outcome: "sent" });
    server.fault = "unreachable";
    const answer = await sendOrQueue(tick(2));
    expect(answer.outcome).toBe("refused");
    expect(answer.outcome === "refused" && answer.error).toMatch(
      /no connection and the write could not be kept.*keeps no data for offline use.*Nothing was saved/,
    );
  });
});
