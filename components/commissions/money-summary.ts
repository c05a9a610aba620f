// The overview's money panel (pure): the commission's two invoices worked out from the totals the
// detail route answers, with the same rules as the payments page (lib/money/invoices.ts), so both
// say "due", "paid" or "not due yet" alike.
import { phaseOf, summarizeInvoices, type InvoiceSummary, type LedgerLine } from "@/lib/money/invoices";
import type { CommissionDetail, CommissionMoney } from "@/lib/schemas/commission-out";

type Totals = NonNullable<CommissionDetail["payments"]>;

/**
 * `totals.paidMinor` is already net of refunds and `depositPaidMinor` net of deposit refunds; they
 * stand in for the payment lines as one deposit line and one balance line.
 */
export function overviewInvoices(money: CommissionMoney, totals: Totals, stage: string): InvoiceSummary {
  const line = (id: number, kind: "deposit" | "balance", amountMinor: number): LedgerLine => ({ id, kind, status: "paid", method: "offline", amountMinor, refundOf: null });
  const lines = [line(1, "deposit", totals.depositPaidMinor), line(2, "balance", totals.paidMinor - totals.depositPaidMinor)];
  // A build stage is any stage that is not one of the fixed ones (phaseOf's fallback).
  return summarizeInvoices({ priceMinor: money.priceMinor, depositMinor: money.depositMinor, currency: money.currency, phase: phaseOf(stage, false) }, lines);
}
