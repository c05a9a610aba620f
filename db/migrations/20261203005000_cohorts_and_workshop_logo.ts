import type { Knex } from "knex";
import { tableOptions, timestamps, workshopScope } from "../schema-helpers";

// Course cohorts (a school's production course: name, dates, its builders), the cohort a
// commission belongs to, and a reference to the workshop's logo file (uploaded through the
// photo pipeline; only the file key is kept here).

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable("cohorts", (t) => {
    tableOptions(t);
    t.increments("id").primary();
    workshopScope(t);
    t.string("name", 120).notNullable();
    t.date("starts_on").notNullable();
    t.date("ends_on").notNullable();
    timestamps(t, knex);
    t.unique(["workshop_id", "name"]);
    t.index(["workshop_id", "starts_on"]);
  });

  await knex.schema.createTable("cohort_builders", (t) => {
    tableOptions(t);
    workshopScope(t);
    t.integer("cohort_id").unsigned().notNullable().references("id").inTable("cohorts").onDelete("CASCADE");
    t.integer("user_id").unsigned().notNullable().references("id").inTable("users").onDelete("CASCADE");
    t.primary(["cohort_id", "user_id"]);
    // "The cohorts of this builder" (a builder sees theirs).
    t.index(["workshop_id", "user_id"]);
  });

  await knex.schema.alterTable("commissions", (t) => {
    t.integer("cohort_id").unsigned().nullable().references("id").inTable("cohorts").onDelete("SET NULL");
    t.index(["workshop_id", "cohort_id", "stage"]);
  });

  await knex.schema.alterTable("workshops", (t) => {
    t.string("logo_file_key", 191).nullable();
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable("workshops", (t) => {
    t.dropColumn("logo_file_key");
  });
  await knex.schema.alterTable("commissions", (t) => {
    t.dropForeign(["cohort_id"]);
    t.dropIndex(["workshop_id", "cohort_id", "stage"]);
    t.dropColumn("cohort_id");
  });
  await knex.schema.dropTableIfExists("cohort_builders");
  await knex.schema.dropTableIfExists("cohorts");
}
