import type { Knex } from "knex";
import { tableOptions, timestamps, workshopScope } from "../schema-helpers";
import { ROLES } from "./20261201000001_workshops_users_memberships";

// Sign-in support (magic-link tokens, password resets, failed sign-ins), invitations and the
// e-mail outbox. Every token is stored as a SHA-256 hex digest, never in the clear.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable("users", (t) => {
    // Sessions issued before this instant are refused (set by a password reset or change).
    t.timestamp("sessions_valid_after", { precision: 3 }).nullable();
  });

  // Auth.js e-mail sign-in tokens (adapter: lib/auth/adapter.ts).
  await knex.schema.createTable("verification_tokens", (t) => {
    tableOptions(t);
    t.string("identifier", 254).notNullable();
    t.specificType("token", "char(64)").notNullable();
    t.timestamp("expires", { precision: 3 }).notNullable();
    t.primary(["identifier", "token"]);
    t.index(["expires"]);
  });

  await knex.schema.createTable("password_resets", (t) => {
    tableOptions(t);
    t.increments("id").primary();
    t.integer("user_id").unsigned().notNullable().references("id").inTable("users").onDelete("CASCADE");
    t.specificType("token_hash", "char(64)").notNullable().unique();
    t.timestamp("expires_at", { precision: 3 }).notNullable();
    t.timestamp("used_at", { precision: 3 }).nullable();
    t.timestamp("created_at", { precision: 3 }).notNullable().defaultTo(knex.raw("CURRENT_TIMESTAMP(3)"));
    t.index(["user_id"]);
  });

  // One row per failed password sign-in; counted per account and per IP over a sliding window.
  await knex.schema.createTable("sign_in_failures", (t) => {
    tableOptions(t);
    t.bigIncrements("id").primary();
    t.string("account_key", 254).notNullable();
    t.string("ip", 64).notNullable();
    t.timestamp("created_at", { precision: 3 }).notNullable().defaultTo(knex.raw("CURRENT_TIMESTAMP(3)"));
    t.index(["account_key", "created_at"]);
    t.index(["ip", "created_at"]);
  });

  await knex.schema.createTable("invitations", (t) => {
    tableOptions(t);
    t.increments("id").primary();
    workshopScope(t);
    t.string("email", 254).notNullable();
    t.enum("role", [...ROLES]).notNullable();
    t.specificType("token_hash", "char(64)").notNullable().unique();
    t.integer("invited_by_user_id").unsigned().nullable().references("id").inTable("users").onDelete("SET NULL");
    t.timestamp("expires_at", { precision: 3 }).notNullable();
    t.timestamp("accepted_at", { precision: 3 }).nullable();
    t.integer("accepted_by_user_id").unsigned().nullable().references("id").inTable("users").onDelete("SET NULL");
    t.timestamp("revoked_at", { precision: 3 }).nullable();
    timestamps(t, knex);
    t.index(["workshop_id", "email"]);
  });

  await knex.schema.createTable("email_outbox", (t) => {
    tableOptions(t);
    t.bigIncrements("id").primary();
    // Nullable: sign-in links and password resets belong to no workshop.
    t.integer("workshop_id").unsigned().nullable().references("id").inTable("workshops").onDelete("CASCADE");
    t.string("template", 64).notNullable();
    t.string("to_address", 254).notNullable();
    t.string("subject", 200).notNullable();
    t.json("props").notNullable();
    t.string("idempotency_key", 64).notNullable().unique();
    t.enum("status", ["pending", "sending", "sent", "failed"]).notNullable().defaultTo("pending");
    t.integer("attempts").unsigned().notNullable().defaultTo(0);
    t.timestamp("next_attempt_at", { precision: 3 }).notNullable().defaultTo(knex.raw("CURRENT_TIMESTAMP(3)"));
    // A claimed message whose worker died is picked up again after this instant.
    t.timestamp("locked_until", { precision: 3 }).nullable();
    t.string("last_error", 500).nullable();
    t.string("provider_message_id", 64).nullable();
    t.timestamp("sent_at", { precision: 3 }).nullable();
    timestamps(t, knex);
    t.index(["workshop_id", "status"]);
    t.index(["status", "next_attempt_at"]);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTableIfExists("email_outbox");
  await knex.schema.dropTableIfExists("invitations");
  await knex.schema.dropTableIfExists("sign_in_failures");
  await knex.schema.dropTableIfExists("password_resets");
  await knex.schema.dropTableIfExists("verification_tokens");
  await knex.schema.alterTable("users", (t) => {
    t.dropColumn("sessions_valid_after");
  });
}
