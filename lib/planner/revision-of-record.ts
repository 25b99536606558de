import type { UnitSystem } from "@/lib/rig-form/quantities";
import { RequestError } from "@/lib/http-errors";
import { kitCatalogue, siteSnapshot } from "./catalogue";
import { buildRevision, type NewRevision } from "./revision-row";

/** The server's revision for a planner's save, from the crew's Kit and site as they are now: the one of record. */
export async function revisionOfRecord(
  crewId: string,
  units: UnitSystem,
  body: { name: string; siteId: string | null; inputs: Record<string, unknown> },
): Promise<NewRevision> {
  const site = body.siteId ? await siteSnapshot(crewId, body.siteId) : null;
  if (body.siteId && !site) {
    throw new RequestError(400, "Site: there is no such site in this crew; choose one of its sites or type a free span.", {
      siteId: "Choose one of the crew's sites, or none.",
    });
  }
  return buildRevision(body, await kitCatalogue(crewId), site, units);
}
