import type { Knex } from "knex";
import { tableOptions, workshopScope } from "../schema-helpers";

// Stage photos of a commission. The bytes live at the upload service (private files); a row holds
// the keys of what we serve — a display version and a thumbnail, both re-encoded without their
// metadata — and only exists once both are stored. The uploaded original is deleted after
// processing; `source_key` remembers it so a repeated callback for the same upload is recognised.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable("photos", (t) => {
    tableOptions(t);
    t.increments("id").primary();
    workshopScope(t);
    t.integer("commission_id").unsigned().notNullable().references("id").inTable("commissions").onDelete("CASCADE");
    // The commission's stage when the photo was stored (its held-from stage while on hold).
    t.string("stage", 40).notNullable();
    t.string("caption", 300).notNullable();
    t.integer("uploaded_by").unsigned().notNullable().references("id").inTable("users").onDelete("RESTRICT");
    t.string("source_key", 191).notNullable();
    t.string("original_name", 255).notNullable();
    t.integer("original_bytes").unsigned().notNullable();
    t.string("file_key", 191).notNullable();
    t.integer("file_bytes").unsigned().notNullable();
    t.string("thumb_key", 191).notNullable();
    t.integer("thumb_bytes").unsigned().notNullable();
    t.string("content_type", 64).notNullable();
    t.integer("width").unsigned().notNullable();
    t.integer("height").unsigned().notNullable();
    t.integer("thumb_width").unsigned().notNullable();
    t.integer("thumb_height").unsigned().notNullable();
    t.timestamp("created_at", { precision: 3 }).notNullable().defaultTo(knex.raw("CURRENT_TIMESTAMP(3)"));
    t.timestamp("removed_at", { precision: 3 }).nullable();
    t.integer("removed_by").unsigned().nullable().references("id").inTable("users").onDelete("SET NULL");
    t.unique(["source_key"]);
    t.unique(["file_key"]);
    t.unique(["thumb_key"]);
    t.index(["workshop_id", "commission_id", "removed_at", "created_at"]);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTableIfExists("photos");
}
