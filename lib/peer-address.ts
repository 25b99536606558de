import http from "node:http";

const globalForPeer = globalThis as unknown as { spanwrightPeerRecorded?: boolean };

/** Appends each incoming request's socket address to its X-Forwarded-For, before Next.js or any route reads it. */
export function recordPeerAddress(): void {
  if (globalForPeer.spanwrightPeerRecorded) return;
  globalForPeer.spanwrightPeerRecorded = true;
  const emit = http.Server.prototype.emit;
  http.Server.prototype.emit = function (this: http.Server, event: string | symbol, ...args: unknown[]) {
    if (event === "request") {
      const request = args[0] as http.IncomingMessage;
      const peer = request.socket.remoteAddress;
      if (peer) {
        const sent = request.headers["x-forwarded-for"];
        request.headers["x-forwarded-for"] = sent ? `${Array.isArray(sent) ? sent.join(", ") : sent}, ${peer}` : peer;
      }
    }
    return emit.apply(this, [event, ...args] as Parameters<typeof emit>);
  } as typeof emit;
}
