import type { Knex } from "knex";

// The crew's minimum clearance between a walker's lowest point after a fall and the ground, metres.
// The default of 2 m is common practice, no source; every crew sets its own.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable("crews", (t) => {
    t.double("min_clearance_m").notNullable().defaultTo(2);
  });
  await knex.raw("ALTER TABLE crews ADD CONSTRAINT crews_min_clearance_m CHECK (min_clearance_m >= 0 AND min_clearance_m <= 100)");
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable("crews", (t) => {
    t.dropColumn("min_clearance_m");
  });
}
