import "server-only";
import { db } from "./knex";
import type { Site, SiteAnchor, SiteGround, MeasurementMethod } from "@/lib/validations/sites";

// The crew's sites. Every query is scoped by crew id: another crew's site is simply not found.

export interface SiteRow {
  id: string;
  name: string;
  accessNotes: string;
  spanM: number;
  heightDifferenceM: number;
  measuredBy: MeasurementMethod;
  uncertaintyM: number;
  ground: SiteGround;
  anchors: { a: SiteAnchor; b: SiteAnchor };
  coordinates: { latitude: number; longitude: number } | null;
  archivedAt: string | null;
  updatedAt: string;
  rigCount: number;
}

const columns = [
  "sites.id",
  "sites.name",
  db.raw('sites.access_notes as "accessNotes"'),
  db.raw('sites.span_m as "spanM"'),
  db.raw('sites.height_difference_m as "heightDifferenceM"'),
  db.raw('sites.measured_by as "measuredBy"'),
  db.raw('sites.uncertainty_m as "uncertaintyM"'),
  "sites.ground",
  "sites.anchors",
  "sites.latitude",
  "sites.longitude",
  db.raw('sites.archived_at as "archivedAt"'),
  db.raw('sites.updated_at as "updatedAt"'),
  db.raw('(select count(*)::int from rigs r where r.crew_id = sites.crew_id and r.site_id = sites.id) as "rigCount"'),
];

type Raw = Omit<SiteRow, "coordinates" | "ground"> & { latitude: number | null; longitude: number | null; ground: SiteGround | null };

function toRow({ latitude, longitude, ground, ...rest }: Raw): SiteRow {
  return { ...rest, ground: ground ?? { kind: "none" }, coordinates: latitude === null || longitude === null ? null : { latitude, longitude } };
}

function toColumns(site: Site) {
  return {
    name: site.name,
    access_notes: site.accessNotes,
    span_m: site.spanM,
    height_difference_m: site.heightDifferenceM,
    measured_by: site.measuredBy,
    uncertainty_m: site.uncertaintyM,
    ground: site.ground.kind === "none" ? null : JSON.stringify(site.ground),
    anchors: JSON.stringify(site.anchors),
    latitude: site.coordinates?.latitude ?? null,
    longitude: site.coordinates?.longitude ?? null,
  };
}

export async function listSites(crewId: string, options: { includeArchived?: boolean } = {}): Promise<SiteRow[]> {
  const query = db("sites").where("sites.crew_id", crewId).select(columns).orderBy("sites.name");
  if (!options.includeArchived) query.whereNull("sites.archived_at");
  return (await query).map(toRow);
}

export async function findSite(crewId: string, id: string): Promise<SiteRow | null> {
  const row = await db("sites").where({ "sites.crew_id": crewId, "sites.id": id }).first(columns);
  return row ? toRow(row) : null;
}

export async function createSite(crewId: string, userId: string, site: Site): Promise<SiteRow> {
  const [{ id }] = await db("sites")
    .insert({ crew_id: crewId, created_by: userId, ...toColumns(site) })
    .returning("id");
  return (await findSite(crewId, id))!;
}

export async function updateSite(crewId: string, id: string, site: Site): Promise<SiteRow | null> {
  const count = await db("sites")
    .where({ crew_id: crewId, id })
    .update({ ...toColumns(site), updated_at: db.fn.now() });
  return count ? findSite(crewId, id) : null;
}

/** Archives or restores a site; an archived site keeps its rigs and photos but is not offered for new rigs. */
export async function setSiteArchived(crewId: string, id: string, archived: boolean): Promise<SiteRow | null> {
  const count = await db("sites")
    .where({ crew_id: crewId, id })
    .update({ archived_at: archived ? db.fn.now() : null, updated_at: db.fn.now() });
  return count ? findSite(crewId, id) : null;
}

export type SiteDeletion = "deleted" | "not_found" | "has_rigs";

/** Deletes a site no rig points at; one with rigs must be archived instead, so no plan loses its span. */
export async function deleteSite(crewId: string, id: string): Promise<SiteDeletion> {
  return db.transaction(async (trx) => {
    const site = await trx("sites").where({ crew_id: crewId, id }).forUpdate().first("id");
    if (!site) return "not_found";
    const rig = await trx("rigs").where({ crew_id: crewId, site_id: id }).first("id");
    if (rig) return "has_rigs";
    await trx("sites").where({ crew_id: crewId, id }).delete();
    return "deleted";
  });
}

/** A site's row as the site form edits it. */
export function siteInput(row: SiteRow): Site {
  const { name, accessNotes, spanM, heightDifferenceM, measuredBy, uncertaintyM, ground, anchors, coordinates } = row;
  return { name, accessNotes, spanM, heightDifferenceM, measuredBy, uncertaintyM, ground, anchors, coordinates };
}
