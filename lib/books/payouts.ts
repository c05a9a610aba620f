// A payout broken down into the transactions it pays out, this workshop's named one by one (with
// the ledger entry of each), everyone else's as one sum. Pure.
//
// The processor's list of a payout's transactions includes the payout's own (negative) transaction;
// the others' nets add up to the payout's amount, which `balanced` checks.
import type { ProcessorTxn } from "./matching";

export interface PayoutInfo {
  id: string;
  amountMinor: number;
  currency: string;
  created: Date;
  arrival: Date;
  status: string;
}

export interface PayoutLine {
  txnId: string;
  txnType: string;
  created: Date;
  amountMinor: number;
  feeMinor: number;
  netMinor: number;
  currency: string;
  paymentId: number | null;
}

export interface PayoutBreakdown {
  payout: PayoutInfo;
  lines: PayoutLine[];
  workshopNetMinor: number;
  otherNetMinor: number;
  otherCount: number;
  /** The transactions' nets add up to the payout's amount. */
  balanced: boolean;
}

/** Which ledger entry a transaction is (by transaction id, else by its charge or refund). */
export interface LedgerRefs {
  byTxn: ReadonlyMap<string, number>;
  byCharge: ReadonlyMap<string, number>;
  byRefund: ReadonlyMap<string, number>;
}

export function ledgerPaymentOf(t: ProcessorTxn, refs: LedgerRefs): number | null {
  const direct = refs.byTxn.get(t.id);
  if (direct !== undefined) return direct;
  if (t.type === "charge" && t.chargeId) return refs.byCharge.get(t.chargeId) ?? null;
  if (t.refundId) return refs.byRefund.get(t.refundId) ?? null;
  return null;
}

export function breakDownPayout(payout: PayoutInfo, txns: readonly ProcessorTxn[], workshopId: number, refs: LedgerRefs): PayoutBreakdown {
  const paidOut = txns.filter((t) => t.type !== "payout");
  const lines: PayoutLine[] = [];
  let otherNetMinor = 0;
  let otherCount = 0;
  for (const t of paidOut) {
    if (t.workshopId !== workshopId) {
      otherNetMinor += t.netMinor;
      otherCount += 1;
      continue;
    }
    lines.push({
      txnId: t.id,
      txnType: t.type,
      created: t.created,
      amountMinor: t.amountMinor,
      feeMinor: t.feeMinor,
      netMinor: t.netMinor,
      currency: t.currency,
      paymentId: ledgerPaymentOf(t, refs),
    });
  }
  lines.sort((a, b) => a.created.getTime() - b.created.getTime() || a.txnId.localeCompare(b.txnId));
  const workshopNetMinor = lines.reduce((s, l) => s + l.netMinor, 0);
  return { payout, lines, workshopNetMinor, otherNetMinor, otherCount, balanced: workshopNetMinor + otherNetMinor === payout.amountMinor };
}
