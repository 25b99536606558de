// Runs once as the Next.js server starts. On Node.js, every request's X-Forwarded-For gets the address of
// the socket it came in on appended, as a proxy appends what it saw: Next.js itself only sets the header
// when the client sent none, so without this a client could name any address it liked. lib/client-address.ts
// then reads the list from the right, trusting only the proxies configured in TRUSTED_PROXIES.
export async function register() {
  if (process.env.NEXT_RUNTIME !== "nodejs") return;
  const { recordPeerAddress } = await import("./lib/peer-address");
  recordPeerAddress();
}
