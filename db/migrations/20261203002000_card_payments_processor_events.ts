import type { Knex } from "knex";
import { tableOptions } from "../schema-helpers";

// Card payments through the processor: the ids the bookkeeping needs to reconcile a payment or a
// refund with the processor's balance (charge, balance transaction, fee, net), which Checkout
// attempt of an invoice a row is (the idempotency key is built from it), and the processor's
// events already applied, by id, so a webhook delivered twice changes nothing the second time.

export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable("payments", (t) => {
    t.string("processor_charge_id", 120).nullable();
    // The charge's balance transaction (or the refund's); a bounced refund's reversal separately.
    t.string("processor_balance_txn_id", 120).nullable();
    t.string("processor_reversal_txn_id", 120).nullable();
    t.bigInteger("net_minor").nullable();
    // 1, 2, … per commission and invoice kind: the n-th Checkout Session opened for it.
    t.smallint("checkout_attempt").unsigned().nullable();
    // The processor's last word on a failure: a declined card, a bounced refund.
    t.string("failure_message", 300).nullable();
    t.index(["processor_payment_id"]);
    t.unique(["commission_id", "kind", "checkout_attempt"]);
  });

  await knex.schema.createTable("processor_events", (t) => {
    tableOptions(t);
    t.string("event_id", 191).primary();
    t.string("type", 100).notNullable();
    t.string("object_id", 191).nullable();
    // Which workshop the event touched (null: not one of ours, recorded and ignored).
    t.integer("workshop_id").unsigned().nullable().references("id").inTable("workshops").onDelete("SET NULL");
    t.string("outcome", 20).notNullable();
    t.timestamp("event_created_at", { precision: 3 }).notNullable();
    t.timestamp("received_at", { precision: 3 }).notNullable().defaultTo(knex.raw("CURRENT_TIMESTAMP(3)"));
    t.index(["workshop_id", "received_at"]);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTableIfExists("processor_events");
  // The foreign key on commission_id leans on the unique index below: give it its own index back first.
  await knex.schema.alterTable("payments", (t) => t.index(["commission_id"], "payments_commission_id_foreign"));
  await knex.schema.alterTable("payments", (t) => {
    t.dropUnique(["commission_id", "kind", "checkout_attempt"]);
    t.dropIndex(["processor_payment_id"]);
    t.dropColumns("processor_charge_id", "processor_balance_txn_id", "processor_reversal_txn_id", "net_minor", "checkout_attempt", "failure_message");
  });
}
