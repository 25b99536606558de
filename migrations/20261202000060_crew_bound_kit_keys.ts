import type { Knex } from "knex";

// Kit rows point at other Kit rows of the same crew only: each foreign key names the crew too, so the
// database itself refuses an item of one crew on another crew's model, whatever a query forgets.

const PARENTS = ["gear_models", "gear_items", "uploads"];

// child table, column, parent table, what deleting the parent does.
const KEYS: [string, string, string, string][] = [
  ["gear_items", "model_id", "gear_models", "CASCADE"],
  ["gear_inspections", "item_id", "gear_items", "CASCADE"],
  ["uploads", "model_id", "gear_models", "CASCADE"],
  ["uploads", "item_id", "gear_items", "CASCADE"],
  ["slip_tests", "device_model_id", "gear_models", "CASCADE"],
  // Only the link is cleared when the rope or the trace goes: the test itself stays, in its crew.
  ["slip_tests", "rope_model_id", "gear_models", "SET NULL (rope_model_id)"],
  ["slip_tests", "trace_upload_id", "uploads", "SET NULL (trace_upload_id)"],
];

export async function up(knex: Knex): Promise<void> {
  for (const parent of PARENTS) await knex.raw(`ALTER TABLE ?? ADD CONSTRAINT ?? UNIQUE (crew_id, id)`, [parent, `${parent}_crew_id_id_unique`]);
  for (const [child, column, parent, onDelete] of KEYS) {
    await knex.raw(`ALTER TABLE ?? DROP CONSTRAINT ??`, [child, `${child}_${column}_foreign`]);
    await knex.raw(`ALTER TABLE ?? ADD CONSTRAINT ?? FOREIGN KEY (crew_id, ??) REFERENCES ?? (crew_id, id) ON DELETE ${onDelete}`, [
      child,
      `${child}_crew_id_${column}_foreign`,
      column,
      parent,
    ]);
  }
}

export async function down(knex: Knex): Promise<void> {
  for (const [child, column, parent, onDelete] of KEYS) {
    await knex.raw(`ALTER TABLE ?? DROP CONSTRAINT ??`, [child, `${child}_crew_id_${column}_foreign`]);
    await knex.raw(`ALTER TABLE ?? ADD CONSTRAINT ?? FOREIGN KEY (??) REFERENCES ?? (id) ON DELETE ${onDelete.replace(/ \(.*\)$/, "")}`, [
      child,
      `${child}_${column}_foreign`,
      column,
      parent,
    ]);
  }
  for (const parent of PARENTS) await knex.raw(`ALTER TABLE ?? DROP CONSTRAINT ??`, [parent, `${parent}_crew_id_id_unique`]);
}
