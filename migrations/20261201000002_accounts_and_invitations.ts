import type { Knex } from "knex";

// Crew settings, invitations, password resets, session details and the sign-in rate limits.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable("crews", (t) => {
    // Minimum safety factors per component class; the defaults are common practice, no source.
    t.jsonb("min_safety_factors")
      .notNullable()
      .defaultTo(JSON.stringify({ webbing: 3, rope: 3, anchor: 3, connector: 3, sling: 3, pulley: 3, brake: 3 }));
    t.boolean("allow_self_sign_off").notNullable().defaultTo(false);
  });

  await knex.schema.alterTable("sessions", (t) => {
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.text("user_agent");
  });

  await knex.schema.createTable("invitations", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("crew_id").notNullable().references("crews.id").onDelete("CASCADE");
    t.text("email").notNullable();
    t.text("role").notNullable();
    t.text("token_hash").notNullable().unique();
    t.text("invited_by").references("users.id").onDelete("SET NULL");
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp("expires_at", { useTz: true }).notNullable();
    t.timestamp("accepted_at", { useTz: true });
    t.text("accepted_by").references("users.id").onDelete("SET NULL");
    t.timestamp("revoked_at", { useTz: true });
    t.index(["crew_id"]);
  });
  await knex.raw("ALTER TABLE invitations ADD CONSTRAINT invitations_role CHECK (role IN ('member', 'rigger', 'lead', 'owner'))");

  await knex.schema.createTable("password_resets", (t) => {
    t.text("token_hash").primary();
    t.text("user_id").notNullable().references("users.id").onDelete("CASCADE");
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp("expires_at", { useTz: true }).notNullable();
    t.timestamp("used_at", { useTz: true });
    t.index(["user_id"]);
  });

  // The table rate-limiter-flexible's PostgreSQL store uses, created here rather than at run time.
  await knex.schema.createTable("rate_limits", (t) => {
    t.string("key", 255).primary();
    t.integer("points").notNullable().defaultTo(0);
    t.bigInteger("expire");
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable("rate_limits");
  await knex.schema.dropTable("password_resets");
  await knex.schema.dropTable("invitations");
  await knex.schema.alterTable("sessions", (t) => {
    t.dropColumn("user_agent");
    t.dropColumn("created_at");
  });
  await knex.schema.alterTable("crews", (t) => {
    t.dropColumn("allow_self_sign_off");
    t.dropColumn("min_safety_factors");
  });
}
