import { afterAll, describe, expect, it } from "vitest";
import { AppClient } from "./support/http";
import { allLinksTo, resetLinksTo } from "./support/mailbox";
import { createCrew, createPerson, FIXTURE_PASSWORD, testDb } from "./support/fixtures";

// 50 parallel copies of each write that must have one effect: publishing the slip table's share link,
// changing roles, changing an e-mail and confirming it. Exactly one effect, every other copy told why, none
// a 5xx. (Parallel sign-offs, and resets with one link, are in their own suites.)

afterAll(() => testDb.destroy());

const PARALLEL = 50;
const statusesOf = async (requests: Promise<Response>[]) => (await Promise.all(requests)).map((r) => r.status);
const tally = (statuses: number[]) => statuses.reduce<Record<number, number>>((t, s) => ({ ...t, [s]: (t[s] ?? 0) + 1 }), {});

describe("50 parallel writes that must have one effect", () => {
  it("publishing the slip table: one live share link", async () => {
    const crew = await createCrew("publish-race");
    const lead = await AppClient.signedIn(crew.people.lead.email, FIXTURE_PASSWORD);
    const statuses = await statusesOf(Array.from({ length: PARALLEL }, () => lead.post("/api/slip-table/link")));
    expect(tally(statuses)).toEqual({ 201: PARALLEL });
    expect(await testDb("slip_table_links").where({ crew_id: crew.id }).whereNull("revoked_at")).toHaveLength(1);
  });

  it("two owners demoting each other at once: one demotion lands, the crew keeps an owner", async () => {
    const crew = await createCrew("demote-race");
    await testDb("crew_members").where({ crew_id: crew.id, user_id: crew.people.lead.id }).update({ role: "owner" });
    const a = await AppClient.signedIn(crew.people.owner.email, FIXTURE_PASSWORD);
    const b = await AppClient.signedIn(crew.people.lead.email, FIXTURE_PASSWORD);
    const statuses = await statusesOf(
      Array.from({ length: PARALLEL }, (_, i) =>
        i % 2
          ? a.patch(`/api/crew/members/${crew.people.lead.id}`, { role: "rigger" })
          : b.patch(`/api/crew/members/${crew.people.owner.id}`, { role: "rigger" }),
      ),
    );
    expect(statuses.every((s) => s < 500)).toBe(true);
    const owners = await testDb("crew_members").where({ crew_id: crew.id, role: "owner" });
    expect(owners).toHaveLength(1);
    // The survivor's demotions of the other landed (the same change, so 200 each time); the demoted one's were refused.
    const survivorIsA = owners[0].user_id === crew.people.owner.id;
    const bySurvivor = statuses.filter((_, i) => (i % 2 === 1) === survivorIsA);
    const byDemoted = statuses.filter((_, i) => (i % 2 === 1) !== survivorIsA);
    expect(bySurvivor.every((s) => s === 200)).toBe(true);
    expect(byDemoted.every((s) => s === 403 || s === 409)).toBe(true);
  });

  it("one person changing their e-mail 50 times at once: at most 5 links sent, the address unchanged until one is opened", async () => {
    const me = await createPerson("email-race");
    const client = await AppClient.signedIn(me.email, me.password);
    const wanted = `new-${me.email}`;
    const statuses = await statusesOf(
      Array.from({ length: PARALLEL }, () => client.patch("/api/account", { name: me.name, email: wanted, currentPassword: me.password })),
    );
    expect(tally(statuses)).toEqual({ 202: 5, 429: PARALLEL - 5 });
    expect((await testDb("users").where({ id: me.id }).first()).email).toBe(me.email);

    // Every link sent, opened 10 times each at once: the newest works once, every other answer is a refusal.
    const tokens = await allLinksTo(wanted, 5);
    const confirmations = await statusesOf(tokens.flatMap((token) => Array.from({ length: 10 }, () => new AppClient().post("/api/account/email", { token }))));
    expect(tally(confirmations)).toEqual({ 200: 1, 410: PARALLEL - 1 });
    expect((await testDb("users").where({ id: me.id }).first()).email).toBe(wanted);
  });

  it("a person's several reset links opened at once: one new password stands, every other link refused", async () => {
    const me = await createPerson("reset-links-race");
    const anyone = new AppClient();
    for (let i = 0; i < 5; i++) expect((await anyone.post("/api/auth/forgot-password", { email: me.email })).status).toBe(200);
    const tokens = await resetLinksTo(me.email, 5);
    const statuses = await statusesOf(
      tokens.flatMap((token, i) =>
        Array.from({ length: 10 }, (_, j) => anyone.post("/api/auth/reset-password", { token, password: `parallel-password-${i}-${j}` })),
      ),
    );
    expect(tally(statuses)).toEqual({ 200: 1, 410: PARALLEL - 1 });
  });
});
