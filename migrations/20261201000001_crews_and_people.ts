import type { Knex } from "knex";

// People, crews and who holds which role in which crew; sessions for sign-in.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable("users", (t) => {
    t.text("id").primary();
    t.text("email").notNullable().unique();
    t.text("name").notNullable();
    t.text("password_hash").notNullable();
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });
  await knex.raw("ALTER TABLE users ADD CONSTRAINT users_email_lowercase CHECK (email = lower(email))");

  await knex.schema.createTable("sessions", (t) => {
    t.text("id").primary();
    t.text("user_id").notNullable().references("users.id").onDelete("CASCADE");
    t.timestamp("expires_at", { useTz: true }).notNullable();
    t.index(["user_id"]);
  });

  await knex.schema.createTable("crews", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.text("name").notNullable();
    t.text("units").notNullable().defaultTo("si");
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });
  await knex.raw("ALTER TABLE crews ADD CONSTRAINT crews_units CHECK (units IN ('si', 'us'))");

  await knex.schema.createTable("crew_members", (t) => {
    t.uuid("crew_id").notNullable().references("crews.id").onDelete("CASCADE");
    t.text("user_id").notNullable().references("users.id").onDelete("CASCADE");
    t.text("role").notNullable();
    t.timestamp("joined_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.primary(["crew_id", "user_id"]);
    t.index(["user_id"]);
  });
  await knex.raw("ALTER TABLE crew_members ADD CONSTRAINT crew_members_role CHECK (role IN ('member', 'rigger', 'lead', 'owner'))");
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable("crew_members");
  await knex.schema.dropTable("crews");
  await knex.schema.dropTable("sessions");
  await knex.schema.dropTable("users");
}
