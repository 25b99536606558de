import { listSites } from "@/db/sites";
import { crewSettings } from "@/db/crews";
import type { UnitSystem } from "@/lib/rig-form/quantities";
import { kitCatalogue } from "./catalogue";
import type { KitCatalogue, SiteSnapshot } from "./kit";

export interface PlannerData {
  units: UnitSystem;
  catalogue: KitCatalogue;
  /** The crew's sites in use, as a rig records them. */
  sites: SiteSnapshot[];
  minimums: Awaited<ReturnType<typeof crewSettings>>["minSafetyFactors"];
  /** The crew's minimum clearance below a fall, m. */
  minClearanceM: number;
}

/** What every planner page reads: the crew's units and minimums, its Kit and slip bench, and its sites. */
export async function plannerData(crewId: string): Promise<PlannerData> {
  const [settings, catalogue, sites] = await Promise.all([crewSettings(crewId), kitCatalogue(crewId), listSites(crewId)]);
  return {
    units: settings.units,
    catalogue,
    minimums: settings.minSafetyFactors,
    minClearanceM: settings.minClearanceM,
    sites: sites.map(({ id, name, spanM, heightDifferenceM, uncertaintyM, measuredBy, ground }) => ({
      id,
      name,
      spanM,
      heightDifferenceM,
      uncertaintyM,
      measuredBy,
      ground,
    })),
  };
}
