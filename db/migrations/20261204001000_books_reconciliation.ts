import type { Knex } from "knex";
import { tableOptions, workshopScope } from "../schema-helpers";

// Reconciling the ledger with the payment processor, one calendar month (UTC) at a time:
//   reconciliation_periods         a month's state: open or locked, when it was last compared
//   reconciliation_matches         each ledger entry paired with the processor's balance transaction
//   reconciliation_exceptions      what did not pair up, by kind, with the bookkeeper's resolution note;
//                                  a fingerprint keeps a resolution across runs of the same month
//   reconciliation_payouts (+ _lines)  the processor's payouts of the month and the transactions in them
//   reconciliation_locked_changes  changes that reached a locked month (the owner's, and processor
//                                  events, which are applied and flagged for the owner to review)

const userRef = (t: Knex.CreateTableBuilder, name: string) => t.integer(name).unsigned().nullable().references("id").inTable("users").onDelete("RESTRICT");
const periodRef = (t: Knex.CreateTableBuilder) =>
  t.integer("period_id").unsigned().notNullable().references("id").inTable("reconciliation_periods").onDelete("CASCADE");
const paymentRef = (t: Knex.CreateTableBuilder) => t.integer("payment_id").unsigned().nullable().references("id").inTable("payments").onDelete("SET NULL");
const ms = (t: Knex.CreateTableBuilder, name: string) => t.timestamp(name, { precision: 3 }).nullable();
const created = (t: Knex.CreateTableBuilder, knex: Knex) =>
  t.timestamp("created_at", { precision: 3 }).notNullable().defaultTo(knex.raw("CURRENT_TIMESTAMP(3)"));

