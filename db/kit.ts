import "server-only";
import type { Knex } from "knex";
import { db } from "./knex";
import { isUniqueViolation } from "./errors";
import type { GearItem, GearItemEdit, GearKind, GearModel, GearSpecs, Inspection, Retirement } from "@/lib/validations/kit";

// The Kit's queries. Every one is scoped by crew id: another crew's rows are simply not found.

export interface GearModelRow {
  id: string;
  kind: GearKind;
  name: string;
  specs: GearSpecs;
  notes: string;
  retiredOn: string | null;
  retiredReason: string | null;
  updatedAt: string;
  itemCount: number;
  inServiceCount: number;
}

export interface GearItemRow {
  id: string;
  modelId: string;
  modelName: string;
  kind: GearKind;
  label: string;
  inServiceSince: string;
  notes: string;
  retiredOn: string | null;
  retiredReason: string | null;
  lastInspectedOn: string | null;
  lastResult: "pass" | "watch" | "fail" | null;
}

export interface InspectionRow {
  id: string;
  inspectedOn: string;
  result: "pass" | "watch" | "fail";
  notes: string;
  inspectorName: string;
}

const modelColumns = (knex: Knex) => [
  "gear_models.id",
  "gear_models.kind",
  "gear_models.name",
  "gear_models.specs",
  "gear_models.notes",
  knex.raw('gear_models.retired_on::text as "retiredOn"'),
  knex.raw('gear_models.retired_reason as "retiredReason"'),
  knex.raw('gear_models.updated_at as "updatedAt"'),
  knex.raw('(select count(*)::int from gear_items i where i.model_id = gear_models.id) as "itemCount"'),
  knex.raw('(select count(*)::int from gear_items i where i.model_id = gear_models.id and i.retired_on is null) as "inServiceCount"'),
];

export function listModels(crewId: string, kinds?: readonly GearKind[]): Promise<GearModelRow[]> {
  const query = db("gear_models")
    .where("gear_models.crew_id", crewId)
    .select(modelColumns(db))
    .orderBy([{ column: "gear_models.kind" }, { column: "gear_models.name" }]);
  if (kinds) query.whereIn("gear_models.kind", kinds);
  return query;
}

export async function findModel(crewId: string, id: string): Promise<GearModelRow | null> {
  return (await db("gear_models").where({ "gear_models.crew_id": crewId, "gear_models.id": id }).first(modelColumns(db))) ?? null;
}

export async function createModel(crewId: string, model: GearModel): Promise<GearModelRow> {
  const [{ id }] = await db("gear_models")
    .insert({ crew_id: crewId, kind: model.kind, name: model.name, notes: model.notes, specs: JSON.stringify(model.specs) })
    .returning("id");
  return (await findModel(crewId, id))!;
}

/** Edits a model in place; its kind is fixed once items and tests refer to it. */
export async function updateModel(crewId: string, id: string, model: GearModel): Promise<GearModelRow | null | "kind_changed"> {
  const current = await findModel(crewId, id);
  if (!current) return null;
  if (current.kind !== model.kind) return "kind_changed";
  await db("gear_models")
    .where({ crew_id: crewId, id })
    .update({ name: model.name, notes: model.notes, specs: JSON.stringify(model.specs), updated_at: db.fn.now() });
  return findModel(crewId, id);
}

/** Retires a model: no new item of it can be added and no new plan may choose it. Its items keep their history. */
export async function retireModel(crewId: string, id: string, retirement: Retirement): Promise<GearModelRow | null> {
  const count = await db("gear_models")
    .where({ crew_id: crewId, id })
    .update({ retired_on: retirement.retiredOn, retired_reason: retirement.reason, updated_at: db.fn.now() });
  return count ? findModel(crewId, id) : null;
}

const itemColumns = (knex: Knex) => [
  "gear_items.id",
  knex.raw('gear_items.model_id as "modelId"'),
  knex.raw('gear_models.name as "modelName"'),
  "gear_models.kind",
  "gear_items.label",
  knex.raw('gear_items.in_service_since::text as "inServiceSince"'),
  "gear_items.notes",
  knex.raw('gear_items.retired_on::text as "retiredOn"'),
  knex.raw('gear_items.retired_reason as "retiredReason"'),
  knex.raw(
    '(select inspected_on::text from gear_inspections g where g.item_id = gear_items.id order by inspected_on desc, created_at desc limit 1) as "lastInspectedOn"',
  ),
  knex.raw('(select result from gear_inspections g where g.item_id = gear_items.id order by inspected_on desc, created_at desc limit 1) as "lastResult"'),
];

