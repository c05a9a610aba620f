// The payment processor's events, applied once each. An event only says "look again": the webhook
// handler reads the Checkout Session, its payment and refunds from the processor as they are now
// (a snapshot) and this module brings our rows in line with it, in the order things happened —
// the payment first (and the deposit's stage move), then its refunds. So events arriving late, out
// of order or several times all end in the same state. The event id is stored in the same
// transaction: a second delivery finds it and changes nothing.
import { db } from "@/db/knex";
import type { WorkshopScope } from "@/lib/auth/scope";
import { appLink } from "@/lib/auth/links";
import { formatMoney, money } from "@/lib/money/money";
import type { InvoiceKind } from "@/lib/money/invoices";
import { enqueueEmail } from "@/lib/outbox/enqueue";
import { writeAudit } from "./audit";
import { getVisibleCommissionRow, type CommissionRow } from "./commission-access";
import { loadPaymentRows, type PaymentRow } from "./payment-ledger";
import { advancePastDepositIfPaid } from "./payments";
import { flagProcessorChanges } from "./reconciliation-locks";
import { inTransaction, isDuplicateKey, iso, type Trx } from "./transaction";
import { getWorkshopSettings } from "./workshop-settings";

export interface ProcessorEventInfo {
  id: string;
  type: string;
  objectId: string | null;
  createdAt: Date;
}

export interface RefundSnapshot {
  id: string;
  amountMinor: number;
  status: "pending" | "succeeded" | "failed" | "canceled" | "requires_action";
  balanceTxnId: string | null;
  reversalTxnId: string | null;
  failureReason: string | null;
  createdAt: Date;
}

/** A Checkout Session and what hangs off it, as the processor has it now. */
export interface CheckoutSnapshot {
  sessionId: string;
  kind: InvoiceKind;
  status: "open" | "complete" | "expired";
  paid: boolean;
  amountMinor: number;
  currency: string;
  /** Set once the session is paid. */
  payment: {
    intentId: string;
    chargeId: string | null;
    balanceTxnId: string | null;
    feeMinor: number | null;
    netMinor: number | null;
    paidAt: Date;
    card: { brand: string; last4: string } | null;
  } | null;
  /** The last declined attempt's message while the session is still open. */
  lastError: string | null;
  refunds: RefundSnapshot[];
}

export type EventOutcome = "applied" | "ignored" | "duplicate";

/** True when this event id was applied (or deliberately ignored) before. */
export async function isProcessorEventRecorded(eventId: string): Promise<boolean> {
  return !!(await db("processor_events").where({ event_id: eventId }).first("event_id"));
}

async function insertEvent(trx: Trx | typeof db, e: ProcessorEventInfo, workshopId: number | null, outcome: "applied" | "ignored") {
  await trx("processor_events").insert({
    event_id: e.id,
    type: e.type,
    object_id: e.objectId,
    workshop_id: workshopId,
    outcome,
    event_created_at: e.createdAt,
  });
}

/** Records an event that concerns nothing of ours (another integration's session, say). */
export async function recordIgnoredEvent(e: ProcessorEventInfo): Promise<EventOutcome> {
  try {
    await insertEvent(db, e, null, "ignored");
    return "ignored";
  } catch (err) {
    if (isDuplicateKey(err)) return "duplicate";
    throw err;
  }
}

class DuplicateEvent extends Error {}

const REFUND_RANK: Record<PaymentRow["status"], number> = { pending: 0, paid: 1, failed: 2, cancelled: 2 };

function refundStatus(s: RefundSnapshot["status"]): PaymentRow["status"] {
  if (s === "succeeded") return "paid";
  if (s === "failed" || s === "canceled") return "failed";
  return "pending";
}

const KIND_LABEL: Record<InvoiceKind, string> = { deposit: "deposit", balance: "balance" };

async function queueReceipt(trx: Trx, scope: WorkshopScope, row: CommissionRow, payment: PaymentRow, snap: CheckoutSnapshot) {
  const settings = await getWorkshopSettings(scope, trx);
  const client = await trx("users").where({ id: row.client_user_id }).first("email", "name");
  const card = snap.payment?.card;
  await enqueueEmail(trx, {
    workshopId: scope.workshopId,
    to: client.email,
    template: "payment-receipt",
    props: {
      workshopName: settings.emailSenderName || settings.name,
      clientName: client.name,
      commissionNumber: row.number,
      commissionTitle: row.title,
      invoiceLabel: KIND_LABEL[snap.kind],
      amount: formatMoney(money(Number(payment.amount_minor), payment.currency)),
      paidAt: iso(snap.payment?.paidAt ?? new Date()),
      method: card ? `Card (${card.brand}) ending ${card.last4}` : "Card",
      reference: snap.payment?.chargeId ?? snap.sessionId,
      paymentsUrl: appLink(`/${settings.slug}/commissions/${row.id}/payments`),
    },
  });
}

