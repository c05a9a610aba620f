// One ledger entry's figures as the books count them. Pure.
//
// A payments row is always stored with a positive amount; a refund subtracts by its kind. In the
// books every entry is signed: money in positive, refunds negative. The processor's fee is a cost
// (positive); net is what reaches the workshop: gross − fee. Money taken by the workshop itself
// (bank transfer, cash) has no processor fee.

export type EntryKind = "deposit" | "balance" | "refund";
export type EntryStatus = "pending" | "paid" | "failed" | "cancelled";

export interface EntryFigures {
  grossMinor: number;
  feeMinor: number;
  netMinor: number;
}

/** Signed gross, fee and net of one row (`netMinor` as stored by the processor when it told us). */
export function entryFigures(row: { kind: EntryKind; amountMinor: number; feeMinor: number | null; netMinor: number | null }): EntryFigures {
  const grossMinor = row.kind === "refund" ? -row.amountMinor : row.amountMinor;
  const feeMinor = row.feeMinor ?? 0;
  return { grossMinor, feeMinor, netMinor: row.netMinor ?? grossMinor - feeMinor };
}

export interface CurrencyTotals extends EntryFigures {
  currency: string;
  count: number;
}
