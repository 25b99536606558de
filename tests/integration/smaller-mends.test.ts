import { afterAll, describe, expect, it } from "vitest";
import { AppClient } from "./support/http";
import { createPerson, FIXTURE_PASSWORD, testDb } from "./support/fixtures";

afterAll(() => testDb.destroy());

describe("smaller mends", () => {
  it("checks the whole Origin, scheme and port too, and does not believe X-Forwarded-Host", async () => {
    const person = await createPerson("origin-strict");
    const site = new URL(new AppClient().baseUrl);
    const attempt = (origin: string, headers: Record<string, string> = {}) =>
      fetch(new URL("/api/auth/sign-in", site), {
        method: "POST",
        headers: { "content-type": "application/json", origin, ...headers },
        body: JSON.stringify({ email: person.email, password: FIXTURE_PASSWORD }),
      });
    expect((await attempt(`https://${site.host}`)).status).toBe(403);
    expect((await attempt(`http://${site.hostname}:1`)).status).toBe(403);
    expect((await attempt("https://elsewhere.example", { "x-forwarded-host": "elsewhere.example" })).status).toBe(403);
    expect((await attempt(site.origin)).status).toBe(200);
  });

  it("gives the session cookie the session's 30 days, not the browser's 400", async () => {
    const person = await createPerson("cookie-life");
    const response = await new AppClient().post("/api/auth/sign-in", { email: person.email, password: person.password });
    const cookie = response.headers.getSetCookie().find((c) => c.startsWith("spanwright_session="))!;
    const expires = new Date(/Expires=([^;]+)/i.exec(cookie)![1]).getTime();
    const days = (expires - Date.now()) / 86_400_000;
    expect(days).toBeGreaterThan(29);
    expect(days).toBeLessThanOrEqual(30.01);
  });

  it("limits wrong current passwords of a signed-in person to 5 in 15 minutes", async () => {
    const person = await createPerson("current-guess");
    const client = await AppClient.signedIn(person.email, person.password);
    for (let i = 0; i < 5; i++) {
      expect((await client.post("/api/account/password", { currentPassword: `guess-${i}`, newPassword: "another-long-one" })).status).toBe(400);
    }
    const blocked = await client.post("/api/account/password", { currentPassword: person.password, newPassword: "another-long-one" });
    expect(blocked.status).toBe(429);
    expect((await blocked.json()).error).toMatch(/Too many wrong current passwords/);
  });

  it("answers an invitation link Spanwright never sent with a real 404 that says what to do", async () => {
    const response = await new AppClient().get(`/invitations/${"x".repeat(43)}`);
    expect(response.status).toBe(404);
    expect(await response.text()).toContain("This invitation link is not valid");
  });
});
