// A month's reconciliation as CSV rows: every pair, every exception with its resolution, every
// payout with its lines. Pure.
import type { ReconciliationPeriodOut } from "@/lib/schemas/books";
import { major, reconciliationCsv, safeText, type ReconciliationCsvRow } from "./csv";

const amount = (minor: number | null, currency: string | null) => (minor === null || currency === null ? "" : major(minor, currency));

export function reconciliationCsvRows(p: ReconciliationPeriodOut): ReconciliationCsvRow[] {
  const rows: ReconciliationCsvRow[] = [];
  for (const m of p.matches) {
    rows.push({
      section: "match",
      month: p.month,
      kind: m.txnType,
      state: m.otherMonth ? `matched (other side in ${m.otherMonth})` : "matched",
      payment_id: m.paymentId === null ? "" : String(m.paymentId),
      commission_number: safeText(m.commissionNumber),
      processor_ref: m.txnId,
      payout: m.payoutId ?? "",
      date: m.txnCreatedAt,
      ledger_amount: amount(m.ledgerAmountMinor, m.ledgerCurrency),
      ledger_currency: m.ledgerCurrency,
      processor_amount: amount(m.processorAmountMinor, m.processorCurrency),
      processor_fee: amount(m.processorFeeMinor, m.processorCurrency),
      processor_net: amount(m.processorNetMinor, m.processorCurrency),
      processor_currency: m.processorCurrency,
    });
  }
  for (const e of p.exceptions) {
    rows.push({
      section: "exception",
      month: p.month,
      kind: e.kind,
      state: e.cleared ? "cleared" : e.status,
      payment_id: e.paymentId === null ? "" : String(e.paymentId),
      commission_number: safeText(e.commissionNumber),
      processor_ref: e.processorRef ?? "",
      ledger_amount: amount(e.ledgerAmountMinor, e.ledgerCurrency),
      ledger_currency: e.ledgerCurrency ?? "",
      processor_amount: amount(e.processorAmountMinor, e.processorCurrency),
      processor_currency: e.processorCurrency ?? "",
      detail: safeText(e.detail),
      resolution_note: safeText(e.resolutionNote),
      resolved_by: safeText(e.resolvedBy),
      resolved_at: e.resolvedAt ?? "",
    });
  }
  for (const po of p.payouts) {
    rows.push({
      section: "payout",
      month: p.month,
      kind: "payout",
      state: po.status,
      processor_ref: po.payoutId,
      payout: po.payoutId,
      date: po.arrivalAt,
      processor_amount: amount(po.amountMinor, po.currency),
      processor_net: amount(po.workshopNetMinor, po.currency),
      processor_currency: po.currency,
      detail: `${po.workshopCount} of this workshop's transactions; ${po.otherCount} others totalling ${amount(po.otherNetMinor, po.currency)} ${po.currency}`,
    });
    for (const l of po.lines) {
      rows.push({
        section: "payout_line",
        month: p.month,
        kind: l.kind ?? l.txnType,
        state: l.paymentId === null ? "not in the ledger" : "in the ledger",
        payment_id: l.paymentId === null ? "" : String(l.paymentId),
        commission_number: safeText(l.commissionNumber),
        processor_ref: l.txnId,
        payout: po.payoutId,
        date: l.createdAt,
        processor_amount: amount(l.amountMinor, l.currency),
        processor_fee: amount(l.feeMinor, l.currency),
        processor_net: amount(l.netMinor, l.currency),
        processor_currency: l.currency,
      });
    }
  }
  return rows;
}

export function reconciliationCsvText(p: ReconciliationPeriodOut): string {
  return reconciliationCsv(reconciliationCsvRows(p));
}
