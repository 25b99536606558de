import crypto from "node:crypto";
import { afterAll, describe, expect, it } from "vitest";
import { AppClient } from "./support/http";
import { createCrew, createPerson, FIXTURE_PASSWORD, testDb } from "./support/fixtures";
import { latestMailTo, linkIn } from "./support/mailbox";

afterAll(() => testDb.destroy());

const unique = (label: string) => `${label}-${crypto.randomBytes(4).toString("hex")}@fixture.example`;
// Each test signs in from its own address so the per-address limit of one never blocks another.
const fromAddress = () => ({ "x-forwarded-for": `198.51.100.${crypto.randomInt(1, 254)}` });

describe("sign-up", () => {
  it("creates the account and signs it in", async () => {
    const client = new AppClient();
    const email = unique("new");
    const response = await client.post("/api/auth/sign-up", { name: "New Walker", email: email.toUpperCase(), password: "long-enough-pw" });
    expect(response.status).toBe(201);
    expect(response.headers.get("set-cookie")).toMatch(/spanwright_session=.+HttpOnly.*SameSite=Lax/i);
    const crews = await client.get("/api/crews");
    expect(crews.status).toBe(200);
    expect(await testDb("users").where({ email }).first()).toBeTruthy();
  });

  it("refuses a taken e-mail, a malformed e-mail and a short password, saving nothing", async () => {
    const person = await createPerson("taken");
    const client = new AppClient();
    const taken = await client.post("/api/auth/sign-up", { name: "X", email: person.email, password: "long-enough-pw" });
    expect(taken.status).toBe(409);
    const malformed = await client.post("/api/auth/sign-up", { name: "X", email: "not-an-address", password: "long-enough-pw" });
    expect(malformed.status).toBe(400);
    expect((await malformed.json()).fieldErrors.email).toMatch(/e-mail address/);
    const email = unique("short");
    const short = await client.post("/api/auth/sign-up", { name: "X", email, password: "short" });
    expect(short.status).toBe(400);
    expect((await short.json()).fieldErrors.password).toMatch(/at least 10/);
    expect(await testDb("users").where({ email }).first()).toBeUndefined();
  });
});

describe("sign-in", () => {
  it("answers a wrong password and an unknown e-mail alike", async () => {
    const person = await createPerson("signin");
    const wrong = await new AppClient().post("/api/auth/sign-in", { email: person.email, password: "wrong-password" }, fromAddress());
    const unknown = await new AppClient().post("/api/auth/sign-in", { email: unique("nobody"), password: "wrong-password" }, fromAddress());
    expect(wrong.status).toBe(401);
    expect(unknown.status).toBe(401);
    expect(await wrong.json()).toEqual(await unknown.json());
  });

  it("locks an account out after 5 failures with 429 and Retry-After, even for the right password", async () => {
    const person = await createPerson("limited");
    const client = new AppClient();
    for (let i = 0; i < 5; i++) expect((await client.post("/api/auth/sign-in", { email: person.email, password: "wrong" }, fromAddress())).status).toBe(401);
    const blocked = await client.post("/api/auth/sign-in", { email: person.email, password: FIXTURE_PASSWORD }, fromAddress());
    expect(blocked.status).toBe(429);
    expect(Number(blocked.headers.get("retry-after"))).toBeGreaterThan(0);
  });

  it("limits failures from one address across accounts, for unknown e-mails too", async () => {
    const address = { "x-forwarded-for": "203.0.113.77" };
    const client = new AppClient();
    for (let i = 0; i < 20; i++) await client.post("/api/auth/sign-in", { email: unique("spray"), password: "wrong" }, address);
    const person = await createPerson("bystander");
    const blocked = await client.post("/api/auth/sign-in", { email: person.email, password: FIXTURE_PASSWORD }, address);
    expect(blocked.status).toBe(429);
    expect(blocked.headers.get("retry-after")).toBeTruthy();
  });

  it("trusts only the proxy's own entry of X-Forwarded-For: rotating what the client wrote gives no more guesses", async () => {
    // The test stack trusts a proxy on loopback (TRUSTED_PROXIES), which appends the address it saw last.
    const client = new AppClient();
    const seen = "203.0.113.91";
    for (let i = 0; i < 20; i++) {
      const forged = { "x-forwarded-for": `192.0.2.${i + 1}, ${seen}` };
      expect((await client.post("/api/auth/sign-in", { email: unique("rotate"), password: "wrong" }, forged)).status).toBe(401);
    }
    const blocked = await client.post("/api/auth/sign-in", { email: unique("rotate"), password: "wrong" }, { "x-forwarded-for": `192.0.2.99, ${seen}` });
    expect(blocked.status).toBe(429);
  });

  it("counts 50 parallel wrong passwords atomically: no more than 5 are checked", async () => {
    const person = await createPerson("parallel-guess");
    const client = new AppClient();
    const guesses = await Promise.all(
      Array.from({ length: 50 }, (_, i) => client.post("/api/auth/sign-in", { email: person.email, password: `guess-${i}` }, fromAddress())),
    );
    const statuses = guesses.map((g) => g.status);
    expect(statuses.filter((s) => s === 401)).toHaveLength(5);
    expect(statuses.filter((s) => s === 429)).toHaveLength(45);
  });

  it("refuses an e-mail over 254 characters with a 400 on the field, every time", async () => {
    const long = `${"a".repeat(250)}@fixture.example`;
    for (let i = 0; i < 3; i++) {
      const response = await new AppClient().post("/api/auth/sign-in", { email: long, password: "wrong" }, fromAddress());
      expect(response.status).toBe(400);
      expect((await response.json()).fieldErrors.email).toBe("Use an e-mail address of at most 254 characters.");
    }
  });

  it("limits reset mails to one address to 5 an hour, with the same answer for an address with no account", async () => {
    const [person, ghost] = [await createPerson("reset-flood"), unique("ghost-flood")];
    for (const email of [person.email, ghost]) {
      for (let i = 0; i < 5; i++) expect((await new AppClient().post("/api/auth/forgot-password", { email })).status).toBe(200);
      const refused = await new AppClient().post("/api/auth/forgot-password", { email });
      expect(refused.status).toBe(429);
      expect(refused.headers.get("retry-after")).toBeTruthy();
    }
  });

  it("refuses a mutating request without this site's Origin", async () => {
    const person = await createPerson("origin");
    const response = await fetch(new URL("/api/auth/sign-in", new AppClient().baseUrl), {
      method: "POST",
      headers: { "content-type": "application/json", origin: "https://elsewhere.example" },
      body: JSON.stringify({ email: person.email, password: FIXTURE_PASSWORD }),
    });
    expect(response.status).toBe(403);
  });

  it("signs out one device, or every device", async () => {
    const person = await createPerson("devices");
    const phone = await AppClient.signedIn(person.email, person.password);
    const laptop = await AppClient.signedIn(person.email, person.password);
    const tablet = await AppClient.signedIn(person.email, person.password);
    expect((await phone.post("/api/auth/sign-out")).status).toBe(200);
    expect((await phone.get("/api/crews")).status).toBe(401);
    expect((await laptop.get("/api/crews")).status).toBe(200);
    expect((await laptop.post("/api/auth/sign-out-everywhere")).status).toBe(200);
    expect((await tablet.get("/api/crews")).status).toBe(401);
    expect((await laptop.get("/api/crews")).status).toBe(401);
  });

  it("sends visitors of app pages to sign-in, with the way back", async () => {
    for (const path of ["/crew", "/rigs", "/account", "/crew/settings"]) {
      const visit = await new AppClient().get(path);
      expect(visit.status).toBe(307);
      expect(visit.headers.get("location")).toMatch(new RegExp(`/sign-in\\?next=${encodeURIComponent(path)}$`));
    }
  });
});

