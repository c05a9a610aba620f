// The reconciliation state of a workshop's months: one row per month that has been compared with
// the processor (open) or reconciled and locked. A month without a row has never been compared.
import type { Knex } from "knex";
import { db } from "@/db/knex";
import type { WorkshopScope } from "@/lib/auth/scope";
import { monthRange, type Month } from "@/lib/books/months";
import type { Trx } from "./transaction";

export interface PeriodRow {
  id: number;
  workshop_id: number;
  month: string;
  status: "open" | "locked";
  last_run_at: Date | null;
  last_run_by: number | null;
  ledger_entries: number;
  processor_transactions: number;
  locked_at: Date | null;
  locked_by: number | null;
  lock_note: string | null;
}

/** The workshop's locked months ("2027-03", …). */
export async function lockedMonths(scope: WorkshopScope, knex: Knex | Trx = db): Promise<Set<string>> {
  const rows = (await knex("reconciliation_periods").where({ workshop_id: scope.workshopId, status: "locked" }).pluck("month")) as string[];
  return new Set(rows);
}

export async function findPeriod(knex: Knex | Trx, workshopId: number, month: Month, forUpdate = false): Promise<PeriodRow | undefined> {
  const q = knex("reconciliation_periods").where({ workshop_id: workshopId, month });
  if (forUpdate) q.forUpdate();
  return (await q.first()) as PeriodRow | undefined;
}

/** The month's row, made (open) if it has none yet, locked for the rest of the transaction. */
export async function claimPeriod(trx: Trx, workshopId: number, month: Month): Promise<PeriodRow> {
  await trx("reconciliation_periods").insert({ workshop_id: workshopId, month, status: "open" }).onConflict(["workshop_id", "month"]).ignore();
  return (await findPeriod(trx, workshopId, month, true))!;
}

/** Payments of the month changed after `since` (the last comparison): a month is locked only as compared. */
export async function countChangedSince(knex: Knex | Trx, workshopId: number, month: Month, since: Date | null): Promise<number> {
  if (!since) return 0;
  const { start, end } = monthRange(month);
  const r = await knex("payments")
    .where({ workshop_id: workshopId })
    .where("updated_at", ">", since)
    .whereRaw("COALESCE(paid_at, created_at) >= ?", [start])
    .whereRaw("COALESCE(paid_at, created_at) < ?", [end])
    .count({ n: "*" })
    .first();
  return Number(r?.n ?? 0);
}
