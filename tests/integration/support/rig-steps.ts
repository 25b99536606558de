import { expect } from "vitest";
import example from "@/physics/examples/quarry-highline.json";
import type { AppClient } from "./http";

// The steps of the crew's loop that several suites take before what they test: a rig saved, submitted,
// signed off, and a newer revision signed off on top of it (which supersedes the first).

export interface RigRevision {
  rigId: string;
  revisionId: string;
}

export async function json(response: Response) {
  return { status: response.status, body: await response.json() };
}

export async function newRig(rigger: AppClient, name = "Review test rig"): Promise<RigRevision> {
  const { status, body } = await json(await rigger.post("/api/rigs", { name, siteId: null, inputs: example }));
  expect(status).toBe(201);
  return { rigId: body.rig.id as string, revisionId: body.revision.id as string };
}

export const reviewStep = (client: AppClient, rig: RigRevision, body: object) => client.post(`/api/rigs/${rig.rigId}/revisions/${rig.revisionId}/review`, body);
export const submitForReview = (rigger: AppClient, rig: RigRevision) => reviewStep(rigger, rig, { step: "submit", note: "Please check the bridle." });
export const signOff = (lead: AppClient, rig: RigRevision) => reviewStep(lead, rig, { step: "sign", confirm: true });

export async function signedRig(rigger: AppClient, lead: AppClient): Promise<RigRevision> {
  const rig = await newRig(rigger);
  expect((await submitForReview(rigger, rig)).status).toBe(200);
  expect((await signOff(lead, rig)).status).toBe(200);
  return rig;
}

/** Saves a new revision on top of a signed-off one and signs it off: the earlier one is then superseded. */
export async function supersede(rigger: AppClient, lead: AppClient, rig: RigRevision, inputs: object = example): Promise<RigRevision> {
  const saved = await json(
    await rigger.post(`/api/rigs/${rig.rigId}/revisions`, { basedOnRevisionId: rig.revisionId, name: "Review test rig", siteId: null, inputs }),
  );
  expect(saved.status).toBe(201);
  const next = { rigId: rig.rigId, revisionId: saved.body.revision.id as string };
  expect((await submitForReview(rigger, next)).status).toBe(200);
  expect((await signOff(lead, next)).status).toBe(200);
  return next;
}
