// Which address a request came from, for the sign-in limits. X-Forwarded-For ends with the socket's own peer
// (lib/server-edge.ts appends it); each proxy named in TRUSTED_PROXIES (comma-separated addresses) may have
// added the one before it. The first entry from the right that is not a trusted proxy is the client: anything
// left of it was written by the client and proves nothing.

const normalise = (address: string) => address.trim().replace(/^::ffff:/i, "");

function trustedProxies(): Set<string> {
  return new Set((process.env.TRUSTED_PROXIES ?? "").split(",").map(normalise).filter(Boolean));
}

export function clientAddress(request: Request): string {
  const hops = (request.headers.get("x-forwarded-for") ?? "").split(",").map(normalise).filter(Boolean);
  const trusted = trustedProxies();
  for (let i = hops.length - 1; i >= 0; i--) if (!trusted.has(hops[i])) return hops[i];
  return hops[0] ?? "unknown";
}
