import crypto from "node:crypto";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import canonicalize from "canonicalize";
import example from "@/physics/examples/quarry-highline.json";
import { evaluateRig, tensionForSag } from "@/physics";
import { AppClient } from "./support/http";
import { createCrew, testDb, type FixtureCrew } from "./support/fixtures";
import { latestMailTo } from "./support/mailbox";
import {
  json,
  newRig as newRigAs,
  reviewStep as step,
  signedRig as signedRigAs,
  signOff,
  submitForReview,
  supersede,
  type RigRevision,
} from "./support/rig-steps";

// Review and sign-off, the audit log's and the sign-off's immutability in the database, reuse, the
// on-site checklist and load-cell readings, over HTTP against the real server and PostgreSQL.

type Who = "member" | "rigger" | "lead" | "owner";
let crew: FixtureCrew;
let other: FixtureCrew;
const as = {} as Record<Who | "outsider", AppClient>;

const newRig = (client: AppClient = as.rigger) => newRigAs(client);
const submit = (rig: RigRevision, client = as.rigger) => submitForReview(client, rig);
const sign = (rig: RigRevision, client = as.lead) => signOff(client, rig);
const signedRig = () => signedRigAs(as.rigger, as.lead);

/** An SQL statement's error, or null when it went through. */
async function sqlError(run: () => Promise<unknown>): Promise<string | null> {
  try {
    await run();
    return null;
  } catch (error) {
    return (error as Error).message;
  }
}

beforeAll(async () => {
  crew = await createCrew("review");
  other = await createCrew("review-other");
  for (const role of ["member", "rigger", "lead", "owner"] as const) as[role] = await AppClient.signedIn(crew.people[role].email, crew.people[role].password);
  as.outsider = await AppClient.signedIn(other.people.owner.email, other.people.owner.password);
});

afterAll(async () => {
  await testDb.destroy();
});