// The kinds as first stored (lib/books/exception-kinds.ts holds their words for people).
const EXCEPTION_KINDS = ["missing_at_processor", "missing_in_ledger", "amount_mismatch", "currency_mismatch", "refund_not_recorded"] as const;

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable("reconciliation_periods", (t) => {
    tableOptions(t);
    t.increments("id").primary();
    workshopScope(t);
    // "2027-03": the calendar month in UTC.
    t.specificType("month", "char(7)").notNullable();
    t.enum("status", ["open", "locked"]).notNullable().defaultTo("open");
    ms(t, "last_run_at");
    userRef(t, "last_run_by");
    t.integer("ledger_entries").unsigned().notNullable().defaultTo(0);
    t.integer("processor_transactions").unsigned().notNullable().defaultTo(0);
    ms(t, "locked_at");
    userRef(t, "locked_by");
    t.string("lock_note", 1000).nullable();
    created(t, knex);
    t.timestamp("updated_at", { precision: 3 }).notNullable().defaultTo(knex.raw("CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3)"));
    t.unique(["workshop_id", "month"]);
  });

  await knex.schema.createTable("reconciliation_matches", (t) => {
    tableOptions(t);
    t.bigIncrements("id").primary();
    workshopScope(t);
    periodRef(t);
    paymentRef(t);
    t.string("balance_txn_id", 120).notNullable();
    t.string("txn_type", 30).notNullable();
    t.timestamp("txn_created_at", { precision: 3 }).notNullable();
    // Signed as the ledger counts them: money in positive, refunds negative.
    t.bigInteger("ledger_amount_minor").notNullable();
    t.specificType("ledger_currency", "char(3)").notNullable();
    t.bigInteger("processor_amount_minor").notNullable();
    t.bigInteger("processor_fee_minor").notNullable();
    t.bigInteger("processor_net_minor").notNullable();
    t.specificType("processor_currency", "char(3)").notNullable();
    t.string("payout_id", 120).nullable();
    // Set when one side of the pair is dated in another month (a timing difference, not an error).
    t.specificType("other_month", "char(7)").nullable();
    t.index(["period_id", "payment_id"]);
  });

  await knex.schema.createTable("reconciliation_exceptions", (t) => {
    tableOptions(t);
    t.increments("id").primary();
    workshopScope(t);
    periodRef(t);
    t.enum("kind", EXCEPTION_KINDS).notNullable();
    t.string("fingerprint", 191).notNullable();
    paymentRef(t);
    t.string("processor_ref", 120).nullable();
    t.bigInteger("ledger_amount_minor").nullable();
    t.specificType("ledger_currency", "char(3)").nullable();
    t.bigInteger("processor_amount_minor").nullable();
    t.specificType("processor_currency", "char(3)").nullable();
    t.string("detail", 500).notNullable();
    t.enum("status", ["open", "resolved"]).notNullable().defaultTo("open");
    t.text("resolution_note").nullable();
    userRef(t, "resolved_by");
    ms(t, "resolved_at");
    t.timestamp("first_seen_at", { precision: 3 }).notNullable().defaultTo(knex.raw("CURRENT_TIMESTAMP(3)"));
    t.timestamp("last_seen_at", { precision: 3 }).notNullable().defaultTo(knex.raw("CURRENT_TIMESTAMP(3)"));
    // Not found by the latest run (a late webhook put it right): kept for the record, no longer open.
    ms(t, "cleared_at");
    t.unique(["period_id", "fingerprint"]);
    t.index(["workshop_id", "status"]);
  });

  await knex.schema.createTable("reconciliation_payouts", (t) => {
    tableOptions(t);
    t.increments("id").primary();
    workshopScope(t);
    periodRef(t);
    t.string("payout_id", 120).notNullable();
    t.bigInteger("amount_minor").notNullable();
    t.specificType("currency", "char(3)").notNullable();
    t.timestamp("payout_created_at", { precision: 3 }).notNullable();
    t.timestamp("arrival_at", { precision: 3 }).notNullable();
    t.string("status", 30).notNullable();
    // This workshop's transactions in it; the rest belong to no workshop of ours or to another one.
    t.bigInteger("workshop_net_minor").notNullable();
    t.integer("workshop_count").unsigned().notNullable();
    t.bigInteger("other_net_minor").notNullable();
    t.integer("other_count").unsigned().notNullable();
    t.unique(["period_id", "payout_id"]);
  });

  await knex.schema.createTable("reconciliation_payout_lines", (t) => {
    tableOptions(t);
    t.bigIncrements("id").primary();
    workshopScope(t);
    periodRef(t);
    t.string("payout_id", 120).notNullable();
    t.string("balance_txn_id", 120).notNullable();
    t.string("txn_type", 30).notNullable();
    t.timestamp("txn_created_at", { precision: 3 }).notNullable();
    t.bigInteger("amount_minor").notNullable();
    t.bigInteger("fee_minor").notNullable();
    t.bigInteger("net_minor").notNullable();
    t.specificType("currency", "char(3)").notNullable();
    paymentRef(t);
    t.index(["period_id", "payout_id"]);
  });

  await knex.schema.createTable("reconciliation_locked_changes", (t) => {
    tableOptions(t);
    t.increments("id").primary();
    workshopScope(t);
    periodRef(t);
    paymentRef(t);
    // "owner": made by the owner (logged, nothing to review); "processor": a processor event applied
    // to the locked month, waiting for the owner's review.
    t.enum("source", ["owner", "processor"]).notNullable();
    t.string("action", 60).notNullable();
    t.string("event_id", 191).nullable();
    userRef(t, "actor_user_id");
    t.json("detail").nullable();
    created(t, knex);
    ms(t, "reviewed_at");
    userRef(t, "reviewed_by");
    t.string("review_note", 1000).nullable();
    t.index(["period_id", "reviewed_at"]);
  });
}

export async function down(knex: Knex): Promise<void> {
  for (const t of [
    "reconciliation_locked_changes",
    "reconciliation_payout_lines",
    "reconciliation_payouts",
    "reconciliation_exceptions",
    "reconciliation_matches",
    "reconciliation_periods",
  ]) {
    await knex.schema.dropTableIfExists(t);
  }
}