describe("password reset", () => {
  it("works once, within the hour, and signs the account out everywhere", async () => {
    const person = await createPerson("reset");
    const before = await AppClient.signedIn(person.email, person.password);
    const anyone = new AppClient();
    const asked = await anyone.post("/api/auth/forgot-password", { email: person.email });
    const askedUnknown = await anyone.post("/api/auth/forgot-password", { email: unique("ghost") });
    expect(asked.status).toBe(200);
    expect(await asked.json()).toEqual(await askedUnknown.json());

    const mail = await latestMailTo(person.email);
    expect(mail.html).toContain("Choose a new password");
    const token = linkIn(mail, "/reset-password?token=").searchParams.get("token")!;
    const stored = await testDb("password_resets").where({ user_id: person.id }).first();
    expect(stored.token_hash).not.toBe(token);

    expect((await anyone.post("/api/auth/reset-password", { token, password: "a-new-long-password" })).status).toBe(200);
    expect((await anyone.post("/api/auth/reset-password", { token, password: "another-long-password" })).status).toBe(410);
    expect((await before.get("/api/crews")).status).toBe(401);
    await expect(AppClient.signedIn(person.email, person.password)).rejects.toThrow(/401/);
    await AppClient.signedIn(person.email, "a-new-long-password");
  });

  it("takes 50 parallel resets with one token once, without stalling the rest of the app", async () => {
    const person = await createPerson("parallel-reset");
    const anyone = new AppClient();
    await anyone.post("/api/auth/forgot-password", { email: person.email });
    const token = linkIn(await latestMailTo(person.email), "/reset-password?token=").searchParams.get("token")!;
    const resets = Array.from({ length: 50 }, (_, i) => anyone.post("/api/auth/reset-password", { token, password: `parallel-password-${i}` }));
    // While they run, a route that needs the database still answers at once.
    const startedAt = Date.now();
    const health = await anyone.get("/api/health");
    const healthMs = Date.now() - startedAt;
    const statuses = (await Promise.all(resets)).map((r) => r.status);
    expect(health.status).toBe(200);
    expect(healthMs).toBeLessThan(5000);
    expect(statuses.filter((s) => s === 200)).toHaveLength(1);
    expect(statuses.filter((s) => s === 410)).toHaveLength(49);
  });

  it("spends every older link of the person when one is used", async () => {
    const person = await createPerson("older-link");
    const anyone = new AppClient();
    await anyone.post("/api/auth/forgot-password", { email: person.email });
    const older = linkIn(await latestMailTo(person.email), "/reset-password?token=").searchParams.get("token")!;
    await testDb("password_resets")
      .where({ user_id: person.id })
      .update({ created_at: testDb.raw("now() - interval '1 minute'") });
    await anyone.post("/api/auth/forgot-password", { email: person.email });
    const latestToken = async () => linkIn(await latestMailTo(person.email), "/reset-password?token=").searchParams.get("token")!;
    await expect.poll(latestToken).not.toBe(older);
    const newer = await latestToken();
    expect((await anyone.post("/api/auth/reset-password", { token: newer, password: "the-newer-password" })).status).toBe(200);
    const stale = await anyone.post("/api/auth/reset-password", { token: older, password: "the-older-password" });
    expect(stale.status).toBe(410);
    expect((await stale.json()).error).toMatch(/used already/);
  });

  it("refuses a token older than an hour and a made-up one", async () => {
    const person = await createPerson("stale");
    await new AppClient().post("/api/auth/forgot-password", { email: person.email });
    const token = linkIn(await latestMailTo(person.email), "/reset-password?token=").searchParams.get("token")!;
    await testDb("password_resets")
      .where({ user_id: person.id })
      .update({ expires_at: testDb.raw("now() - interval '1 second'") });
    const stale = await new AppClient().post("/api/auth/reset-password", { token, password: "a-new-long-password" });
    expect(stale.status).toBe(410);
    expect((await stale.json()).error).toMatch(/more than an hour old/);
    const madeUp = await new AppClient().post("/api/auth/reset-password", { token: "x".repeat(43), password: "a-new-long-password" });
    expect(madeUp.status).toBe(410);
  });
});

