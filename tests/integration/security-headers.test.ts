import { afterAll, describe, expect, it } from "vitest";
import { AppClient } from "./support/http";
import { createPerson, testDb } from "./support/fixtures";

afterAll(() => testDb.destroy());

describe("security headers", () => {
  it("every page and answer names its policy: scripts from this site only, never framed, no referrer elsewhere", async () => {
    for (const path of ["/sign-in", "/api/health", "/no-such-page"]) {
      const response = await new AppClient().get(path);
      const csp = response.headers.get("content-security-policy") ?? "";
      expect(csp).toMatch(/default-src 'self'/);
      expect(csp).toMatch(/frame-ancestors 'none'/);
      expect(csp).toMatch(/object-src 'none'/);
      expect(response.headers.get("referrer-policy")).toBe("same-origin");
      expect(response.headers.get("x-content-type-options")).toBe("nosniff");
      expect(response.headers.get("permissions-policy")).toMatch(/camera=\(\)/);
    }
  });

  it("keeps a signed-in person's JSON out of every cache", async () => {
    const person = await createPerson("no-store");
    const client = await AppClient.signedIn(person.email, person.password);
    const crews = await client.get("/api/crews");
    expect(crews.status).toBe(200);
    expect(crews.headers.get("cache-control")).toBe("no-store");
  });
});
