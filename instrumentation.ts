// Runs once as the Next.js server starts: on Node.js, lib/server-edge.ts sees each request first (the
// client's address for the sign-in limits, malformed addresses, and JSON for Next.js's own 405 and 431).
export async function register() {
  if (process.env.NEXT_RUNTIME !== "nodejs") return;
  const { guardServerEdge } = await import("./lib/server-edge");
  guardServerEdge();
}
