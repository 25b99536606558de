import { listModels } from "@/db/kit";
import { listSlipTests } from "@/db/slip-tests";
import { findSite } from "@/db/sites";
import type { KitCatalogue, SiteSnapshot } from "./kit";

/** The crew's Kit as the planner reads it: every model (retired ones too, so old revisions still name them) and the slip bench. */
export async function kitCatalogue(crewId: string): Promise<KitCatalogue> {
  const [models, tests] = await Promise.all([listModels(crewId), listSlipTests(crewId)]);
  return {
    models: models.map((m) => ({ id: m.id, kind: m.kind, name: m.name, specs: m.specs as Record<string, unknown>, retiredOn: m.retiredOn })),
    bench: tests.map((t) => ({ id: t.id, deviceId: t.deviceId, ropeDiameterMm: t.ropeDiameterMm, result: t.result, forceN: t.forceN })),
  };
}

/** A site as a rig revision records it; null when the crew has no such site. */
export async function siteSnapshot(crewId: string, siteId: string): Promise<SiteSnapshot | null> {
  const site = await findSite(crewId, siteId);
  if (!site) return null;
  const { id, name, spanM, heightDifferenceM, uncertaintyM, measuredBy, ground } = site;
  return { id, name, spanM, heightDifferenceM, uncertaintyM, measuredBy, ground };
}
