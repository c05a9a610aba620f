// A commission's payment rows as the invoices module and the pages see them. Shared by the card
// checkout, refunds, the processor's events and the payments page.
import type { WorkshopScope } from "@/lib/auth/scope";
import { phaseOf, refundableMinor, summarizeInvoices, type InvoiceSummary, type LedgerLine } from "@/lib/money/invoices";
import type { PaymentOut } from "@/lib/schemas/payment";
import { isBuildStage } from "@/lib/workflow/stages";
import type { CommissionRow } from "./commission-access";
import { iso, type Trx } from "./transaction";
import type { WorkshopSettings } from "./workshop-settings";

export interface PaymentRow {
  id: number;
  workshop_id: number;
  commission_id: number;
  kind: "deposit" | "balance" | "refund";
  status: "pending" | "paid" | "failed" | "cancelled";
  method: "offline" | "card";
  amount_minor: number | string;
  currency: string;
  fee_minor: number | string | null;
  net_minor: number | string | null;
  reference: string | null;
  processor_session_id: string | null;
  processor_payment_id: string | null;
  processor_charge_id: string | null;
  processor_refund_id: string | null;
  processor_balance_txn_id: string | null;
  processor_reversal_txn_id: string | null;
  refund_of_payment_id: number | null;
  checkout_attempt: number | null;
  failure_message: string | null;
  paid_at: Date | null;
  recorded_by: number | null;
  created_at: Date;
  updated_at: Date;
}

/** Every payment row of one commission, oldest first (the caller has already checked visibility). */
export async function loadPaymentRows(trx: Trx, workshopId: number, commissionId: number): Promise<PaymentRow[]> {
  return (await trx("payments").where({ workshop_id: workshopId, commission_id: commissionId }).orderBy("id", "asc").select("*")) as PaymentRow[];
}

export function toLedgerLine(r: PaymentRow): LedgerLine {
  return { id: r.id, kind: r.kind, status: r.status, method: r.method, amountMinor: Number(r.amount_minor), refundOf: r.refund_of_payment_id };
}

/** The invoices of a commission row with these payments. */
export function invoicesOf(row: CommissionRow, rows: readonly PaymentRow[], settings: WorkshopSettings): InvoiceSummary {
  return summarizeInvoices(
    {
      priceMinor: Number(row.price_minor),
      depositMinor: Number(row.deposit_minor),
      currency: row.currency,
      phase: phaseOf(row.stage, isBuildStage(row.stage, settings.buildStages)),
    },
    rows.map(toLedgerLine),
  );
}

const num = (v: number | string | null) => (v === null ? null : Number(v));

/** One row as the caller may see it: the processor's ids and fees only for the workshop's money people. */
export function toPaymentOut(scope: WorkshopScope, r: PaymentRow, all: readonly PaymentRow[]): PaymentOut {
  const lines = all.map(toLedgerLine);
  const money = scope.role === "owner" || scope.role === "bookkeeper";
  return {
    id: r.id,
    kind: r.kind,
    status: r.status,
    method: r.method,
    amountMinor: Number(r.amount_minor),
    currency: r.currency,
    // A card payment's reference is the processor's charge (or refund), as on the client's receipt.
    reference: r.reference ?? (r.method === "card" ? (r.processor_refund_id ?? r.processor_charge_id) : null),
    refundOf: r.refund_of_payment_id,
    failureMessage: r.failure_message,
    paidAt: r.paid_at ? iso(r.paid_at) : null,
    createdAt: iso(r.created_at),
    refundableMinor: refundableMinor(toLedgerLine(r), lines),
    processor: money
      ? {
          sessionId: r.processor_session_id,
          paymentIntentId: r.processor_payment_id,
          chargeId: r.processor_charge_id,
          refundId: r.processor_refund_id,
          balanceTransactionId: r.processor_balance_txn_id,
          reversalTransactionId: r.processor_reversal_txn_id,
          feeMinor: num(r.fee_minor),
          netMinor: num(r.net_minor),
        }
      : null,
  };
}
