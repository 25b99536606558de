import { afterAll, describe, expect, it } from "vitest";
import { AppClient } from "./support/http";
import { createCrew, createPerson, FIXTURE_PASSWORD, testDb } from "./support/fixtures";
import { allLinksTo, latestMailTo, linkIn } from "./support/mailbox";
import { sessionHandle } from "@/lib/tokens";

afterAll(() => testDb.destroy());

describe("the account", () => {
  it("renames at once, but moves to a new e-mail only with the current password and the link sent there", async () => {
    const [me, other] = [await createPerson("me"), await createPerson("other")];
    const client = await AppClient.signedIn(me.email, me.password);
    expect((await client.patch("/api/account", { name: "Me Again", email: me.email })).status).toBe(200);
    expect((await testDb("users").where({ id: me.id }).first()).name).toBe("Me Again");

    const renamed = `renamed-${me.email}`;
    const unproven = await client.patch("/api/account", { name: "Me Again", email: renamed });
    expect(unproven.status).toBe(400);
    expect((await unproven.json()).fieldErrors.currentPassword).toBe("Enter your current password to change the e-mail.");
    const wrong = await client.patch("/api/account", { name: "Me Again", email: renamed, currentPassword: "not-it" });
    expect((await wrong.json()).fieldErrors.currentPassword).toBe("This is not your current password.");
    const taken = await client.patch("/api/account", { name: "Me Again", email: other.email, currentPassword: me.password });
    expect(taken.status).toBe(409);

    const asked = await client.patch("/api/account", { name: "Me Again", email: renamed.toUpperCase(), currentPassword: me.password });
    expect(asked.status).toBe(202);
    expect(await asked.json()).toMatchObject({ user: { email: me.email }, pendingEmail: renamed });
    expect((await testDb("users").where({ id: me.id }).first()).email).toBe(me.email);
    const token = linkIn(await latestMailTo(renamed), "/confirm-email?token=").searchParams.get("token")!;
    const confirmed = await new AppClient().post("/api/account/email", { token });
    expect(confirmed.status).toBe(200);
    expect((await testDb("users").where({ id: me.id }).first()).email).toBe(renamed);
    expect((await new AppClient().post("/api/account/email", { token })).status).toBe(410);
  });

  it("keeps the address when another account took it before the link was opened, with a 409", async () => {
    const [first, second] = [await createPerson("race-a"), await createPerson("race-b")];
    const wanted = `wanted-${first.email}`;
    for (const person of [first, second]) {
      const client = await AppClient.signedIn(person.email, person.password);
      expect((await client.patch("/api/account", { name: person.name, email: wanted, currentPassword: person.password })).status).toBe(202);
    }
    const tokens = await testDb("email_changes").whereIn("user_id", [first.id, second.id]).select("token_hash");
    expect(tokens).toHaveLength(2);
    // The links as sent: both went to the same address, so read every message to it.
    const links = await allLinksTo(wanted, 2);
    const answers = await Promise.all(links.map((token) => new AppClient().post("/api/account/email", { token })));
    expect(answers.map((a) => a.status).sort()).toEqual([200, 409]);
    expect(await testDb("users").where({ email: wanted }).count<{ count: string }[]>({ count: "*" })).toEqual([{ count: "1" }]);
  });

  it("does not let a changed e-mail accept an invitation sent to it unless the link there was opened", async () => {
    const crew = await createCrew("invite-bypass");
    const owner = await AppClient.signedIn(crew.people.owner.email, FIXTURE_PASSWORD);
    const outsider = await createPerson("outsider");
    const meant = `meant-${outsider.email}`;
    await owner.post("/api/crew/invitations", { email: meant, role: "lead" });
    const token = linkIn(await latestMailTo(meant), "/invitations/")
      .pathname.split("/")
      .pop()!;
    const client = await AppClient.signedIn(outsider.email, outsider.password);
    expect((await client.patch("/api/account", { name: outsider.name, email: meant, currentPassword: outsider.password })).status).toBe(202);
    expect((await client.post("/api/invitations/accept", { token })).status).toBe(422);
  });

  it("changes the password only with the current one, and ends every other session", async () => {
    const me = await createPerson("pw");
    const here = await AppClient.signedIn(me.email, me.password);
    const elsewhere = await AppClient.signedIn(me.email, me.password);
    const wrong = await here.post("/api/account/password", { currentPassword: "nope", newPassword: "another-long-one" });
    expect(wrong.status).toBe(400);
    expect((await wrong.json()).fieldErrors.currentPassword).toBeTruthy();
    expect((await here.post("/api/account/password", { currentPassword: me.password, newPassword: "short" })).status).toBe(400);
    expect((await here.post("/api/account/password", { currentPassword: me.password, newPassword: "another-long-one" })).status).toBe(200);
    expect((await here.get("/api/crews")).status).toBe(200);
    expect((await elsewhere.get("/api/crews")).status).toBe(401);
  });

  it("signs out one listed device by its handle, and only one's own", async () => {
    const [me, other] = [await createPerson("dev-a"), await createPerson("dev-b")];
    const laptop = await AppClient.signedIn(me.email, me.password);
    const phone = await AppClient.signedIn(me.email, me.password);
    const theirs = await AppClient.signedIn(other.email, other.password);
    const sessions = await testDb("sessions").where({ user_id: me.id }).orderBy("created_at");
    const otherSession = await testDb("sessions").where({ user_id: other.id }).first();
    expect((await laptop.delete(`/api/account/sessions/${sessionHandle(otherSession.id)}`)).status).toBe(404);
    expect((await theirs.get("/api/crews")).status).toBe(200);
    expect((await laptop.delete(`/api/account/sessions/${sessionHandle(sessions[sessions.length - 1].id)}`)).status).toBe(200);
    expect((await phone.get("/api/crews")).status).toBe(401);
    expect((await laptop.get("/api/crews")).status).toBe(200);
  });
});
