import type { Knex } from "knex";

// A change of e-mail waits here until a link sent to the new address is opened: the address must be proven.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable("email_changes", (t) => {
    t.text("token_hash").primary();
    t.text("user_id").notNullable().references("users.id").onDelete("CASCADE");
    t.text("new_email").notNullable();
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp("expires_at", { useTz: true }).notNullable();
    t.timestamp("used_at", { useTz: true });
    t.index(["user_id"]);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable("email_changes");
}
