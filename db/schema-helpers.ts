import type { Knex } from "knex";

/** created_at / updated_at in UTC with millisecond precision; updated_at maintained by the server. */
export function timestamps(t: Knex.CreateTableBuilder, knex: Knex): void {
  t.timestamp("created_at", { precision: 3 }).notNullable().defaultTo(knex.raw("CURRENT_TIMESTAMP(3)"));
  t.timestamp("updated_at", { precision: 3 })
    .notNullable()
    .defaultTo(knex.raw("CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3)"));
}

/** Every table: InnoDB and utf8mb4, whatever the server default is. */
export function tableOptions(t: Knex.CreateTableBuilder): void {
  t.engine("InnoDB");
  t.charset("utf8mb4");
  t.collate("utf8mb4_unicode_ci");
}

/** A required reference to workshops(id), indexed, removed with its workshop. */
export function workshopScope(t: Knex.CreateTableBuilder): void {
  t.integer("workshop_id").unsigned().notNullable().references("id").inTable("workshops").onDelete("CASCADE");
  t.index(["workshop_id"]);
}
