// Card payments through the processor's hosted Checkout. A client's "Pay" opens a session for the
// invoice's outstanding amount under the commission's row lock, so a second click waits for the
// first and gets the same open session back. The pending row is written only once the processor
// has answered: when it is down, nothing is left behind.
import type { WorkshopScope } from "@/lib/auth/scope";
import { AppError, forbidden } from "@/lib/http/errors";
import type { Invoice, InvoiceKind } from "@/lib/money/invoices";
import type { CheckoutOut, CommissionPaymentsOut } from "@/lib/schemas/payment";
import { stageLabel } from "@/lib/workflow/stages";
import { writeAudit } from "./audit";
import { getVisibleCommissionRow, type CommissionRow } from "./commission-access";
import { invoicesOf, loadPaymentRows, toPaymentOut, type PaymentRow } from "./payment-ledger";
import { inTransaction, type Trx } from "./transaction";
import { getWorkshopSettings } from "./workshop-settings";

/** A Checkout Session as far as we need it. */
export interface CheckoutSessionState {
  id: string;
  url: string | null;
  status: "open" | "complete" | "expired";
  amountMinor: number;
}

export interface CheckoutRequest {
  /** Same key for the same attempt: a retried call can never open a second session. */
  idempotencyKey: string;
  kind: InvoiceKind;
  amountMinor: number;
  currency: string;
  workshop: { id: number; slug: string; name: string };
  commission: { id: number; number: string; title: string };
  payer: { userId: number; email: string };
}

/** The processor calls the checkout needs (lib/payments/stripe-checkout.ts; tests may pass their own). */
export interface CheckoutProcessor {
  create(req: CheckoutRequest): Promise<CheckoutSessionState>;
  retrieve(sessionId: string): Promise<CheckoutSessionState>;
  expire(sessionId: string): Promise<CheckoutSessionState>;
}

const KIND_LABEL: Record<InvoiceKind, string> = { deposit: "deposit", balance: "balance" };

function notPayableReason(invoice: Invoice): string {
  const what = `The ${KIND_LABEL[invoice.kind]}`;
  if (invoice.status === "none") return `${what} of this commission is nothing: there is nothing to pay.`;
  if (invoice.status === "paid") return `${what} is already paid.`;
  if (invoice.status === "void") return "The commission is cancelled; nothing more is due.";
  if (invoice.kind === "deposit") return "The deposit falls due once you have approved the spec.";
  return "The balance falls due once the deposit is paid and the build has started.";
}

/** Cancels a pending card row whose session ended without payment. */
async function cancelAttempt(trx: Trx, scope: WorkshopScope, row: PaymentRow, why: string) {
  await trx("payments").where({ id: row.id, workshop_id: scope.workshopId, status: "pending" }).update({ status: "cancelled", failure_message: why });
}

/**
 * Opens (or hands back) the Checkout for one invoice of the caller's own commission. Throws 403 for
 * anyone but the commission's client, 404 when they cannot see it, 409 when the invoice is not
 * payable now, and the processor's error (503 when it is down) with nothing stored.
 */
