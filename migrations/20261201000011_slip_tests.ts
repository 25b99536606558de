import type { Knex } from "knex";

// Slip tests of brakes and line grips, and the revocable read-only links to a crew's slip table.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable("slip_tests", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("crew_id").notNullable().references("crews.id").onDelete("CASCADE");
    t.uuid("device_model_id").notNullable().references("gear_models.id").onDelete("CASCADE");
    t.uuid("rope_model_id").references("gear_models.id").onDelete("SET NULL");
    t.decimal("rope_diameter_mm", 4, 1).notNullable();
    t.text("result").notNullable();
    t.double("force_n").notNullable();
    // The unit the tester worked in, so the value is shown back as it was entered.
    t.text("force_unit").notNullable();
    t.date("tested_on").notNullable();
    t.text("tested_by").notNullable().references("users.id");
    t.text("notes").notNullable().defaultTo("");
    t.uuid("trace_upload_id").references("uploads.id").onDelete("SET NULL");
    // What the engine detected in the trace, kept beside what the tester confirmed.
    t.text("detected_result");
    t.double("detected_force_n");
    t.text("engine_version");
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(["crew_id", "device_model_id", "rope_diameter_mm"]);
  });
  await knex.raw("ALTER TABLE slip_tests ADD CONSTRAINT slip_tests_result CHECK (result IN ('slipped', 'held'))");
  await knex.raw("ALTER TABLE slip_tests ADD CONSTRAINT slip_tests_force CHECK (force_n > 0)");

  await knex.schema.createTable("slip_table_links", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("crew_id").notNullable().references("crews.id").onDelete("CASCADE");
    // Only the SHA-256 of the token is kept: the link itself is shown once, to the lead who made it.
    t.text("token_sha256").notNullable().unique();
    t.text("created_by").notNullable().references("users.id");
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp("revoked_at", { useTz: true });
    t.index(["crew_id"]);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable("slip_table_links");
  await knex.schema.dropTable("slip_tests");
}
