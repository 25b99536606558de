import type { UnitSystem } from "@/lib/rig-form/quantities";
import { RequestError } from "@/lib/http-errors";
import { kitCatalogue, siteSnapshot } from "./catalogue";
import { buildRevision, type NewRevision } from "./revision-row";
import { findSite } from "@/db/sites";

/** A new rig may not be planned on an archived site. */
export async function assertSiteOpen(crewId: string, siteId: string | null): Promise<void> {
  if (siteId && (await findSite(crewId, siteId))?.archivedAt) {
    throw new RequestError(400, "Site: that site is archived; bring it back on its page before planning a new rig on it.", {
      siteId: "This site is archived.",
    });
  }
}

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
