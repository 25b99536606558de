import type { Knex } from "knex";

// The Kit: a crew's gear models, the items it owns of each, their inspections, and uploaded files
// (traces, photos, manuals) whose bytes live in S3.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable("gear_models", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("crew_id").notNullable().references("crews.id").onDelete("CASCADE");
    t.text("kind").notNullable();
    t.text("name").notNullable();
    t.jsonb("specs").notNullable();
    t.text("notes").notNullable().defaultTo("");
    t.date("retired_on");
    t.text("retired_reason");
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp("updated_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(["crew_id", "kind"]);
  });
  await knex.raw(
    "ALTER TABLE gear_models ADD CONSTRAINT gear_models_kind CHECK (kind IN ('webbing', 'rope', 'brake', 'line_grip', 'pulley', 'connector', 'sling', 'other'))",
  );

  await knex.schema.createTable("gear_items", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("crew_id").notNullable().references("crews.id").onDelete("CASCADE");
    t.uuid("model_id").notNullable().references("gear_models.id").onDelete("CASCADE");
    t.text("label").notNullable();
    t.date("in_service_since").notNullable();
    t.text("notes").notNullable().defaultTo("");
    t.date("retired_on");
    t.text("retired_reason");
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(["crew_id", "model_id"]);
  });

  await knex.schema.createTable("gear_inspections", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("crew_id").notNullable().references("crews.id").onDelete("CASCADE");
    t.uuid("item_id").notNullable().references("gear_items.id").onDelete("CASCADE");
    t.text("inspected_by").notNullable().references("users.id");
    t.date("inspected_on").notNullable();
    t.text("result").notNullable();
    t.text("notes").notNullable().defaultTo("");
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(["crew_id", "item_id"]);
  });
  await knex.raw("ALTER TABLE gear_inspections ADD CONSTRAINT gear_inspections_result CHECK (result IN ('pass', 'watch', 'fail'))");

  await knex.schema.createTable("uploads", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("crew_id").notNullable().references("crews.id").onDelete("CASCADE");
    t.text("purpose").notNullable();
    t.text("storage_key").notNullable().unique();
    t.text("file_name").notNullable();
    t.text("content_type").notNullable();
    t.bigInteger("byte_size").notNullable();
    t.text("sha256").notNullable();
    t.uuid("model_id").references("gear_models.id").onDelete("CASCADE");
    t.uuid("item_id").references("gear_items.id").onDelete("CASCADE");
    // For traces: the parsed summary, detected onset and the points the chart draws.
    t.jsonb("analysis");
    t.text("uploaded_by").notNullable().references("users.id");
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(["crew_id", "purpose"]);
  });
  await knex.raw("ALTER TABLE uploads ADD CONSTRAINT uploads_purpose CHECK (purpose IN ('trace', 'photo', 'manual'))");
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable("uploads");
  await knex.schema.dropTable("gear_inspections");
  await knex.schema.dropTable("gear_items");
  await knex.schema.dropTable("gear_models");
}
