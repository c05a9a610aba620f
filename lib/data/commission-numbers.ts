// Per-workshop, per-year running numbers ("2027-014"). Takes the transaction it runs in (the app's,
// or the demo seed's), so it never opens a connection of its own.
import type { Knex } from "knex";
import { formatCommissionNumber } from "@/lib/workflow/commission-number";

/** Takes the next number of the year for this workshop under a row lock. */
export async function nextCommissionNumber(trx: Knex.Transaction, workshopId: number, year: number): Promise<string> {
  await trx("commission_counters").insert({ workshop_id: workshopId, year, last_sequence: 0 }).onConflict(["workshop_id", "year"]).ignore();
  const row = await trx("commission_counters").where({ workshop_id: workshopId, year }).forUpdate().first("last_sequence");
  const next = Number(row.last_sequence) + 1;
  await trx("commission_counters").where({ workshop_id: workshopId, year }).update({ last_sequence: next });
  return formatCommissionNumber(year, next);
}
