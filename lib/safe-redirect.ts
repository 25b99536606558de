/** Where to go after sign-in: only a path on this site, never another host (no open redirect). */
export function safeNext(next: unknown, fallback = "/rigs"): string {
  if (typeof next !== "string" || !next.startsWith("/") || next.startsWith("//") || next.startsWith("/\\")) return fallback;
  try {
    const url = new URL(next, "http://spanwright.invalid");
    return url.host === "spanwright.invalid" ? `${url.pathname}${url.search}${url.hash}` : fallback;
  } catch {
    return fallback;
  }
}
