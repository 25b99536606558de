import type { Knex } from "knex";

// Sites (the spans a crew rigs) and rigs (plans), each rig a chain of immutable revisions. Every
// reference between crew rows is a composite key on (crew_id, id), so the database itself refuses
// a row that points at another crew's row.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable("sites", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("crew_id").notNullable().references("crews.id").onDelete("CASCADE");
    t.text("name").notNullable();
    t.text("access_notes").notNullable().defaultTo("");
    t.double("span_m").notNullable();
    t.double("height_difference_m").notNullable().defaultTo(0);
    t.text("measured_by").notNullable();
    t.double("uncertainty_m").notNullable();
    // { points: [{ xM, heightM }] } from anchor A, heights relative to A; null when not measured.
    t.jsonb("ground");
    // { a: { kind, …, notes }, b: { … } }
    t.jsonb("anchors").notNullable();
    t.double("latitude");
    t.double("longitude");
    t.timestamp("archived_at", { useTz: true });
    t.text("created_by").references("users.id").onDelete("SET NULL");
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp("updated_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.unique(["crew_id", "id"]);
    t.index(["crew_id", "name"]);
  });
  await knex.raw("ALTER TABLE sites ADD CONSTRAINT sites_span CHECK (span_m > 0)");
  await knex.raw("ALTER TABLE sites ADD CONSTRAINT sites_uncertainty CHECK (uncertainty_m >= 0)");
  await knex.raw("ALTER TABLE sites ADD CONSTRAINT sites_measured_by CHECK (measured_by IN ('laser', 'tape', 'map', 'estimate'))");

  await knex.schema.createTable("rigs", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("crew_id").notNullable().references("crews.id").onDelete("CASCADE");
    t.uuid("site_id");
    t.text("name").notNullable();
    t.text("created_by").references("users.id").onDelete("SET NULL");
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.unique(["crew_id", "id"]);
    t.foreign(["crew_id", "site_id"]).references(["crew_id", "id"]).inTable("sites");
    t.index(["crew_id", "site_id"]);
  });

  await knex.schema.createTable("rig_revisions", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("crew_id").notNullable();
    t.uuid("rig_id").notNullable();
    t.integer("number").notNullable();
    t.uuid("based_on_id");
    t.text("state").notNullable().defaultTo("draft");
    // The engine's input as evaluated (SI), with the Kit model ids the planner picked.
    t.jsonb("inputs").notNullable();
    // The site and the gear as they were when this revision was saved (figures and Kit model ids).
    t.jsonb("snapshot").notNullable();
    t.jsonb("result").notNullable();
    t.text("engine_version").notNullable();
    // Taken from the inputs for the rigs list's filters.
    t.double("span_m").notNullable();
    t.text("mainline_name").notNullable();
    t.text("author_id").references("users.id").onDelete("SET NULL");
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.unique(["crew_id", "id"]);
    t.unique(["rig_id", "number"]);
    t.foreign(["crew_id", "rig_id"]).references(["crew_id", "id"]).inTable("rigs").onDelete("CASCADE");
    t.foreign(["crew_id", "based_on_id"]).references(["crew_id", "id"]).inTable("rig_revisions");
    t.index(["crew_id", "rig_id"]);
  });
  await knex.raw("ALTER TABLE rig_revisions ADD CONSTRAINT rig_revisions_state CHECK (state IN ('draft', 'in_review', 'signed_off', 'superseded'))");
  await knex.raw("ALTER TABLE rig_revisions ADD CONSTRAINT rig_revisions_number CHECK (number >= 1)");
  // A revision's content never changes once written, whoever sends the UPDATE: only its state moves.
  await knex.raw(`
    CREATE FUNCTION rig_revision_content_is_fixed() RETURNS trigger LANGUAGE plpgsql AS $$
    BEGIN
      IF (NEW.crew_id, NEW.rig_id, NEW.number, NEW.based_on_id, NEW.inputs, NEW.snapshot, NEW.result, NEW.engine_version, NEW.span_m, NEW.mainline_name, NEW.author_id, NEW.created_at)
         IS DISTINCT FROM
         (OLD.crew_id, OLD.rig_id, OLD.number, OLD.based_on_id, OLD.inputs, OLD.snapshot, OLD.result, OLD.engine_version, OLD.span_m, OLD.mainline_name, OLD.author_id, OLD.created_at)
      THEN
        RAISE EXCEPTION 'a rig revision is immutable: save a new revision instead' USING ERRCODE = 'integrity_constraint_violation';
      END IF;
      RETURN NEW;
    END $$`);
  await knex.raw("CREATE TRIGGER rig_revisions_content_fixed BEFORE UPDATE ON rig_revisions FOR EACH ROW EXECUTE FUNCTION rig_revision_content_is_fixed()");

  // Site photos go through the same uploads as the Kit's.
  await knex.schema.alterTable("uploads", (t) => {
    t.uuid("site_id");
    t.foreign(["crew_id", "site_id"]).references(["crew_id", "id"]).inTable("sites").onDelete("CASCADE");
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable("uploads", (t) => {
    t.dropForeign(["crew_id", "site_id"]);
    t.dropColumn("site_id");
  });
  await knex.schema.dropTable("rig_revisions");
  await knex.raw("DROP FUNCTION rig_revision_content_is_fixed()");
  await knex.schema.dropTable("rigs");
  await knex.schema.dropTable("sites");
}