const itemsOf = (crewId: string) => db("gear_items").join("gear_models", "gear_models.id", "gear_items.model_id").where("gear_items.crew_id", crewId);

export function listItems(crewId: string, modelId?: string): Promise<GearItemRow[]> {
  const query = itemsOf(crewId)
    .select(itemColumns(db))
    .orderBy([{ column: "gear_models.name" }, { column: "gear_items.label" }]);
  if (modelId) query.where("gear_items.model_id", modelId);
  return query;
}

export async function findItem(crewId: string, id: string): Promise<GearItemRow | null> {
  return (await itemsOf(crewId).where("gear_items.id", id).first(itemColumns(db))) ?? null;
}

/** True when the database refused a second item of the same model with the same label (migration 20261201000012). */
const isDuplicateLabel = (error: unknown) => isUniqueViolation(error, "gear_items_model_label");

export type ItemCreation = GearItemRow | "model_not_found" | "model_retired" | "duplicate_label";

export async function createItem(crewId: string, item: GearItem): Promise<ItemCreation> {
  const model = await findModel(crewId, item.modelId);
  if (!model) return "model_not_found";
  if (model.retiredOn) return "model_retired";
  try {
    const [{ id }] = await db("gear_items")
      .insert({ crew_id: crewId, model_id: item.modelId, label: item.label, in_service_since: item.inServiceSince, notes: item.notes })
      .returning("id");
    return (await findItem(crewId, id))!;
  } catch (error) {
    if (isDuplicateLabel(error)) return "duplicate_label";
    throw error;
  }
}

export async function updateItem(crewId: string, id: string, item: GearItemEdit): Promise<GearItemRow | null | "duplicate_label"> {
  try {
    const count = await db("gear_items").where({ crew_id: crewId, id }).update({ label: item.label, in_service_since: item.inServiceSince, notes: item.notes });
    return count ? findItem(crewId, id) : null;
  } catch (error) {
    if (isDuplicateLabel(error)) return "duplicate_label";
    throw error;
  }
}

export async function retireItem(crewId: string, id: string, retirement: Retirement): Promise<GearItemRow | null> {
  const count = await db("gear_items").where({ crew_id: crewId, id }).update({ retired_on: retirement.retiredOn, retired_reason: retirement.reason });
  return count ? findItem(crewId, id) : null;
}

/**
 * The items of this crew that a new plan may use: in service, of a model still in service.
 * Returns only those of `ids` that qualify, so the planner can name the ones it must refuse.
 */
export async function itemsInService(crewId: string, ids: readonly string[]): Promise<GearItemRow[]> {
  if (ids.length === 0) return [];
  return itemsOf(crewId).whereIn("gear_items.id", ids).whereNull("gear_items.retired_on").whereNull("gear_models.retired_on").select(itemColumns(db));
}

export function listInspections(crewId: string, itemId: string): Promise<InspectionRow[]> {
  return db("gear_inspections")
    .join("users", "users.id", "gear_inspections.inspected_by")
    .where({ "gear_inspections.crew_id": crewId, "gear_inspections.item_id": itemId })
    .orderBy([
      { column: "gear_inspections.inspected_on", order: "desc" },
      { column: "gear_inspections.created_at", order: "desc" },
    ])
    .select(
      "gear_inspections.id",
      db.raw('inspected_on::text as "inspectedOn"'),
      "gear_inspections.result",
      "gear_inspections.notes",
      db.raw('users.name as "inspectorName"'),
    );
}

/** Records an inspection of an item in service; a retired item is not inspected again (its log is kept as it was). */
export async function addInspection(
  crewId: string,
  itemId: string,
  inspectorId: string,
  inspection: Inspection,
): Promise<InspectionRow | null | { retiredOn: string }> {
  const item = await findItem(crewId, itemId);
  if (!item) return null;
  if (item.retiredOn) return { retiredOn: item.retiredOn };
  const [row] = await db("gear_inspections")
    .insert({
      crew_id: crewId,
      item_id: itemId,
      inspected_by: inspectorId,
      inspected_on: inspection.inspectedOn,
      result: inspection.result,
      notes: inspection.notes,
    })
    .returning(["id", db.raw('inspected_on::text as "inspectedOn"'), "result", "notes"]);
  const inspector = await db("users").where({ id: inspectorId }).first("name");
  return { ...row, inspectorName: inspector.name };
}