describe("invitations", () => {
  it("let the invitee sign up and join with the role, once", async () => {
    const crew = await createCrew("inviting");
    const owner = await AppClient.signedIn(crew.people.owner.email, FIXTURE_PASSWORD);
    const email = unique("invitee");
    const sent = await owner.post("/api/crew/invitations", { email, role: "rigger" });
    expect(sent.status).toBe(201);
    const mail = await latestMailTo(email);
    expect(mail.subject).toContain(crew.name);
    const token = linkIn(mail, "/invitations/").pathname.split("/").pop()!;

    const invitee = new AppClient();
    expect((await invitee.post("/api/auth/sign-up", { name: "Invited Rigger", email, password: "long-enough-pw" })).status).toBe(201);
    const accepted = await invitee.post("/api/invitations/accept", { token });
    expect(accepted.status).toBe(200);
    const members = await (await invitee.get("/api/crew/members")).json();
    expect(members.members.find((m: { email: string }) => m.email === email).role).toBe("rigger");
    expect((await invitee.post("/api/invitations/accept", { token })).status).toBe(410);
  });

  it("refuse another address, an expired or withdrawn invitation, and a role that does not exist", async () => {
    const crew = await createCrew("strict");
    const owner = await AppClient.signedIn(crew.people.owner.email, FIXTURE_PASSWORD);
    const email = unique("meant");
    await owner.post("/api/crew/invitations", { email, role: "member" });
    const token = linkIn(await latestMailTo(email), "/invitations/")
      .pathname.split("/")
      .pop()!;

    const stranger = await createPerson("stranger");
    const other = await AppClient.signedIn(stranger.email, stranger.password);
    const wrong = await other.post("/api/invitations/accept", { token });
    expect(wrong.status).toBe(422);
    expect((await wrong.json()).error).toMatch(/another e-mail address/);

    await testDb("invitations")
      .where({ email })
      .update({ expires_at: testDb.raw("now() - interval '1 second'") });
    const meant = new AppClient();
    await meant.post("/api/auth/sign-up", { name: "Late", email, password: "long-enough-pw" });
    expect((await meant.post("/api/invitations/accept", { token })).status).toBe(410);

    const bad = await owner.post("/api/crew/invitations", { email: unique("x"), role: "captain" });
    expect(bad.status).toBe(400);
    expect((await bad.json()).fieldErrors.role).toMatch(/member, rigger, lead, owner/);

    const second = unique("withdrawn");
    const { invitation } = await (await owner.post("/api/crew/invitations", { email: second, role: "member" })).json();
    expect((await owner.delete(`/api/crew/invitations/${invitation.id}`)).status).toBe(200);
    const withdrawnToken = linkIn(await latestMailTo(second), "/invitations/")
      .pathname.split("/")
      .pop()!;
    const late = new AppClient();
    await late.post("/api/auth/sign-up", { name: "Withdrawn", email: second, password: "long-enough-pw" });
    expect((await late.post("/api/invitations/accept", { token: withdrawnToken })).status).toBe(410);
  });
});
