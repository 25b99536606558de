import type { Knex } from "knex";

// Review and sign-off, the audit log, reuse, on-site checklists and measured tension. What is signed
// off, the sign-off itself and the audit log are kept by triggers: no UPDATE or DELETE gets through,
// whoever sends it. The only change a signed-off revision takes is to become superseded.
// As the sites-and-rigs migration wrote it: a revision's content never changes.
const CONTENT_IS_FIXED = `
      IF (NEW.crew_id, NEW.rig_id, NEW.number, NEW.based_on_id, NEW.inputs, NEW.snapshot, NEW.result, NEW.engine_version, NEW.span_m, NEW.mainline_name, NEW.author_id, NEW.created_at)
         IS DISTINCT FROM
         (OLD.crew_id, OLD.rig_id, OLD.number, OLD.based_on_id, OLD.inputs, OLD.snapshot, OLD.result, OLD.engine_version, OLD.span_m, OLD.mainline_name, OLD.author_id, OLD.created_at)
      THEN
        RAISE EXCEPTION 'a rig revision is immutable: save a new revision instead' USING ERRCODE = 'integrity_constraint_violation';
      END IF;`;

export async function up(knex: Knex): Promise<void> {
  await knex.raw(`
    CREATE OR REPLACE FUNCTION rig_revision_content_is_fixed() RETURNS trigger LANGUAGE plpgsql AS $$
    BEGIN
      ${CONTENT_IS_FIXED}
      IF NEW.state IS DISTINCT FROM OLD.state AND NOT (
           (OLD.state = 'draft' AND NEW.state = 'in_review')
        OR (OLD.state = 'in_review' AND NEW.state IN ('draft', 'signed_off'))
        OR (OLD.state = 'signed_off' AND NEW.state = 'superseded'))
      THEN
        RAISE EXCEPTION 'a rig revision cannot go from % to %', OLD.state, NEW.state USING ERRCODE = 'integrity_constraint_violation';
      END IF;
      RETURN NEW;
    END $$`);
  await knex.raw(`
    CREATE FUNCTION signed_off_revision_is_kept() RETURNS trigger LANGUAGE plpgsql AS $$
    BEGIN
      IF OLD.state IN ('signed_off', 'superseded') THEN
        RAISE EXCEPTION 'a signed-off rig revision is kept for good' USING ERRCODE = 'integrity_constraint_violation';
      END IF;
      RETURN OLD;
    END $$`);
  await knex.raw("CREATE TRIGGER rig_revisions_signed_off_kept BEFORE DELETE ON rig_revisions FOR EACH ROW EXECUTE FUNCTION signed_off_revision_is_kept()");
  await knex.raw(`
    CREATE FUNCTION row_is_append_only() RETURNS trigger LANGUAGE plpgsql AS $$
    BEGIN
      RAISE EXCEPTION '% rows are never changed or removed', TG_TABLE_NAME USING ERRCODE = 'integrity_constraint_violation';
    END $$`);

  // One sign-off a revision (the unique key is what makes exactly one of many parallel sign-offs stand).
  await knex.schema.createTable("sign_offs", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("crew_id").notNullable();
    t.uuid("rig_id").notNullable();
    t.uuid("revision_id").notNullable().unique();
    // Who signed, kept as written then: the record outlives an account.
    t.text("signed_by_id").notNullable();
    t.text("signed_by_name").notNullable();
    t.text("statement").notNullable();
    // SHA-256 (hex) over the RFC 8785 canonical JSON of { inputs, result, engineVersion }.
    t.text("content_hash").notNullable();
    t.text("engine_version").notNullable();
    t.timestamp("signed_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.foreign(["crew_id", "revision_id"]).references(["crew_id", "id"]).inTable("rig_revisions");
    t.foreign(["crew_id", "rig_id"]).references(["crew_id", "id"]).inTable("rigs");
  });

  // Each step of a rig's life: who did what, when, with the note they gave.
  await knex.schema.createTable("audit_log", (t) => {
    t.bigIncrements("id");
    t.uuid("crew_id").notNullable().references("crews.id");
    t.uuid("rig_id");
    t.uuid("revision_id");
    t.text("actor_id").notNullable();
    t.text("actor_name").notNullable();
    t.text("action").notNullable();
    t.text("note");
    t.jsonb("detail");
    t.timestamp("at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.foreign(["crew_id", "rig_id"]).references(["crew_id", "id"]).inTable("rigs");
    t.foreign(["crew_id", "revision_id"]).references(["crew_id", "id"]).inTable("rig_revisions");
    t.index(["crew_id", "rig_id", "at"]);
  });

  for (const table of ["sign_offs", "audit_log"]) {
    await knex.raw(`CREATE TRIGGER ${table}_append_only BEFORE UPDATE OR DELETE ON ${table} FOR EACH ROW EXECUTE FUNCTION row_is_append_only()`);
  }

  // "Use this rig": a rig started from a signed-off revision keeps a link to it.
  await knex.schema.alterTable("rigs", (t) => {
    t.uuid("reused_from_revision_id");
    t.foreign(["crew_id", "reused_from_revision_id"]).references(["crew_id", "id"]).inTable("rig_revisions");
  });

  // The crew's on-site checklist: its items in order, edited by leads.
  await knex.schema.createTable("checklist_templates", (t) => {
    t.uuid("crew_id").primary().references("crews.id").onDelete("CASCADE");
    // [{ id, text }]
    t.jsonb("items").notNullable();
    t.text("updated_by").references("users.id").onDelete("SET NULL");
    t.timestamp("updated_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });

  // A checklist run on one revision keeps the items as they read when it started.
  await knex.schema.createTable("checklist_runs", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("crew_id").notNullable();
    t.uuid("rig_id").notNullable();
    t.uuid("revision_id").notNullable();
    t.jsonb("items").notNullable();
    t.text("started_by_id").notNullable();
    t.text("started_by_name").notNullable();
    t.timestamp("started_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.uuid("idempotency_key");
    t.unique(["crew_id", "id"]);
    t.unique(["crew_id", "idempotency_key"]);
    t.foreign(["crew_id", "revision_id"]).references(["crew_id", "id"]).inTable("rig_revisions");
    t.foreign(["crew_id", "rig_id"]).references(["crew_id", "id"]).inTable("rigs");
    t.index(["crew_id", "revision_id"]);
  });

  // Each tick (or untick) as it was made; an item's state is its latest tick.
  await knex.schema.createTable("checklist_ticks", (t) => {
    t.bigIncrements("id");
    t.uuid("crew_id").notNullable();
    t.uuid("run_id").notNullable();
    t.text("item_id").notNullable();
    t.boolean("checked").notNullable();
    t.text("ticked_by_id").notNullable();
    t.text("ticked_by_name").notNullable();
    t.timestamp("ticked_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.uuid("idempotency_key");
    t.unique(["crew_id", "idempotency_key"]);
    t.foreign(["crew_id", "run_id"]).references(["crew_id", "id"]).inTable("checklist_runs");
    t.index(["crew_id", "run_id"]);
  });

  // A load-cell reading on site against the revision rigged, with the engine's prediction for the same conditions.
  await knex.schema.createTable("tension_readings", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("crew_id").notNullable();
    t.uuid("rig_id").notNullable();
    t.uuid("revision_id").notNullable();
    t.text("kind").notNullable();
    t.text("anchor").notNullable();
    t.double("measured_n").notNullable();
    t.double("sag_m");
    t.double("walker_mass_kg");
    t.double("walker_position_m");
    t.double("predicted_n").notNullable();
    t.text("engine_version").notNullable();
    t.text("mainline_name").notNullable();
    t.text("note").notNullable().defaultTo("");
    t.text("recorded_by_id").notNullable();
    t.text("recorded_by_name").notNullable();
    t.timestamp("recorded_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.uuid("idempotency_key");
    t.unique(["crew_id", "idempotency_key"]);
    t.foreign(["crew_id", "revision_id"]).references(["crew_id", "id"]).inTable("rig_revisions");
    t.foreign(["crew_id", "rig_id"]).references(["crew_id", "id"]).inTable("rigs");
    t.index(["crew_id", "mainline_name"]);
  });
  await knex.raw("ALTER TABLE tension_readings ADD CONSTRAINT tension_readings_kind CHECK (kind IN ('pretension', 'walker'))");
  await knex.raw("ALTER TABLE tension_readings ADD CONSTRAINT tension_readings_anchor CHECK (anchor IN ('a', 'b'))");
  await knex.raw(`ALTER TABLE tension_readings ADD CONSTRAINT tension_readings_conditions CHECK (
    (kind = 'pretension' AND sag_m IS NOT NULL) OR (kind = 'walker' AND walker_mass_kg IS NOT NULL AND walker_position_m IS NOT NULL))`);
}

export async function down(knex: Knex): Promise<void> {
  for (const table of ["tension_readings", "checklist_ticks", "checklist_runs", "checklist_templates"]) await knex.schema.dropTable(table);
  await knex.schema.alterTable("rigs", (t) => {
    t.dropForeign(["crew_id", "reused_from_revision_id"]);
    t.dropColumn("reused_from_revision_id");
  });
  await knex.schema.dropTable("audit_log");
  await knex.schema.dropTable("sign_offs");
  await knex.raw("DROP FUNCTION row_is_append_only()");
  await knex.raw("DROP TRIGGER rig_revisions_signed_off_kept ON rig_revisions");
  await knex.raw("DROP FUNCTION signed_off_revision_is_kept()");
  await knex.raw(`
    CREATE OR REPLACE FUNCTION rig_revision_content_is_fixed() RETURNS trigger LANGUAGE plpgsql AS $$
    BEGIN
      ${CONTENT_IS_FIXED}
      RETURN NEW;
    END $$`);
}
