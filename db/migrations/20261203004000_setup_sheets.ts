import type { Knex } from "knex";
import { tableOptions, workshopScope } from "../schema-helpers";

// Final setup sheets: one row per revision of a commission's sheet. The highest revision is the
// current one. A revision is locked once the builder signs it (builder_signed_at); it counts as
// signed (signed_at) when every sign-off the workshop asks for is in. Reopening a locked sheet
// adds the next revision; earlier ones are never changed again. Values are millimetres, newtons
// and cents (lib/schemas/setup-sheet.ts).

const userRef = (t: Knex.CreateTableBuilder, name: string, nullable: boolean) => {
  const c = t.integer(name).unsigned().references("id").inTable("users").onDelete("RESTRICT");
  return nullable ? c.nullable() : c.notNullable();
};

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable("setup_sheets", (t) => {
    tableOptions(t);
    t.increments("id").primary();
    workshopScope(t);
    t.integer("commission_id").unsigned().notNullable().references("id").inTable("commissions").onDelete("CASCADE");
    t.smallint("revision").unsigned().notNullable();
    // The approved spec version the measurements were taken against.
    t.integer("spec_version_id").unsigned().nullable().references("id").inTable("spec_versions").onDelete("SET NULL");
    t.json("sheet_values").notNullable();
    t.string("reopen_note", 1000).nullable();
    userRef(t, "created_by", false);
    userRef(t, "updated_by", false);
    t.timestamp("builder_signed_at", { precision: 3 }).nullable();
    userRef(t, "builder_signed_by", true);
    t.timestamp("owner_signed_at", { precision: 3 }).nullable();
    userRef(t, "owner_signed_by", true);
    t.timestamp("signed_at", { precision: 3 }).nullable();
    t.timestamp("created_at", { precision: 3 }).notNullable().defaultTo(knex.raw("CURRENT_TIMESTAMP(3)"));
    t.timestamp("updated_at", { precision: 3 }).notNullable().defaultTo(knex.raw("CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3)"));
    t.unique(["commission_id", "revision"]);
    t.index(["workshop_id", "commission_id", "revision"]);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTableIfExists("setup_sheets");
}
