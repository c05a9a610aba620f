// Payments recorded by the workshop itself (bank transfer, cash), until and beside the processor.
import type { WorkshopScope } from "@/lib/auth/scope";
import { AppError, forbidden } from "@/lib/http/errors";
import type { z } from "zod";
import type { offlinePaymentSchema } from "@/lib/schemas/commission";
import { planTransition } from "@/lib/workflow/machine";
import { DEPOSIT } from "@/lib/workflow/stages";
import { writeAudit } from "./audit";
import { getVisibleCommissionRow } from "./commission-access";
import { paidFlags, paymentTotals } from "./payment-totals";
import { assertMayChangeMonths, logLockedChange } from "./reconciliation-locks";
import { actorFor, applyTransition, loadGuardFacts } from "./stage-transitions";
import { inTransaction, type Trx } from "./transaction";
import { getWorkshopSettings } from "./workshop-settings";

type OfflinePayment = z.infer<typeof offlinePaymentSchema>;

/**
 * Once the deposit is covered, a commission waiting in the deposit stage moves on to its first
 * build stage by itself (the person whose payment completed it is the actor).
 */
export async function advancePastDepositIfPaid(trx: Trx, scope: WorkshopScope, commissionId: number): Promise<boolean> {
  const row = await getVisibleCommissionRow(scope, commissionId, { trx, forUpdate: true });
  if (row.stage !== DEPOSIT) return false;
  const settings = await getWorkshopSettings(scope, trx);
  const facts = await loadGuardFacts(trx, scope, row, settings);
  if (!facts.depositPaid) return false;
  // Checked as the owner would be: the payment, not the payer's role, is what lets it move on.
  const planned = planTransition({ stage: row.stage, heldFrom: row.held_from }, { kind: "advance" }, facts, { ...actorFor(scope, row), role: "owner" });
  if (!planned.ok) return false;
  await applyTransition(trx, scope, row, planned, settings, "Deposit received.");
  return true;
}

/** Records a deposit or balance paid outside the processor, with its reference. */
export async function recordOfflinePayment(scope: WorkshopScope, commissionId: number, input: OfflinePayment) {
  if (scope.role !== "owner" && scope.role !== "bookkeeper") throw forbidden("Only the owner or the bookkeeper records payments.");
  return inTransaction(async (trx) => {
    const row = await getVisibleCommissionRow(scope, commissionId, { trx, forUpdate: true });
    if (row.stage === "cancelled") throw new AppError("conflict", "The commission is cancelled; record a refund instead.");
    const totals = await paymentTotals(trx, scope.workshopId, commissionId);
    const outstanding = Number(row.price_minor) - totals.paidMinor;
    if (input.amountMinor > outstanding) {
      throw new AppError("validation_failed", "That is more than is still owed on this commission.", [
        { path: "amountMinor", message: `At most ${outstanding} (minor units) is outstanding.` },
      ]);
    }
    const paidAt = input.paidOn ? new Date(`${input.paidOn}T12:00:00Z`) : new Date();
    // A payment dated in a reconciled (locked) month needs the owner, and is logged.
    const lockedMonths = await assertMayChangeMonths(trx, scope, [paidAt]);
    const [id] = await trx("payments").insert({
      workshop_id: scope.workshopId,
      commission_id: commissionId,
      kind: input.kind,
      status: "paid",
      method: "offline",
      amount_minor: input.amountMinor,
      currency: row.currency,
      reference: input.reference,
      paid_at: paidAt,
      recorded_by: scope.userId,
    });
    await writeAudit(trx, {
      workshopId: scope.workshopId,
      actorUserId: scope.userId,
      action: "payment.recorded",
      entityType: "payment",
      entityId: Number(id),
      data: { commissionId, kind: input.kind, amountMinor: input.amountMinor, currency: row.currency, reference: input.reference },
    });
    await logLockedChange(trx, scope, lockedMonths, {
      action: "payment.recorded",
      paymentId: Number(id),
      detail: { commissionId, kind: input.kind, amountMinor: input.amountMinor, currency: row.currency, paidAt: paidAt.toISOString() },
    });
    const advanced = input.kind === "deposit" ? await advancePastDepositIfPaid(trx, scope, commissionId) : false;
    const after = paidFlags(await paymentTotals(trx, scope.workshopId, commissionId), row);
    return { paymentId: Number(id), advanced, ...after };
  });
}
