import type { Knex } from "knex";
import { DEFAULT_BUILD_STAGES } from "../../lib/workflow/stages";
import { tableOptions, timestamps, workshopScope } from "../schema-helpers";

// Commissions and what hangs off them: spec versions, stage history, comments, payments.
// Every table carries workshop_id, and every list query's index starts with it.

const userRef = (t: Knex.CreateTableBuilder, name: string, nullable = false) => {
  const c = t.integer(name).unsigned().references("id").inTable("users").onDelete("RESTRICT");
  return nullable ? c.nullable() : c.notNullable();
};

export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable("workshops", (t) => {
    t.decimal("deposit_percent", 5, 2).notNullable().defaultTo(30);
    t.json("build_stages").nullable();
    t.boolean("require_stage_signoff").notNullable().defaultTo(false);
    t.string("email_sender_name", 120).nullable();
    t.json("setup_ranges").nullable();
  });
  await knex("workshops").update({ build_stages: JSON.stringify(DEFAULT_BUILD_STAGES) });

  // Per-workshop, per-year running numbers ("2027-014"), taken under a row lock.
  await knex.schema.createTable("commission_counters", (t) => {
    tableOptions(t);
    workshopScope(t);
    t.smallint("year").unsigned().notNullable();
    t.integer("last_sequence").unsigned().notNullable().defaultTo(0);
    t.primary(["workshop_id", "year"]);
  });

  await knex.schema.createTable("commissions", (t) => {
    tableOptions(t);
    t.increments("id").primary();
    workshopScope(t);
    t.string("number", 16).notNullable();
    userRef(t, "client_user_id");
    userRef(t, "builder_user_id", true);
    t.string("title", 160).notNullable();
    t.bigInteger("price_minor").notNullable().defaultTo(0);
    t.bigInteger("deposit_minor").notNullable().defaultTo(0);
    t.specificType("currency", "char(3)").notNullable();
    t.decimal("deposit_percent", 5, 2).notNullable();
    t.date("target_date").nullable();
    t.string("stage", 40).notNullable().defaultTo("spec");
    t.string("held_from", 40).nullable();
    t.timestamp("stage_entered_at", { precision: 3 }).notNullable().defaultTo(knex.raw("CURRENT_TIMESTAMP(3)"));
    // The stage the client has been told of (lags `stage` while an owner's sign-off is pending).
    t.string("client_stage", 40).notNullable().defaultTo("spec");
    t.text("request_notes").nullable();
    timestamps(t, knex);
    t.unique(["workshop_id", "number"]);
    t.index(["workshop_id", "stage", "updated_at"]);
    t.index(["workshop_id", "updated_at"]);
    t.index(["workshop_id", "target_date"]);
    t.index(["workshop_id", "builder_user_id", "stage"]);
    t.index(["workshop_id", "client_user_id", "updated_at"]);
    t.index(["workshop_id", "title"]);
  });

  await knex.schema.createTable("spec_versions", (t) => {
    tableOptions(t);
    t.increments("id").primary();
    workshopScope(t);
    t.integer("commission_id").unsigned().notNullable().references("id").inTable("commissions").onDelete("CASCADE");
    t.smallint("version").unsigned().notNullable();
    t.json("spec").notNullable();
    t.json("options").notNullable();
    t.json("result").notNullable();
    t.boolean("has_errors").notNullable();
    t.double("total_tension_n").notNullable();
    userRef(t, "created_by");
    t.timestamp("created_at", { precision: 3 }).notNullable().defaultTo(knex.raw("CURRENT_TIMESTAMP(3)"));
    t.timestamp("submitted_at", { precision: 3 }).nullable();
    t.timestamp("approved_at", { precision: 3 }).nullable();
    userRef(t, "approved_by", true);
    t.unique(["commission_id", "version"]);
    t.index(["workshop_id", "commission_id"]);
  });

  await knex.schema.createTable("stage_history", (t) => {
    tableOptions(t);
    t.bigIncrements("id").primary();
    workshopScope(t);
    t.integer("commission_id").unsigned().notNullable().references("id").inTable("commissions").onDelete("CASCADE");
    t.string("from_stage", 40).nullable();
    t.string("to_stage", 40).notNullable();
    t.string("kind", 16).notNullable();
    userRef(t, "actor_user_id", true);
    t.string("note", 1000).nullable();
    t.boolean("needs_signoff").notNullable().defaultTo(false);
    t.timestamp("signed_off_at", { precision: 3 }).nullable();
    userRef(t, "signed_off_by", true);
    t.timestamp("client_notified_at", { precision: 3 }).nullable();
    t.timestamp("created_at", { precision: 3 }).notNullable().defaultTo(knex.raw("CURRENT_TIMESTAMP(3)"));
    t.index(["workshop_id", "commission_id", "created_at"]);
    t.index(["workshop_id", "needs_signoff", "signed_off_at"]);
  });

  await knex.schema.createTable("commission_comments", (t) => {
    tableOptions(t);
    t.bigIncrements("id").primary();
    workshopScope(t);
    t.integer("commission_id").unsigned().notNullable().references("id").inTable("commissions").onDelete("CASCADE");
    userRef(t, "author_user_id");
    t.text("body").notNullable();
    t.timestamp("created_at", { precision: 3 }).notNullable().defaultTo(knex.raw("CURRENT_TIMESTAMP(3)"));
    t.index(["workshop_id", "commission_id", "created_at"]);
  });

  await knex.schema.createTable("payments", (t) => {
    tableOptions(t);
    t.increments("id").primary();
    workshopScope(t);
    t.integer("commission_id").unsigned().notNullable().references("id").inTable("commissions").onDelete("RESTRICT");
    t.enum("kind", ["deposit", "balance", "refund"]).notNullable();
    t.enum("status", ["pending", "paid", "failed", "cancelled"]).notNullable();
    t.enum("method", ["offline", "card"]).notNullable();
    // Positive for money in; a refund row is positive too and subtracts by its kind.
    t.bigInteger("amount_minor").notNullable();
    t.specificType("currency", "char(3)").notNullable();
    t.bigInteger("fee_minor").nullable();
    t.string("reference", 120).nullable();
    t.string("processor_session_id", 120).nullable();
    t.string("processor_payment_id", 120).nullable();
    t.string("processor_refund_id", 120).nullable();
    t.integer("refund_of_payment_id").unsigned().nullable().references("id").inTable("payments");
    t.timestamp("paid_at", { precision: 3 }).nullable();
    userRef(t, "recorded_by", true);
    timestamps(t, knex);
    t.index(["workshop_id", "commission_id", "kind"]);
    t.index(["workshop_id", "paid_at"]);
    t.unique(["processor_session_id"]);
    t.unique(["processor_refund_id"]);
  });
}

export async function down(knex: Knex): Promise<void> {
  for (const t of ["payments", "commission_comments", "stage_history", "spec_versions", "commissions", "commission_counters"]) {
    await knex.schema.dropTableIfExists(t);
  }
  await knex.schema.alterTable("workshops", (t) => {
    t.dropColumns("deposit_percent", "build_stages", "require_stage_signoff", "email_sender_name", "setup_ranges");
  });
}