describe("review steps, each role", () => {
  // Who may take each step (the README's permission table): submit riggers up, return and sign leads up.
  const allowed: Record<"submit" | "return" | "sign", Who[]> = { submit: ["rigger", "lead", "owner"], return: ["lead", "owner"], sign: ["lead", "owner"] };
  for (const [name, roles] of Object.entries(allowed) as ["submit" | "return" | "sign", Who[]][]) {
    for (const role of ["member", "rigger", "lead", "owner"] as const) {
      const may = roles.includes(role);
      it(`${name} by ${role === "owner" ? "an" : "a"} ${role}: ${may ? "allowed" : "refused with 403, nothing changed"}`, async () => {
        const rig = await newRig();
        if (name !== "submit") expect((await submit(rig)).status).toBe(200);
        const body =
          name === "submit"
            ? { step: "submit", note: "" }
            : name === "return"
              ? { step: "return", note: "Lower the pretension." }
              : { step: "sign", confirm: true };
        const before = await testDb("rig_revisions").where({ id: rig.revisionId }).first("state");
        const { status, body: answer } = await json(await step(as[role], rig, body));
        const after = await testDb("rig_revisions").where({ id: rig.revisionId }).first("state");
        if (may) {
          expect(status).toBe(200);
          expect(after.state).toBe({ submit: "in_review", return: "draft", sign: "signed_off" }[name]);
        } else {
          expect(status).toBe(403);
          expect(answer.error).toMatch(/^Only (riggers|leads)[ ,]/);
          expect(after.state).toBe(before.state);
        }
      });
    }
  }

  it("refuses steps the state does not allow, in one sentence, with nothing changed", async () => {
    const rig = await newRig();
    let answer = await json(await sign(rig));
    expect(answer.status).toBe(409);
    expect(answer.body.error).toBe("Revision 1 is a draft: a rig is signed off only after a rigger submits it for review.");
    answer = await json(await step(as.lead, rig, { step: "return", note: "x" }));
    expect(answer.body.error).toBe("Revision 1 is draft, not in review, so there is nothing to return.");
    expect((await submit(rig)).status).toBe(200);
    answer = await json(await submit(rig));
    expect(answer).toMatchObject({ status: 409, body: { error: "Revision 1 is already in review." } });
    expect((await sign(rig)).status).toBe(200);
    answer = await json(await sign(rig, as.owner));
    expect(answer).toMatchObject({ status: 409, body: { error: "Revision 1 is already signed off: a revision is signed off once." } });
    expect(await testDb("sign_offs").where({ revision_id: rig.revisionId }).count({ n: "*" })).toEqual([{ n: "1" }]);
  });

  it("asks for comments to return, and for the statement to be confirmed to sign off", async () => {
    const rig = await newRig();
    await submit(rig);
    let answer = await json(await step(as.lead, rig, { step: "return", note: " " }));
    expect(answer).toMatchObject({ status: 400, body: { fieldErrors: { note: "Comments for the rigger: say what should change before it is signed off." } } });
    answer = await json(await step(as.lead, rig, { step: "sign", confirm: false }));
    expect(answer).toMatchObject({ status: 400, body: { fieldErrors: { confirm: "Confirm the statement: tick the box to sign off." } } });
    answer = await json(await step(as.lead, rig, { step: "publish" }));
    expect(answer.status).toBe(400);
    expect(answer.body.error).toContain('Step: one of "submit", "return" or "sign".');
  });

  it("mails the crew's leads and owners a link to the review when a rigger submits", async () => {
    const rig = await newRig();
    const { body } = await json(await submit(rig));
    expect(body.notified).toBe(2);
    for (const who of ["lead", "owner"] as const) {
      const mail = await latestMailTo(crew.people[who].email);
      expect(mail.text).toContain("Please check the bridle.");
      expect(mail.text).toMatch(new RegExp(`Review the rig: https?://\\S+/rigs/${rig.rigId}/review\\n`));
    }
  });

  it("keeps a lead from signing off a revision they wrote unless the crew allows self sign-off", async () => {
    const rig = await newRig(as.lead);
    expect((await submit(rig, as.lead)).status).toBe(200);
    const refused = await json(await sign(rig, as.lead));
    expect(refused.status).toBe(403);
    expect(refused.body.error).toContain("does not allow self sign-off");
    await testDb("crews").where({ id: crew.id }).update({ allow_self_sign_off: true });
    try {
      expect((await sign(rig, as.lead)).status).toBe(200);
    } finally {
      await testDb("crews").where({ id: crew.id }).update({ allow_self_sign_off: false });
    }
  });

  it("refuses saving a new revision on top of one in review, losing nothing", async () => {
    const rig = await newRig();
    await submit(rig);
    const { status, body } = await json(
      await as.rigger.post(`/api/rigs/${rig.rigId}/revisions`, { basedOnRevisionId: rig.revisionId, name: "Review test rig", siteId: null, inputs: example }),
    );
    expect(status).toBe(409);
    expect(body.error).toContain("Revision 1 is in review");
    expect(await testDb("rig_revisions").where({ rig_id: rig.rigId }).count({ n: "*" })).toEqual([{ n: "1" }]);
  });

  it("supersedes the earlier sign-off when a newer revision of the rig is signed off, and logs each step", async () => {
    const first = await signedRig();
    const saved = await json(
      await as.rigger.post(`/api/rigs/${first.rigId}/revisions`, {
        basedOnRevisionId: first.revisionId,
        name: "Review test rig",
        siteId: null,
        inputs: { ...example, pretension: { forceN: 3000, readAt: "b" } },
      }),
    );
    expect(saved.status).toBe(201);
    const second = { rigId: first.rigId, revisionId: saved.body.revision.id };
    await submit(second);
    await sign(second, as.owner);
    const states = await testDb("rig_revisions").where({ rig_id: first.rigId }).orderBy("number").pluck("state");
    expect(states).toEqual(["superseded", "signed_off"]);
    const log = await testDb("audit_log").where({ rig_id: first.rigId }).orderBy("id").pluck("action");
    expect(log).toEqual(["rig_started", "submitted", "signed_off", "revision_saved", "submitted", "superseded", "signed_off"]);
  });

  it("lets exactly one of 50 parallel sign-offs of one revision stand; the others are told why, none is a 500", async () => {
    const rig = await newRig();
    await submit(rig);
    const answers = await Promise.all(Array.from({ length: 50 }, (_, i) => sign(rig, i % 2 ? as.lead : as.owner)));
    const statuses = answers.map((a) => a.status).sort();
    expect(statuses.filter((s) => s === 200)).toHaveLength(1);
    expect(statuses.filter((s) => s === 409)).toHaveLength(49);
    expect(await testDb("sign_offs").where({ revision_id: rig.revisionId }).count({ n: "*" })).toEqual([{ n: "1" }]);
    expect(await testDb("audit_log").where({ revision_id: rig.revisionId, action: "signed_off" }).count({ n: "*" })).toEqual([{ n: "1" }]);
  });

  it("answers 404 for another crew's rig on every review and on-site route", async () => {
    const rig = await newRig();
    const base = `/api/rigs/${rig.rigId}/revisions/${rig.revisionId}`;
    for (const [method, path, body] of [
      ["POST", `${base}/review`, { step: "submit", note: "" }],
      ["POST", `${base}/reuse`, { name: "x", siteId: null }],
      ["GET", `${base}/readings`, undefined],
      ["POST", `${base}/readings`, { kind: "pretension", anchor: "b", measuredN: 3000, sagM: 0.3 }],
      ["GET", `${base}/checklists`, undefined],
      ["POST", `${base}/checklists`, {}],
      ["POST", `${base}/checklists/${crypto.randomUUID()}/ticks`, { itemId: crypto.randomUUID(), checked: true }],
    ] as const) {
      expect((await as.outsider.request(method, path, body)).status, `${method} ${path}`).toBe(404);
    }
  });
});

