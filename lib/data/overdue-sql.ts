// The overdue rule in SQL, for counts grouped in the database (the pure form is isOverdue in
// lib/overview/figures.ts): a target date before today (UTC) and neither delivered nor cancelled.
import type { Knex } from "knex";
import { db } from "@/db/knex";
import { CANCELLED, DELIVERED } from "@/lib/workflow/stages";

/** `SUM(<overdue>) AS overdue` over commissions aliased `c`. */
export function overdueCount(today: string): Knex.Raw {
  return db.raw("SUM(c.target_date IS NOT NULL AND c.target_date < ? AND c.stage NOT IN (?, ?)) AS overdue", [today, DELIVERED, CANCELLED]);
}
