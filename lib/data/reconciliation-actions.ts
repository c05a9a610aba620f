// What the bookkeeper does with a compared month: resolve each exception with a note, then lock the
// month; and what the owner does with changes that reached a locked month: review them with a note.
// Each is logged in the audit log.
import { can } from "@/lib/auth/permissions";
import type { WorkshopScope } from "@/lib/auth/scope";
import { monthLabel, type Month } from "@/lib/books/months";
import { AppError, forbidden, notFound } from "@/lib/http/errors";
import { writeAudit } from "./audit";
import { countChangedSince, findPeriod, type PeriodRow } from "./reconciliation-periods";
import { inTransaction, type Trx } from "./transaction";

async function periodForChange(trx: Trx, scope: WorkshopScope, month: Month): Promise<PeriodRow> {
  if (!can(scope.role, "reconciliation.manage")) throw forbidden();
  const period = await findPeriod(trx, scope.workshopId, month, true);
  if (!period) throw notFound(`${monthLabel(month)} has not been compared with the processor yet.`);
  return period;
}

/** Resolves one open exception of the month with the bookkeeper's note (a locked month: the owner only). */
export async function resolveException(scope: WorkshopScope, month: Month, exceptionId: number, note: string): Promise<void> {
  await inTransaction(async (trx) => {
    const period = await periodForChange(trx, scope, month);
    const ex = await trx("reconciliation_exceptions").where({ id: exceptionId, workshop_id: scope.workshopId, period_id: period.id }).forUpdate().first();
    if (!ex) throw notFound("No such exception in this month.");
    if (period.status === "locked" && !can(scope.role, "reconciliation.override")) {
      throw forbidden(`${monthLabel(month)} is reconciled and locked: only the owner can change it.`);
    }
    if (ex.status === "resolved") throw new AppError("conflict", "This exception is already resolved.");
    await trx("reconciliation_exceptions").where({ id: ex.id }).update({ status: "resolved", resolution_note: note, resolved_by: scope.userId, resolved_at: new Date() });
    await writeAudit(trx, {
      workshopId: scope.workshopId,
      actorUserId: scope.userId,
      action: "reconciliation.exception_resolved",
      entityType: "reconciliation_exception",
      entityId: ex.id,
      data: { month, kind: ex.kind, paymentId: ex.payment_id, processorRef: ex.processor_ref, note, lockedMonth: period.status === "locked" },
    });
  });
}

/**
 * Locks a compared month: 409 unless it was compared, every exception is resolved (or cleared) and
 * nothing in it changed since the comparison.
 */
export async function lockPeriod(scope: WorkshopScope, month: Month, note: string | null): Promise<void> {
  await inTransaction(async (trx) => {
    const period = await periodForChange(trx, scope, month);
    if (period.status === "locked") throw new AppError("conflict", `${monthLabel(month)} is already locked.`);
    if (!period.last_run_at) throw new AppError("conflict", "Compare the month with the processor first.");
    const open = await trx("reconciliation_exceptions").where({ period_id: period.id, workshop_id: scope.workshopId, status: "open" }).whereNull("cleared_at").count({ n: "*" }).first();
    if (Number(open?.n ?? 0) > 0) throw new AppError("conflict", `${open!.n} exception(s) are still open: resolve each with a note before locking.`);
    const changed = await countChangedSince(trx, scope.workshopId, month, period.last_run_at);
    if (changed > 0) throw new AppError("conflict", "The ledger of this month changed since the last comparison: compare it again before locking.");
    await trx("reconciliation_periods").where({ id: period.id }).update({ status: "locked", locked_at: new Date(), locked_by: scope.userId, lock_note: note });
    await writeAudit(trx, {
      workshopId: scope.workshopId,
      actorUserId: scope.userId,
      action: "reconciliation.locked",
      entityType: "reconciliation_period",
      entityId: period.id,
      data: { month, note },
    });
  });
}

/** The owner's review of a change that reached a locked month (a processor event applied to it). */
export async function reviewLockedChange(scope: WorkshopScope, month: Month, changeId: number, note: string): Promise<void> {
  if (!can(scope.role, "reconciliation.override")) throw forbidden();
  await inTransaction(async (trx) => {
    const period = await periodForChange(trx, scope, month);
    const change = await trx("reconciliation_locked_changes").where({ id: changeId, workshop_id: scope.workshopId, period_id: period.id }).forUpdate().first();
    if (!change) throw notFound("No such change in this month.");
    if (change.reviewed_at) throw new AppError("conflict", "This change has already been reviewed.");
    await trx("reconciliation_locked_changes").where({ id: change.id }).update({ reviewed_at: new Date(), reviewed_by: scope.userId, review_note: note });
    await writeAudit(trx, {
      workshopId: scope.workshopId,
      actorUserId: scope.userId,
      action: "reconciliation.change_reviewed",
      entityType: "reconciliation_period",
      entityId: period.id,
      data: { month, changeId: change.id, eventId: change.event_id, paymentId: change.payment_id, note },
    });
  });
}
