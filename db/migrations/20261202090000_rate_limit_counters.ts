import type { Knex } from "knex";
import { tableOptions } from "../schema-helpers";

// Counters for lib/data/rate-limit.ts: one row per key and window. Not workshop data (public
// routes are limited per client IP), so no workshop_id. Times are epoch milliseconds (UTC).
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable("rate_limit_counters", (t) => {
    tableOptions(t);
    t.string("bucket_key", 191).notNullable();
    t.bigInteger("window_start_ms").notNullable();
    t.integer("hits").unsigned().notNullable();
    t.bigInteger("expires_at_ms").notNullable();
    t.primary(["bucket_key", "window_start_ms"]);
    t.index(["expires_at_ms"]);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTableIfExists("rate_limit_counters");
}