export async function openCardCheckout(scope: WorkshopScope, commissionId: number, kind: InvoiceKind, processor: CheckoutProcessor): Promise<CheckoutOut> {
  return inTransaction(async (trx) => {
    const row = await getVisibleCommissionRow(scope, commissionId, { trx, forUpdate: true });
    if (scope.role !== "client" || row.client_user_id !== scope.userId) {
      throw forbidden("Only the commission's client pays by card; the workshop records other payments.");
    }
    const settings = await getWorkshopSettings(scope, trx);
    const rows = await loadPaymentRows(trx, scope.workshopId, commissionId);
    const invoice = invoicesOf(row, rows, settings).invoices.find((i) => i.kind === kind)!;
    if (!invoice.payable) throw new AppError("conflict", notPayableReason(invoice));

    // A session already open for this invoice is handed back while it is still for the right amount.
    for (const open of rows.filter((r) => r.kind === kind && r.method === "card" && r.status === "pending" && r.processor_session_id).reverse()) {
      let session = await processor.retrieve(open.processor_session_id!);
      if (session.status === "open" && session.amountMinor === invoice.outstandingMinor && session.url) {
        return { paymentId: open.id, sessionId: session.id, url: session.url, reused: true };
      }
      if (session.status === "open") session = await processor.expire(session.id);
      if (session.status === "complete") {
        throw new AppError("conflict", "A card payment for this invoice has just gone through and is being confirmed. Refresh the page in a moment.");
      }
      await cancelAttempt(trx, scope, open, session.amountMinor === invoice.outstandingMinor ? "The checkout expired." : "Replaced: the amount due changed.");
    }

    const attempt = 1 + Math.max(0, ...rows.filter((r) => r.kind === kind).map((r) => r.checkout_attempt ?? 0));
    const payer = await trx("users").where({ id: row.client_user_id }).first("email");
    const session = await processor.create({
      idempotencyKey: `checkout-${scope.workshopId}-${commissionId}-${kind}-${attempt}-${invoice.outstandingMinor}`,
      kind,
      amountMinor: invoice.outstandingMinor,
      currency: row.currency,
      workshop: { id: scope.workshopId, slug: settings.slug, name: settings.emailSenderName || settings.name },
      commission: { id: row.id, number: row.number, title: row.title },
      payer: { userId: row.client_user_id, email: payer.email },
    });
    if (!session.url || session.status !== "open") throw new AppError("unavailable", "The payment page could not be opened. Nothing was charged; try again in a moment.", undefined, 10);

    const [id] = await trx("payments").insert({
      workshop_id: scope.workshopId,
      commission_id: commissionId,
      kind,
      status: "pending",
      method: "card",
      amount_minor: invoice.outstandingMinor,
      currency: row.currency,
      processor_session_id: session.id,
      checkout_attempt: attempt,
      recorded_by: scope.userId,
    });
    await writeAudit(trx, {
      workshopId: scope.workshopId,
      actorUserId: scope.userId,
      action: "payment.checkout_started",
      entityType: "payment",
      entityId: Number(id),
      data: { commissionId, kind, amountMinor: invoice.outstandingMinor, currency: row.currency, sessionId: session.id, attempt },
    });
    return { paymentId: Number(id), sessionId: session.id, url: session.url, reused: false };
  });
}

function commissionOut(row: CommissionRow, label: string) {
  return {
    id: row.id,
    number: row.number,
    title: row.title,
    stage: row.stage,
    stageLabel: label,
    currency: row.currency,
    priceMinor: Number(row.price_minor),
    depositMinor: Number(row.deposit_minor),
    depositPercent: Number(row.deposit_percent),
  };
}

/** The commission's invoices and payments as the caller may see them (builders: 403; not visible: 404). */
export async function getCommissionPayments(scope: WorkshopScope, commissionId: number): Promise<CommissionPaymentsOut> {
  if (scope.role === "builder") throw forbidden("Payments are between the workshop's owner, its bookkeeper and the client.");
  return inTransaction(async (trx) => {
    const row = await getVisibleCommissionRow(scope, commissionId, { trx });
    const settings = await getWorkshopSettings(scope, trx);
    const rows = await loadPaymentRows(trx, scope.workshopId, commissionId);
    const summary = invoicesOf(row, rows, settings);
    // A client sees the stage they have been told of.
    const stage = scope.role === "client" ? row.client_stage : row.stage;
    const money = scope.role === "owner" || scope.role === "bookkeeper";
    return {
      commission: { ...commissionOut(row, stageLabel(stage, settings.buildStages)), stage },
      invoices: summary.invoices,
      totals: {
        paidMinor: summary.paidMinor,
        refundedMinor: summary.refundedMinor,
        refundPendingMinor: summary.refundPendingMinor,
        outstandingMinor: summary.outstandingMinor,
        overpaidMinor: summary.overpaidMinor,
      },
      payments: rows.map((r) => toPaymentOut(scope, r, rows)),
      can: { pay: scope.role === "client" && row.client_user_id === scope.userId, record: money && row.stage !== "cancelled", refund: money },
    };
  });
}
