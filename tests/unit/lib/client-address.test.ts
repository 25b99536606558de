import { afterAll, beforeEach, describe, expect, it } from "vitest";
import { clientAddress } from "@/lib/client-address";

// The rightmost-untrusted reading of X-Forwarded-For (RFC 7239 §5.2 describes the same chain of proxies, from memory).
const from = (forwardedFor: string) => new Request("http://x/", { headers: { "x-forwarded-for": forwardedFor } });

// The test stack trusts its own loopback proxy (TRUSTED_PROXIES=127.0.0.1): each case here sets its own.
const inherited = process.env.TRUSTED_PROXIES;
beforeEach(() => {
  delete process.env.TRUSTED_PROXIES;
});
afterAll(() => {
  if (inherited === undefined) delete process.env.TRUSTED_PROXIES;
  else process.env.TRUSTED_PROXIES = inherited;
});

describe("clientAddress", () => {
  it("with no trusted proxy, is the socket's own peer: the last entry, whatever the client wrote before it", () => {
    expect(clientAddress(from("1.2.3.4, 127.0.0.1"))).toBe("127.0.0.1");
    expect(clientAddress(from("::ffff:10.0.0.5"))).toBe("10.0.0.5");
  });

  it("skips trusted proxies from the right and stops at the first address they did not vouch for", () => {
    process.env.TRUSTED_PROXIES = "10.0.0.1, 10.0.0.2";
    expect(clientAddress(from("6.6.6.6, 203.0.113.9, 10.0.0.2, 10.0.0.1"))).toBe("203.0.113.9");
    expect(clientAddress(from("10.0.0.2, 10.0.0.1"))).toBe("10.0.0.2");
  });
});
