import http from "node:http";
import type { Duplex } from "node:stream";

// What the Node.js server does with a request before Next.js sees it, and with the answers Next.js makes on
// its own: the few places where an API client would otherwise get HTML, plain text or a bare 500.

const globalForEdge = globalThis as unknown as { spanwrightEdge?: boolean };

const isApi = (url: string) => url === "/api" || url.startsWith("/api/") || url.startsWith("/api?");

function answer(response: http.ServerResponse, status: number, api: boolean, message: string): void {
  const body = api ? JSON.stringify({ error: message }) : `<!DOCTYPE html><title>Spanwright</title><p>${message} <a href="/">Go to the start page</a>.</p>`;
  response.writeHead(status, { "content-type": api ? "application/json" : "text/html; charset=utf-8", "content-length": Buffer.byteLength(body) });
  response.end(body);
}

/** Where the address cannot name anything: a malformed %-escape (Next.js answers those 500) or a NUL character. */
function malformedAddress(url: string): string | null {
  if (/%00/.test(url)) return "The address contains a NUL character (%00), which names nothing here.";
  try {
    decodeURIComponent(url.split("?")[0]);
    return null;
  } catch {
    return "The address has a malformed %-escape (a % must be followed by two hexadecimal digits).";
  }
}

function onRequest(request: http.IncomingMessage, response: http.ServerResponse): boolean {
  // The socket's peer goes last in X-Forwarded-For, as a proxy adds what it saw: Next.js only sets the header
  // when the client sent none, so the client could otherwise name any address (lib/client-address.ts).
  const peer = request.socket.remoteAddress;
  if (peer) {
    const sent = request.headers["x-forwarded-for"];
    request.headers["x-forwarded-for"] = sent ? `${Array.isArray(sent) ? sent.join(", ") : sent}, ${peer}` : peer;
  }
  const url = request.url ?? "/";
  const api = isApi(url);
  const malformed = malformedAddress(url);
  if (malformed) {
    answer(response, 400, api, malformed);
    return true;
  }
  if (api) {
    // Next.js answers a method a route does not take with an empty 405: say which it takes, as JSON. Its headers
    // are sent before the (empty) body, so the content type is set then and the message written at the end.
    // Every way of sending the head (write, end, flushHeaders) goes through writeHead.
    let replaced = false;
    const claim = () => {
      if (replaced || response.statusCode !== 405 || response.hasHeader("content-type")) return;
      replaced = true;
      response.setHeader("content-type", "application/json");
    };
    const writeHead = response.writeHead.bind(response) as (...args: unknown[]) => http.ServerResponse;
    response.writeHead = ((status: number, ...rest: unknown[]) => {
      if (status === response.statusCode && rest.length === 0) claim();
      return writeHead(status, ...rest);
    }) as typeof response.writeHead;
    const end = response.end.bind(response) as (...args: unknown[]) => http.ServerResponse;
    response.end = ((...args: unknown[]) => {
      if (!response.headersSent) claim();
      if (!replaced) return end(...args);
      const allowed = String(response.getHeader("allow") ?? "").replace(/,\s*/g, ", ");
      return end(JSON.stringify({ error: `This address does not take ${request.method} requests${allowed ? `; it takes ${allowed}` : ""}.` }));
    }) as typeof response.end;
  }
  return false;
}

/** Headers too large for Node.js's parser never reach Next.js: answer them 431 with a JSON message instead of an empty one. */
function onClientError(error: NodeJS.ErrnoException, socket: Duplex): boolean {
  if (error.code !== "HPE_HEADER_OVERFLOW" || !socket.writable) return false;
  const body = JSON.stringify({
    error: "The request's headers are too large (most often too many or too long cookies): clear this site's cookies and try again.",
  });
  socket.end(
    `HTTP/1.1 431 Request Header Fields Too Large\r\nContent-Type: application/json\r\nContent-Length: ${Buffer.byteLength(body)}\r\nConnection: close\r\n\r\n${body}`,
  );
  return true;
}

/** Hooks the Node.js server's request and client-error events, once per process, before any listener of Next.js runs. */
export function guardServerEdge(): void {
  if (globalForEdge.spanwrightEdge) return;
  globalForEdge.spanwrightEdge = true;
  const emit = http.Server.prototype.emit;
  http.Server.prototype.emit = function (this: http.Server, event: string | symbol, ...args: unknown[]) {
    if (event === "request" && onRequest(args[0] as http.IncomingMessage, args[1] as http.ServerResponse)) return true;
    if (event === "clientError" && onClientError(args[0] as NodeJS.ErrnoException, args[1] as Duplex)) return true;
    return emit.apply(this, [event, ...args] as Parameters<typeof emit>);
  } as typeof emit;
}
