// Per-workshop, per-year running numbers ("2027-014"). Takes the transaction it runs in (the app's,
// or the demo seed's), so it never opens a connection of its own.
import type { Knex } from "knex";
import { formatCommissionNumber } from "@/lib/workflow/commission-number";

/**
 * Takes the next number of the year for this workshop in one statement: the upsert locks the
 * counter row until the transaction ends, so concurrent openings queue instead of deadlocking
 * (insert-if-missing, then SELECT … FOR UPDATE, deadlocked under concurrent openings).
 */
export async function nextCommissionNumber(trx: Knex.Transaction, workshopId: number, year: number): Promise<string> {
  const [res] = (await trx.raw(
    `INSERT INTO commission_counters (workshop_id, year, last_sequence) VALUES (?, ?, LAST_INSERT_ID(1))
     ON DUPLICATE KEY UPDATE last_sequence = LAST_INSERT_ID(last_sequence + 1)`,
    [workshopId, year],
  )) as [{ insertId: number }];
  return formatCommissionNumber(year, Number(res.insertId));
}
