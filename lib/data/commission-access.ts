// Which commissions a member may see, in one place: owner and bookkeeper every one of the
// workshop, a builder those assigned to them, a client their own. Every commission query in
// lib/data starts from `visibleCommissions`, so the rule cannot be forgotten in one of them.
import type { Knex } from "knex";
import { db } from "@/db/knex";
import type { WorkshopScope } from "@/lib/auth/scope";
import { notFound } from "@/lib/http/errors";
import type { Trx } from "./transaction";

/** commissions (aliased `c`) narrowed to this workshop and what the caller's role may see. */
export function visibleCommissions(scope: WorkshopScope, trx?: Trx): Knex.QueryBuilder {
  const q = (trx ?? db)("commissions as c").where("c.workshop_id", scope.workshopId);
  if (scope.role === "builder") q.andWhere("c.builder_user_id", scope.userId);
  if (scope.role === "client") q.andWhere("c.client_user_id", scope.userId);
  return q;
}

export interface CommissionRow {
  id: number;
  workshop_id: number;
  number: string;
  client_user_id: number;
  builder_user_id: number | null;
  title: string;
  price_minor: number;
  deposit_minor: number;
  currency: string;
  deposit_percent: string;
  target_date: Date | string | null;
  stage: string;
  held_from: string | null;
  stage_entered_at: Date;
  client_stage: string;
  request_notes: string | null;
  created_at: Date;
  updated_at: Date;
}

const NOT_FOUND = "No such commission.";

/**
 * The commission row if the caller may see it, else 404 — the same answer whether it belongs to
 * another workshop, another client or does not exist. `forUpdate` locks it inside a transaction.
 */
export async function getVisibleCommissionRow(scope: WorkshopScope, id: number, opts: { trx?: Trx; forUpdate?: boolean } = {}): Promise<CommissionRow> {
  if (!Number.isSafeInteger(id) || id <= 0) throw notFound(NOT_FOUND);
  const q = visibleCommissions(scope, opts.trx).where("c.id", id).first("c.*");
  if (opts.forUpdate) q.forUpdate();
  const row = (await q) as CommissionRow | undefined;
  if (!row) throw notFound(NOT_FOUND);
  return row;
}
