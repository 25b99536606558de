import { afterAll, describe, expect, it } from "vitest";
import { AppClient } from "./support/http";
import { latestMailTo, linkIn } from "./support/mailbox";
import { createCrew, FIXTURE_PASSWORD, testDb } from "./support/fixtures";

afterAll(() => testDb.destroy());

const settings = {
  units: "us",
  minSafetyFactors: { webbing: 4, rope: 3, anchor: 3, connector: 3, sling: 3, pulley: 3, brake: 3 },
  minClearanceM: 2,
  allowSelfSignOff: false,
};

// Who may do what, route by route, is walked in route-matrix.test.ts; here, what the crew's own rules add.
describe("crew settings", async () => {
  const crew = await createCrew("roles");
  it("refuses settings out of range, naming what is allowed, and keeps the saved ones", async () => {
    const lead = await AppClient.signedIn(crew.people.lead.email, FIXTURE_PASSWORD);
    const before = await (await lead.get("/api/crew/settings")).json();
    const response = await lead.patch("/api/crew/settings", { ...settings, minSafetyFactors: { ...settings.minSafetyFactors, webbing: 0.5 } });
    expect(response.status).toBe(400);
    expect((await response.json()).fieldErrors["minSafetyFactors.webbing"]).toMatch(/at least 1.5/);
    expect(await (await lead.get("/api/crew/settings")).json()).toEqual(before);
  });
});

describe("the last owner", () => {
  it("can neither leave nor be demoted; with a second owner both work", async () => {
    const crew = await createCrew("owners");
    const owner = await AppClient.signedIn(crew.people.owner.email, FIXTURE_PASSWORD);
    const self = `/api/crew/members/${crew.people.owner.id}`;
    expect((await owner.patch(self, { role: "lead" })).status).toBe(409);
    const leaving = await owner.delete(self);
    expect(leaving.status).toBe(409);
    expect((await leaving.json()).error).toBe("The crew must keep at least one owner: make someone else an owner first.");
    expect((await owner.patch(`/api/crew/members/${crew.people.lead.id}`, { role: "owner" })).status).toBe(200);
    expect((await owner.patch(self, { role: "lead" })).status).toBe(200);
  });

  it("lets anyone leave a crew themselves", async () => {
    const crew = await createCrew("leaving");
    const member = await AppClient.signedIn(crew.people.member.email, FIXTURE_PASSWORD);
    expect((await member.delete(`/api/crew/members/${crew.people.member.id}`)).status).toBe(200);
    expect((await member.get("/api/crew/members")).status).toBe(404);
  });
});

describe("isolation between crews", () => {
  it("answers 404 for another crew's people, invitations and the crew itself", async () => {
    const [mine, theirs] = [await createCrew("mine"), await createCrew("theirs")];
    const theirOwner = await AppClient.signedIn(theirs.people.owner.email, FIXTURE_PASSWORD);
    const { invitation } = await (await theirOwner.post("/api/crew/invitations", { email: `t${Date.now()}@fixture.example`, role: "member" })).json();
    const owner = await AppClient.signedIn(mine.people.owner.email, FIXTURE_PASSWORD);
    expect((await owner.patch(`/api/crew/members/${theirs.people.member.id}`, { role: "lead" })).status).toBe(404);
    expect((await owner.delete(`/api/crew/members/${theirs.people.member.id}`)).status).toBe(404);
    expect((await owner.delete(`/api/crew/invitations/${invitation.id}`)).status).toBe(404);
    expect((await owner.switchCrew(theirs.id)).status).toBe(404);
    const listed = await (await owner.get("/api/crew/members")).json();
    expect(listed.members.map((m: { userId: string }) => m.userId).sort()).toEqual(
      Object.values(mine.people)
        .map((p) => p.id)
        .sort(),
    );
    const untouched = await testDb("crew_members").where({ crew_id: theirs.id, user_id: theirs.people.member.id }).first();
    expect(untouched.role).toBe("member");
  });

  it("lets a person in two crews switch between them", async () => {
    const [first, second] = [await createCrew("first"), await createCrew("second")];
    await testDb("crew_members").insert({ crew_id: second.id, user_id: first.people.rigger.id, role: "lead" });
    const rigger = await AppClient.signedIn(first.people.rigger.email, FIXTURE_PASSWORD);
    expect((await rigger.switchCrew(second.id)).status).toBe(200);
    expect((await rigger.patch("/api/crew/settings", settings)).status).toBe(200);
    expect((await rigger.switchCrew(first.id)).status).toBe(200);
    expect((await rigger.patch("/api/crew/settings", settings)).status).toBe(403);
  });
});

describe("invitations", () => {
  it("refuses to invite someone already in the crew, naming their role", async () => {
    const crew = await createCrew("invite-member");
    const owner = await AppClient.signedIn(crew.people.owner.email, FIXTURE_PASSWORD);
    const response = await owner.post("/api/crew/invitations", { email: crew.people.rigger.email.toUpperCase(), role: "lead" });
    expect(response.status).toBe(409);
    const body = await response.json();
    expect(body.fieldErrors.email).toBe(
      `${crew.people.rigger.name} (${crew.people.rigger.email}) is already in ${crew.name}, as a rigger: change their role in the People table instead of inviting them.`,
    );
    expect(await testDb("invitations").where({ crew_id: crew.id }).count<{ count: string }[]>({ count: "*" })).toEqual([{ count: "0" }]);
  });
});

describe("accepting an invitation keeps the crew's owner", () => {
  it("refuses the last owner an invitation to a lesser role in their own crew, leaving their role as it was", async () => {
    const crew = await createCrew("last-owner-accept");
    const owner = await AppClient.signedIn(crew.people.owner.email, FIXTURE_PASSWORD);
    const address = `later-${crew.people.owner.email}`;
    expect((await owner.post("/api/crew/invitations", { email: address, role: "member" })).status).toBe(201);
    const token = linkIn(await latestMailTo(address), "/invitations/")
      .pathname.split("/")
      .pop()!;
    // The owner then proves that address as their own (the link of an e-mail change).
    await testDb("users").where({ id: crew.people.owner.id }).update({ email: address });
    const accepted = await owner.post("/api/invitations/accept", { token });
    expect(accepted.status).toBe(409);
    expect((await accepted.json()).error).toMatch(/only owner/);
    expect((await testDb("crew_members").where({ crew_id: crew.id, user_id: crew.people.owner.id }).first()).role).toBe("owner");
  });
});
