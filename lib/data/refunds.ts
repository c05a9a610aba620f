// Refunds asked for by the owner or the bookkeeper. A card payment's refund goes to the processor
// and is stored as pending until the processor's event confirms it (lib/data/processor-events.ts);
// money the workshop took itself (bank transfer, cash) is returned by the workshop and recorded at once.
import type { WorkshopScope } from "@/lib/auth/scope";
import { AppError, forbidden, notFound } from "@/lib/http/errors";
import { refundableMinor } from "@/lib/money/invoices";
import type { PaymentOut, RefundRequest } from "@/lib/schemas/payment";
import { writeAudit } from "./audit";
import { getVisibleCommissionRow } from "./commission-access";
import { loadPaymentRows, toLedgerLine, toPaymentOut, type PaymentRow } from "./payment-ledger";
import { assertMayChangeMonths, logLockedChange } from "./reconciliation-locks";
import { inTransaction } from "./transaction";

export interface RefundProcessor {
  /** Asks the processor to return `amountMinor` of a payment intent; answers the refund's id. */
  create(req: { paymentIntentId: string; amountMinor: number; idempotencyKey: string; metadata: Record<string, string> }): Promise<{ id: string }>;
}

/**
 * Refunds all or part of one payment of the commission. 403 for anyone but the owner or the
 * bookkeeper; 404 for a payment of another commission; 422 for more than is left to refund; the
 * processor's error (503 when it is down) with nothing stored.
 */
export async function requestRefund(scope: WorkshopScope, commissionId: number, input: RefundRequest, processor: RefundProcessor): Promise<PaymentOut> {
  if (scope.role !== "owner" && scope.role !== "bookkeeper") throw forbidden("Only the owner or the bookkeeper refunds payments.");
  return inTransaction(async (trx) => {
    const row = await getVisibleCommissionRow(scope, commissionId, { trx, forUpdate: true });
    const rows = await loadPaymentRows(trx, scope.workshopId, commissionId);
    const payment = rows.find((r) => r.id === input.paymentId && r.kind !== "refund");
    if (!payment) throw notFound("No such payment on this commission.");
    const left = refundableMinor(toLedgerLine(payment), rows.map(toLedgerLine));
    if (payment.status !== "paid") throw new AppError("conflict", "Only a payment that has gone through can be refunded.");
    if (left <= 0) throw new AppError("conflict", "This payment has already been refunded in full (or its refunds are on their way).");
    const amount = input.amountMinor ?? left;
    if (amount > left) {
      throw new AppError("validation_failed", "That is more than can still be refunded of this payment.", [
        { path: "amountMinor", message: `At most ${left} (minor units) can still be refunded.` },
      ]);
    }
    // Refunding a payment of a reconciled (locked) month, or on a locked day, needs the owner.
    const lockedMonths = await assertMayChangeMonths(trx, scope, [new Date(payment.paid_at ?? payment.created_at), new Date()]);
    const reason = input.reason || null;
    const base = {
      workshop_id: scope.workshopId,
      commission_id: commissionId,
      kind: "refund" as const,
      method: payment.method,
      amount_minor: amount,
      currency: payment.currency,
      reference: reason,
      refund_of_payment_id: payment.id,
      recorded_by: scope.userId,
    };
    let id: number;
    if (payment.method === "offline") {
      const [newId] = await trx("payments").insert({ ...base, status: "paid", paid_at: trx.fn.now(3) });
      id = Number(newId);
    } else {
      if (!payment.processor_payment_id) throw new AppError("conflict", "This card payment has no processor reference yet; wait for its confirmation.");
      // The n-th refund of this payment: a retried request reuses the key and cannot refund twice.
      const n = 1 + rows.filter((r) => r.refund_of_payment_id === payment.id).length;
      const refund = await processor.create({
        paymentIntentId: payment.processor_payment_id,
        amountMinor: amount,
        idempotencyKey: `refund-${scope.workshopId}-${payment.id}-${n}-${amount}`,
        metadata: { scalewright_workshop_id: String(scope.workshopId), scalewright_commission_id: String(commissionId), scalewright_payment_id: String(payment.id) },
      });
      await trx("payments")
        .insert({ ...base, status: "pending", processor_payment_id: payment.processor_payment_id, processor_charge_id: payment.processor_charge_id, processor_refund_id: refund.id })
        .onConflict("processor_refund_id")
        .merge({ reference: reason, recorded_by: scope.userId });
      id = Number((await trx("payments").where({ workshop_id: scope.workshopId, processor_refund_id: refund.id }).first("id")).id);
    }
    await writeAudit(trx, {
      workshopId: scope.workshopId,
      actorUserId: scope.userId,
      action: payment.method === "offline" ? "refund.recorded" : "refund.requested",
      entityType: "payment",
      entityId: id,
      data: { commissionId, refundOf: payment.id, amountMinor: amount, currency: payment.currency, reason, stage: row.stage },
    });
    await logLockedChange(trx, scope, lockedMonths, {
      action: payment.method === "offline" ? "refund.recorded" : "refund.requested",
      paymentId: id,
      detail: { commissionId, refundOf: payment.id, amountMinor: amount, currency: payment.currency },
    });
    const after = await loadPaymentRows(trx, scope.workshopId, commissionId);
    return toPaymentOut(scope, after.find((r) => r.id === id) as PaymentRow, after);
  });
}
