import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { PDFParse } from "pdf-parse";
import example from "@/physics/examples/quarry-highline.json";
import { CAUTIONS } from "@/physics";
import { contentHash } from "@/lib/review/content-hash";
import { AppClient } from "./support/http";
import { createCrew, testDb, type FixtureCrew } from "./support/fixtures";

// The rig card over HTTP against the real server and PostgreSQL: a member downloads the PDF of a revision,
// read back with a general-purpose PDF parser (pdf-parse, on Mozilla's pdf.js); another crew gets 404; the
// card follows the sign-off (none, signed off, superseded); the print page shows the same card.

let crew: FixtureCrew;
let other: FixtureCrew;
const as: Record<"member" | "rigger" | "outsider" | "nobody", AppClient> = {} as never;
const RIG_NAME = 'Fjällbrücke / north: "A" & B';

async function pdfText(response: Response) {
  const parser = new PDFParse({ data: new Uint8Array(await response.arrayBuffer()) });
  try {
    const { text, total } = await parser.getText();
    return { pages: total, text: text.replace(/\s+/g, " ") };
  } finally {
    await parser.destroy();
  }
}

async function newRig(): Promise<{ rigId: string; revisionId: string }> {
  const response = await as.rigger.post("/api/rigs", { name: RIG_NAME, siteId: null, inputs: example });
  expect(response.status).toBe(201);
  const body = await response.json();
  return { rigId: body.rig.id, revisionId: body.revision.id };
}

/** Signs a revision off as the review steps do (in review, then signed off with its record), superseding the rig's signed-off one. */
async function signOff(rigId: string, revisionId: string) {
  await testDb.transaction(async (trx) => {
    await trx("rig_revisions").where({ crew_id: crew.id, rig_id: rigId, state: "signed_off" }).update({ state: "superseded" });
    await trx("rig_revisions").where({ id: revisionId }).update({ state: "in_review" });
    const revision = await trx("rig_revisions").where({ id: revisionId }).first("inputs", "result", "engine_version");
    await trx("sign_offs").insert({
      crew_id: crew.id,
      rig_id: rigId,
      revision_id: revisionId,
      signed_by_id: crew.people.lead.id,
      signed_by_name: crew.people.lead.name,
      statement: "Checked against the site and the gear.",
      content_hash: contentHash({ inputs: revision.inputs, result: revision.result, engineVersion: revision.engine_version }),
      engine_version: revision.engine_version,
    });
    await trx("rig_revisions").where({ id: revisionId }).update({ state: "signed_off" });
  });
}

const cardPath = (rigId: string, revisionId: string) => `/api/rigs/${rigId}/revisions/${revisionId}/card`;

beforeAll(async () => {
  crew = await createCrew("card");
  other = await createCrew("card-other");
  as.member = await AppClient.signedIn(crew.people.member.email, crew.people.member.password);
  as.rigger = await AppClient.signedIn(crew.people.rigger.email, crew.people.rigger.password);
  as.outsider = await AppClient.signedIn(other.people.owner.email, other.people.owner.password);
  as.nobody = new AppClient();
});

afterAll(async () => {
  await testDb.destroy();
});