describe("what is signed cannot change", () => {
  it("stores a SHA-256 over the RFC 8785 canonical JSON of inputs, result and engine version (checked with the canonicalize package and node:crypto)", async () => {
    const rig = await signedRig();
    const row = await testDb("rig_revisions").where({ id: rig.revisionId }).first("inputs", "result", "engine_version");
    const signOff = await testDb("sign_offs").where({ revision_id: rig.revisionId }).first("content_hash", "engine_version");
    const expected = crypto
      .createHash("sha256")
      .update(canonicalize({ inputs: row.inputs, result: row.result, engineVersion: row.engine_version })!)
      .digest("hex");
    expect(signOff).toEqual({ content_hash: expected, engine_version: evaluateRig(example).engineVersion });
  });

  it("refuses, in the database itself, UPDATE and DELETE of a signed-off revision, its sign-off and the audit log", async () => {
    const rig = await signedRig();
    const refusals = await Promise.all([
      sqlError(() =>
        testDb("rig_revisions")
          .where({ id: rig.revisionId })
          .update({ inputs: JSON.stringify({ ...example, spanM: 10 }) }),
      ),
      sqlError(() => testDb("rig_revisions").where({ id: rig.revisionId }).update({ state: "draft" })),
      sqlError(() => testDb("rig_revisions").where({ id: rig.revisionId }).delete()),
      sqlError(() => testDb("sign_offs").where({ revision_id: rig.revisionId }).update({ signed_by_name: "Someone else" })),
      sqlError(() => testDb("sign_offs").where({ revision_id: rig.revisionId }).delete()),
      sqlError(() => testDb("audit_log").where({ revision_id: rig.revisionId }).update({ note: "rewritten" })),
      sqlError(() => testDb("audit_log").where({ revision_id: rig.revisionId }).delete()),
    ]);
    expect(refusals[0]).toContain("a rig revision is immutable");
    expect(refusals[1]).toContain("a rig revision cannot go from signed_off to draft");
    expect(refusals[2]).toContain("a signed-off rig revision is kept for good");
    expect(refusals[3]).toContain("sign_offs rows are never changed or removed");
    expect(refusals[4]).toContain("sign_offs rows are never changed or removed");
    expect(refusals[5]).toContain("audit_log rows are never changed or removed");
    expect(refusals[6]).toContain("audit_log rows are never changed or removed");
    expect(await testDb("rig_revisions").where({ id: rig.revisionId }).first("state")).toEqual({ state: "signed_off" });
  });
});

describe("use this rig", () => {
  it("copies a signed-off revision into a new rig's draft that links back to it; a draft cannot be reused; members may not", async () => {
    const source = await signedRig();
    const { status, body } = await json(
      await as.rigger.post(`/api/rigs/${source.rigId}/revisions/${source.revisionId}/reuse`, { name: "Same line, Sunday", siteId: null }),
    );
    expect(status).toBe(201);
    expect(body.rig).toMatchObject({ name: "Same line, Sunday", reusedFromRevisionId: source.revisionId });
    expect(body.revision).toMatchObject({ number: 1, state: "draft" });
    expect(body.revision.result.walker.tensionBN).toBe(evaluateRig(example).walker.tensionBN);
    const draft = await newRig();
    expect((await as.rigger.post(`/api/rigs/${draft.rigId}/revisions/${draft.revisionId}/reuse`, { name: "x", siteId: null })).status).toBe(409);
  });
});

