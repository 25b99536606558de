import type { Knex } from "knex";

// Within a gear model, each item's serial or label names one piece: two items may not share it, whatever
// its case. Existing duplicates are named and the migration stops, rather than renaming anything a crew saved.
export async function up(knex: Knex): Promise<void> {
  const duplicates: { name: string; label: string }[] = await knex("gear_items")
    .join("gear_models", "gear_models.id", "gear_items.model_id")
    .groupBy("gear_models.id", "gear_models.name", knex.raw("lower(gear_items.label)"))
    .havingRaw("count(*) > 1")
    .select("gear_models.name", knex.raw("min(gear_items.label) as label"));
  if (duplicates.length) {
    const named = duplicates.map((d) => `"${d.label}" of ${d.name}`).join(", ");
    throw new Error(`Items share a label within their model (${named}): give each its own label, then migrate again.`);
  }
  await knex.raw("CREATE UNIQUE INDEX gear_items_model_label ON gear_items (model_id, lower(label))");
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw("DROP INDEX gear_items_model_label");
}
