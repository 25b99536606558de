import { afterAll, describe, expect, it } from "vitest";
import { AppClient } from "./support/http";
import { createPerson, testDb } from "./support/fixtures";
import { sessionHandle } from "@/lib/tokens";

afterAll(() => testDb.destroy());

describe("the account", () => {
  it("changes name and e-mail, refusing an address another account uses", async () => {
    const [me, other] = [await createPerson("me"), await createPerson("other")];
    const client = await AppClient.signedIn(me.email, me.password);
    const taken = await client.patch("/api/account", { name: "Me Again", email: other.email });
    expect(taken.status).toBe(409);
    expect((await testDb("users").where({ id: me.id }).first()).name).toBe(me.name);
    const renamed = `renamed-${me.email}`;
    expect((await client.patch("/api/account", { name: "Me Again", email: renamed.toUpperCase() })).status).toBe(200);
    const row = await testDb("users").where({ id: me.id }).first();
    expect([row.name, row.email]).toEqual(["Me Again", renamed]);
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