describe("the day on site", () => {
  it("lets leads write the crew's checklist, members run it on the signed-off revision, and keeps who ticked what", async () => {
    expect((await as.member.put("/api/crew/checklist", { items: [{ text: "Anchors checked" }] })).status).toBe(403);
    const bad = await json(await as.lead.put("/api/crew/checklist", { items: [{ text: "" }] }));
    expect(bad).toMatchObject({ status: 400, body: { fieldErrors: { "items.0.text": "Checklist item: write what to check, or remove the item." } } });
    const saved = await json(await as.lead.put("/api/crew/checklist", { items: [{ text: "Anchors checked" }, { text: "Brake tail tied off" }] }));
    expect(saved.status).toBe(200);
    const [first] = saved.body.items;

    const draft = await newRig();
    const onDraft = await json(await as.member.post(`/api/rigs/${draft.rigId}/revisions/${draft.revisionId}/checklists`, {}));
    expect(onDraft.status).toBe(409);
    expect(onDraft.body.error).toBe("Revision 1 is not signed off: run the checklist only on a signed-off revision, the one that is rigged.");

    const rig = await signedRig();
    const base = `/api/rigs/${rig.rigId}/revisions/${rig.revisionId}/checklists`;
    const run = await json(await as.member.post(base, { idempotencyKey: crypto.randomUUID() }));
    expect(run.status).toBe(201);
    const key = crypto.randomUUID();
    const tick = { itemId: first.id, checked: true, idempotencyKey: key };
    const ticked = await json(await as.member.post(`${base}/${run.body.run.id}/ticks`, tick));
    expect(ticked.status).toBe(201);
    expect(ticked.body.run.items[0]).toMatchObject({ text: "Anchors checked", checked: true, tickedBy: crew.people.member.name });
    const replay = await json(await as.member.post(`${base}/${run.body.run.id}/ticks`, tick));
    expect(replay).toMatchObject({ status: 200, body: { replayed: true } });
    expect(await testDb("checklist_ticks").where({ run_id: run.body.run.id }).count({ n: "*" })).toEqual([{ n: "1" }]);
  });

  it("records a load-cell reading beside the engine's prediction, once per key, and refuses implausible ones with why", async () => {
    const rig = await signedRig();
    const url = `/api/rigs/${rig.rigId}/revisions/${rig.revisionId}/readings`;
    const sag = evaluateRig(example).unloaded.midSpanSagM * 1.05;
    const key = crypto.randomUUID();
    const reading = { kind: "pretension", anchor: "b", measuredN: 3400, sagM: sag, idempotencyKey: key };
    const { status, body } = await json(await as.member.post(url, reading));
    expect(status).toBe(201);
    expect(body.reading.predictedN).toBeCloseTo(tensionForSag(example, sag, "b"), 6);
    expect(body.reading.recordedByName).toBe(crew.people.member.name);
    expect((await json(await as.member.post(url, reading))).body).toMatchObject({ replayed: true, reading: { id: body.reading.id } });
    expect(await testDb("tension_readings").where({ revision_id: rig.revisionId }).count({ n: "*" })).toEqual([{ n: "1" }]);

    const tooHigh = await json(await as.member.post(url, { ...reading, measuredN: 500_000, idempotencyKey: undefined }));
    expect(tooHigh).toMatchObject({
      status: 400,
      body: { fieldErrors: { measuredN: "Tension read: from 0.05 kN to 100.00 kN, the range of a load cell on a slackline." } },
    });
    const aboveMbs = await json(await as.member.post(url, { ...reading, measuredN: 40_000, idempotencyKey: undefined }));
    expect(aboveMbs.status).toBe(400);
    expect(aboveMbs.body.fieldErrors.measuredN).toContain("at or above the mainline's MBS (32.00 kN)");
    const walkerOff = await json(await as.member.post(url, { kind: "walker", anchor: "a", measuredN: 5000, walkerMassKg: 80, walkerPositionM: 500 }));
    expect(walkerOff.body.fieldErrors.walkerPositionM).toBe("Walker's distance from anchor A: less than the span, 120.00 m.");
  });

  it("refuses a reading on a superseded revision with the reason", async () => {
    const first = await signedRig();
    await supersede(as.rigger, as.lead, first);
    const { status, body } = await json(
      await as.member.post(`/api/rigs/${first.rigId}/revisions/${first.revisionId}/readings`, { kind: "pretension", anchor: "b", measuredN: 3400, sagM: 0.5 }),
    );
    expect(status).toBe(409);
    expect(body.error).toBe("Revision 1 has been superseded by a newer sign-off: readings are recorded on the signed-off revision.");
  });
});