describe("the rig card", () => {
  it("downloads for a member as a one-page PDF named after the rig, NOT SIGNED OFF, with the figures and the cautions", async () => {
    const { rigId, revisionId } = await newRig();
    const response = await as.member.get(cardPath(rigId, revisionId));
    expect(response.status).toBe(200);
    expect(response.headers.get("content-type")).toBe("application/pdf");
    expect(response.headers.get("content-disposition")).toBe('attachment; filename="rig-card-Fjallbrucke-north-A-B-revision-1.pdf"');
    const { pages, text } = await pdfText(response);
    expect(pages).toBe(1);
    expect(text).toContain(RIG_NAME);
    expect(text).toContain("NOT SIGNED OFF");
    expect(text).toContain("Pretension target, nobody on the line 3.50 kN at anchor B");
    expect(text).toContain(CAUTIONS[1]);
    // The link the QR code carries, printed under it too.
    expect(text).toContain(`/rigs/${rigId}?revision=${revisionId}`);
  });

  it("answers 404 to another crew and for unknown or malformed ids, 401 to nobody signed in", async () => {
    const { rigId, revisionId } = await newRig();
    expect((await as.outsider.get(cardPath(rigId, revisionId))).status).toBe(404);
    expect((await as.member.get(cardPath(rigId, crypto.randomUUID()))).status).toBe(404);
    expect((await as.member.get(cardPath(crypto.randomUUID(), revisionId))).status).toBe(404);
    expect((await as.member.get(cardPath(rigId, "not-a-revision"))).status).toBe(404);
    expect((await as.nobody.get(cardPath(rigId, revisionId))).status).toBe(401);
    const otherRig = await newRig();
    expect((await as.member.get(cardPath(otherRig.rigId, revisionId))).status).toBe(404);
  });

  it("shows the sign-off once signed, in the crew's units, and SUPERSEDED when a later revision is signed off", async () => {
    const { rigId, revisionId } = await newRig();
    await signOff(rigId, revisionId);
    const signed = await pdfText(await as.member.get(cardPath(rigId, revisionId)));
    expect(signed.text).toContain("SIGNED OFF");
    expect(signed.text).not.toContain("NOT SIGNED OFF");
    expect(signed.text).toContain(crew.people.lead.name);
    const { content_hash: hash } = await testDb("sign_offs").where({ revision_id: revisionId }).first("content_hash");
    expect(signed.text).toContain(hash.slice(0, 16));
    expect(signed.text).not.toContain(hash.slice(0, 17));

    const second = await as.rigger.post(`/api/rigs/${rigId}/revisions`, { basedOnRevisionId: revisionId, name: RIG_NAME, siteId: null, inputs: example });
    expect(second.status).toBe(201);
    const secondId = (await second.json()).revision.id;
    const draft = await pdfText(await as.member.get(cardPath(rigId, secondId)));
    expect(draft.text).toContain("NOT SIGNED OFF");
    expect(draft.text).toContain("Revision 1 of this rig is signed off.");
    await signOff(rigId, secondId);
    const old = await pdfText(await as.member.get(cardPath(rigId, revisionId)));
    expect(old.text).toContain("SUPERSEDED — revision 2 is signed off");

    await testDb("crews").where({ id: crew.id }).update({ units: "us" });
    try {
      // 3500 N = 786.8 lbf, rounded up (NIST SP 811: 1 lbf = 4.448 221 615 260 5 N).
      const inUs = await pdfText(await as.member.get(cardPath(rigId, secondId)));
      expect(inUs.text).toContain("787 lbf at anchor B");
    } finally {
      await testDb("crews").where({ id: crew.id }).update({ units: "si" });
    }
  });

  it("has a print page with the same card, the signed-off revision by default, and links from the rig page", async () => {
    const { rigId, revisionId } = await newRig();
    const rigPage = await (await as.member.get(`/rigs/${rigId}`)).text();
    expect(rigPage).toContain(`/rigs/${rigId}/card?revision=${revisionId}`);
    expect(rigPage).toContain(cardPath(rigId, revisionId));

    const page = await as.member.get(`/rigs/${rigId}/card`);
    expect(page.status).toBe(200);
    const html = await page.text();
    expect(html).toContain("NOT SIGNED OFF");
    expect(html).toContain("Download PDF");
    expect(html).toContain(cardPath(rigId, revisionId));

    await signOff(rigId, revisionId);
    const second = await as.rigger.post(`/api/rigs/${rigId}/revisions`, { basedOnRevisionId: revisionId, name: RIG_NAME, siteId: null, inputs: example });
    const secondId = (await second.json()).revision.id;
    const byDefault = await (await as.member.get(`/rigs/${rigId}/card`)).text();
    expect(byDefault).toContain(cardPath(rigId, revisionId));
    expect(byDefault).not.toContain(cardPath(rigId, secondId));
    expect(await (await as.member.get(`/rigs/${rigId}/card?revision=${secondId}`)).text()).toContain("NOT SIGNED OFF");

    expect((await as.outsider.get(`/rigs/${rigId}/card`)).status).toBe(404);
    expect((await as.member.get(`/rigs/${rigId}/card?revision=nonsense`)).status).toBe(404);
  });
});
