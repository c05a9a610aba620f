// A reconciled month is locked: what the bookkeeper compared with the processor stays as it was.
//
//   - Changes people make (recording an offline payment dated in the month, refunding a payment of
//     the month, or any change dated in it): only holders of `reconciliation.override` (the owner)
//     may; everyone else gets 403 and nothing changes. The owner's change is logged (audit and the
//     month's list of changes after locking).
//   - The processor's events are facts that already happened (money moved): refusing them would
//     lose them or leave the ledger wrong. They are applied as always, and each change they make to
//     an entry of a locked month (or a refund of one) is flagged for the owner to review, with the
//     event's id. Nothing is lost, and the month shows it was changed after locking.
// Reads of the month's row take a shared lock, so a month being locked waits for a change in flight.
import { can } from "@/lib/auth/permissions";
import type { WorkshopScope } from "@/lib/auth/scope";
import { monthLabel, monthOf, type Month } from "@/lib/books/months";
import { forbidden } from "@/lib/http/errors";
import { writeAudit } from "./audit";
import type { PaymentRow } from "./payment-ledger";
import type { PeriodRow } from "./reconciliation-periods";
import { iso, type Trx } from "./transaction";

async function lockedAmong(trx: Trx, workshopId: number, months: readonly Month[]): Promise<PeriodRow[]> {
  const unique = [...new Set(months)];
  if (unique.length === 0) return [];
  return (await trx("reconciliation_periods").where({ workshop_id: workshopId, status: "locked" }).whereIn("month", unique).forShare().select("*")) as PeriodRow[];
}

export interface LockedChange {
  action: string;
  paymentId: number | null;
  detail: Record<string, unknown>;
}

/**
 * Before a change that reaches the months of `dates`: 403 (nothing changed) for anyone who may not
 * change a locked month. Returns the locked months concerned, to pass to `logLockedChange`.
 */
export async function assertMayChangeMonths(trx: Trx, scope: WorkshopScope, dates: readonly Date[]): Promise<PeriodRow[]> {
  const locked = await lockedAmong(trx, scope.workshopId, dates.map(monthOf));
  if (locked.length > 0 && !can(scope.role, "reconciliation.override")) {
    const names = locked.map((p) => monthLabel(p.month)).join(" and ");
    throw forbidden(`${names} ${locked.length === 1 ? "is" : "are"} reconciled and locked: only the owner can change payments in ${locked.length === 1 ? "it" : "them"}.`);
  }
  return locked;
}

/** Logs a permitted change to locked months: the audit log and each month's list of changes. */
export async function logLockedChange(trx: Trx, scope: WorkshopScope, periods: readonly PeriodRow[], change: LockedChange): Promise<void> {
  for (const p of periods) {
    await trx("reconciliation_locked_changes").insert({
      workshop_id: scope.workshopId,
      period_id: p.id,
      payment_id: change.paymentId,
      source: "owner",
      action: change.action,
      actor_user_id: scope.userId,
      detail: JSON.stringify(change.detail),
    });
    await writeAudit(trx, {
      workshopId: scope.workshopId,
      actorUserId: scope.userId,
      action: "books.locked_month_changed",
      entityType: "reconciliation_period",
      entityId: p.id,
      data: { month: p.month, ...change },
    });
  }
}

const rowMonth = (r: PaymentRow) => monthOf(new Date(r.paid_at ?? r.created_at));

function stateOf(r: PaymentRow | undefined) {
  return r ? { status: r.status, amountMinor: Number(r.amount_minor), paidAt: r.paid_at ? iso(r.paid_at) : null } : null;
}

function changed(a: PaymentRow | undefined, b: PaymentRow): boolean {
  if (!a) return true;
  const at = (d: Date | null) => (d ? new Date(d).getTime() : null);
  return a.status !== b.status || Number(a.amount_minor) !== Number(b.amount_minor) || at(a.paid_at) !== at(b.paid_at) || String(a.fee_minor) !== String(b.fee_minor);
}

/**
 * After a processor event was applied to one commission's payment rows: flags every row it created
 * or changed whose month (before or after), or whose refunded payment's month, is locked.
 */
export async function flagProcessorChanges(trx: Trx, scope: WorkshopScope, event: { id: string; type: string }, before: readonly PaymentRow[], after: readonly PaymentRow[]): Promise<number> {
  const was = new Map(before.map((r) => [r.id, r]));
  const byId = new Map(after.map((r) => [r.id, r]));
  let flagged = 0;
  for (const row of after) {
    const old = was.get(row.id);
    if (!changed(old, row)) continue;
    const refunded = row.refund_of_payment_id ? byId.get(row.refund_of_payment_id) : undefined;
    const months = [rowMonth(row), ...(old ? [rowMonth(old)] : []), ...(refunded ? [rowMonth(refunded)] : [])];
    const locked = await lockedAmong(trx, scope.workshopId, months);
    for (const p of locked) {
      const detail = { eventType: event.type, kind: row.kind, method: row.method, currency: row.currency, before: stateOf(old), after: stateOf(row), refundOf: row.refund_of_payment_id };
      await trx("reconciliation_locked_changes").insert({
        workshop_id: scope.workshopId,
        period_id: p.id,
        payment_id: row.id,
        source: "processor",
        action: old ? "processor.updated" : "processor.recorded",
        event_id: event.id,
        detail: JSON.stringify(detail),
      });
      await writeAudit(trx, {
        workshopId: scope.workshopId,
        actorUserId: null,
        action: "books.locked_month_event",
        entityType: "reconciliation_period",
        entityId: p.id,
        data: { month: p.month, paymentId: row.id, eventId: event.id, ...detail },
      });
      flagged += 1;
    }
  }
  return flagged;
}
