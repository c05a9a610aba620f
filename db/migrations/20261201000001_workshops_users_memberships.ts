import type { Knex } from "knex";
import { tableOptions, timestamps, workshopScope } from "../schema-helpers";

export const ROLES = ["owner", "builder", "bookkeeper", "client"] as const;

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable("workshops", (t) => {
    tableOptions(t);
    t.increments("id").primary();
    t.string("slug", 64).notNullable().unique();
    t.string("name", 120).notNullable();
    t.enum("unit_preference", ["mm", "in"]).notNullable().defaultTo("mm");
    t.specificType("currency", "char(3)").notNullable().defaultTo("EUR");
    timestamps(t, knex);
  });

  await knex.schema.createTable("users", (t) => {
    tableOptions(t);
    t.increments("id").primary();
    t.string("email", 254).notNullable().unique();
    t.string("name", 120).notNullable();
    t.string("password_hash", 255).nullable();
    t.timestamp("email_verified_at", { precision: 3 }).nullable();
    timestamps(t, knex);
  });

  await knex.schema.createTable("memberships", (t) => {
    tableOptions(t);
    t.increments("id").primary();
    workshopScope(t);
    t.integer("user_id").unsigned().notNullable().references("id").inTable("users").onDelete("CASCADE");
    t.enum("role", [...ROLES]).notNullable();
    timestamps(t, knex);
    t.unique(["workshop_id", "user_id"]);
    t.index(["user_id"]);
    t.index(["workshop_id", "role"]);
  });

  await knex.schema.createTable("audit_log", (t) => {
    tableOptions(t);
    t.bigIncrements("id").primary();
    // Nullable: a few events (sign-in lockouts, account changes) belong to no workshop.
    t.integer("workshop_id").unsigned().nullable().references("id").inTable("workshops").onDelete("CASCADE");
    t.integer("actor_user_id").unsigned().nullable().references("id").inTable("users").onDelete("SET NULL");
    t.string("action", 64).notNullable();
    t.string("entity_type", 48).notNullable();
    t.string("entity_id", 64).nullable();
    t.json("data").nullable();
    t.timestamp("created_at", { precision: 3 }).notNullable().defaultTo(knex.raw("CURRENT_TIMESTAMP(3)"));
    t.index(["workshop_id", "created_at"]);
    t.index(["actor_user_id"]);
    t.index(["entity_type", "entity_id"]);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTableIfExists("audit_log");
  await knex.schema.dropTableIfExists("memberships");
  await knex.schema.dropTableIfExists("users");
  await knex.schema.dropTableIfExists("workshops");
}