/** The payment row of the session, made if the processor took money we have no row for. */
async function syncPayment(trx: Trx, scope: WorkshopScope, row: CommissionRow, snap: CheckoutSnapshot): Promise<{ payment: PaymentRow | null; newlyPaid: boolean }> {
  const find = () => trx("payments").where({ workshop_id: scope.workshopId, processor_session_id: snap.sessionId }).forUpdate().first() as Promise<PaymentRow | undefined>;
  let payment = await find();
  const paidNow = snap.status === "complete" && snap.paid && snap.payment !== null;
  if (!payment) {
    // An expired or open session we have no row for was never handed to anyone: nothing to record.
    if (!paidNow) return { payment: null, newlyPaid: false };
    await trx("payments").insert({
      workshop_id: scope.workshopId,
      commission_id: row.id,
      kind: snap.kind,
      status: "pending",
      method: "card",
      amount_minor: snap.amountMinor,
      currency: snap.currency,
      processor_session_id: snap.sessionId,
    });
    payment = (await find())!;
  }
  if (payment.status !== "pending") return { payment, newlyPaid: false };

  if (paidNow) {
    const p = snap.payment!;
    await trx("payments").where({ id: payment.id }).update({
      status: "paid",
      amount_minor: snap.amountMinor,
      processor_payment_id: p.intentId,
      processor_charge_id: p.chargeId,
      processor_balance_txn_id: p.balanceTxnId,
      fee_minor: p.feeMinor,
      net_minor: p.netMinor,
      paid_at: p.paidAt,
      failure_message: null,
    });
    await writeAudit(trx, {
      workshopId: scope.workshopId,
      actorUserId: null,
      action: "payment.received",
      entityType: "payment",
      entityId: payment.id,
      data: { commissionId: row.id, kind: snap.kind, amountMinor: snap.amountMinor, currency: snap.currency, feeMinor: p.feeMinor, netMinor: p.netMinor, chargeId: p.chargeId },
    });
    const updated = (await find())!;
    await queueReceipt(trx, scope, row, updated, snap);
    return { payment: updated, newlyPaid: true };
  }
  if (snap.status === "expired") {
    await trx("payments").where({ id: payment.id }).update({ status: "cancelled", failure_message: snap.lastError ?? "The checkout expired without a payment." });
    await writeAudit(trx, { workshopId: scope.workshopId, actorUserId: null, action: "payment.checkout_expired", entityType: "payment", entityId: payment.id, data: { commissionId: row.id } });
    return { payment: null, newlyPaid: false };
  }
  if (snap.lastError && snap.lastError !== payment.failure_message) {
    await trx("payments").where({ id: payment.id }).update({ failure_message: snap.lastError });
    await writeAudit(trx, { workshopId: scope.workshopId, actorUserId: null, action: "payment.attempt_failed", entityType: "payment", entityId: payment.id, data: { message: snap.lastError } });
  }
  return { payment, newlyPaid: false };
}

/** Each refund of the payment, made or moved forward (pending → succeeded → failed, never back). */
async function syncRefunds(trx: Trx, scope: WorkshopScope, row: CommissionRow, payment: PaymentRow, refunds: RefundSnapshot[]) {
  for (const r of [...refunds].sort((a, b) => a.createdAt.getTime() - b.createdAt.getTime())) {
    const status = refundStatus(r.status);
    const fields = {
      processor_balance_txn_id: r.balanceTxnId,
      processor_reversal_txn_id: r.reversalTxnId,
      failure_message: r.failureReason,
      net_minor: -r.amountMinor,
      paid_at: status === "paid" ? r.createdAt : null,
    };
    const existing = (await trx("payments").where({ workshop_id: scope.workshopId, processor_refund_id: r.id }).forUpdate().first()) as PaymentRow | undefined;
    let id: number;
    if (!existing) {
      // A refund made at the processor itself (or whose request we never stored): recorded all the same.
      const [newId] = await trx("payments").insert({
        workshop_id: scope.workshopId,
        commission_id: row.id,
        kind: "refund",
        status,
        method: "card",
        amount_minor: r.amountMinor,
        currency: payment.currency,
        processor_payment_id: payment.processor_payment_id,
        processor_charge_id: payment.processor_charge_id,
        processor_refund_id: r.id,
        refund_of_payment_id: payment.id,
        ...fields,
      });
      id = Number(newId);
    } else {
      if (REFUND_RANK[status] <= REFUND_RANK[existing.status]) continue;
      await trx("payments").where({ id: existing.id }).update({ status, amount_minor: r.amountMinor, ...fields, paid_at: fields.paid_at ?? existing.paid_at });
      id = existing.id;
    }
    if (status === "pending") continue;
    await writeAudit(trx, {
      workshopId: scope.workshopId,
      actorUserId: null,
      action: status === "paid" ? "refund.recorded" : "refund.failed",
      entityType: "payment",
      entityId: id,
      data: { commissionId: row.id, refundOf: payment.id, amountMinor: r.amountMinor, currency: payment.currency, refundId: r.id, reason: r.failureReason },
    });
  }
}

/**
 * Applies one event's snapshot for the commission in `scope` (the payer's or an owner's). Returns
 * "duplicate" without any change when this event id was applied before.
 */
export async function applyCheckoutSnapshot(scope: WorkshopScope, commissionId: number, event: ProcessorEventInfo, snap: CheckoutSnapshot): Promise<EventOutcome> {
  try {
    return await inTransaction(async (trx): Promise<EventOutcome> => {
      try {
        await insertEvent(trx, event, scope.workshopId, "applied");
      } catch (err) {
        if (isDuplicateKey(err)) throw new DuplicateEvent();
        throw err;
      }
      const row = await getVisibleCommissionRow(scope, commissionId, { trx, forUpdate: true });
      const before = await loadPaymentRows(trx, scope.workshopId, commissionId);
      const { payment, newlyPaid } = await syncPayment(trx, scope, row, snap);
      // The stage moves on what was paid before any refund of it, as it would have in order.
      if (newlyPaid && snap.kind === "deposit") await advancePastDepositIfPaid(trx, scope, commissionId);
      if (payment?.status === "paid") await syncRefunds(trx, scope, row, payment, snap.refunds);
      // Applied whatever month it concerns; a change to a reconciled month is flagged for the owner.
      await flagProcessorChanges(trx, scope, event, before, await loadPaymentRows(trx, scope.workshopId, commissionId));
      return "applied";
    });
  } catch (err) {
    if (err instanceof DuplicateEvent) return "duplicate";
    throw err;
  }
}
