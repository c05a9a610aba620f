// Pairing the ledger's card entries with the processor's balance transactions. The kinds of
// difference are the product's (issue 7); a balance transaction's shape (signed amount, fee, net =
// amount − fee, source, type charge / refund / refund_failure) follows the processor's published API
// reference for balance transactions (from memory of its documented fields).
import { describe, expect, it } from "vitest";
import { reconcileMonth, type LedgerCardEntry, type ProcessorTxn } from "@/lib/books/matching";

const MONTH = "2027-03";
const at = (day: number, month = 3) => new Date(Date.UTC(2027, month - 1, day, 10));

let id = 100;
function payment(over: Partial<LedgerCardEntry> = {}): LedgerCardEntry {
  const n = id++;
  return {
    paymentId: n,
    commissionId: 7,
    commissionNumber: "2027-007",
    kind: "balance",
    status: "paid",
    currency: "EUR",
    amountMinor: 210_000,
    feeMinor: 3_070,
    date: at(5),
    chargeId: `ch_${n}`,
    refundId: null,
    balanceTxnId: `txn_${n}`,
    reversalTxnId: null,
    inPeriod: true,
    ...over,
  };
}
function txnFor(e: LedgerCardEntry, over: Partial<ProcessorTxn> = {}): ProcessorTxn {
  const refund = e.kind === "refund";
  const amount = refund ? -e.amountMinor : e.amountMinor;
  const fee = refund ? 0 : (e.feeMinor ?? 0);
  return {
    id: (refund ? e.balanceTxnId : e.balanceTxnId) ?? `txn_x${id++}`,
    type: refund ? "refund" : "charge",
    amountMinor: amount,
    feeMinor: fee,
    netMinor: amount - fee,
    currency: e.currency,
    created: e.date,
    sourceId: refund ? e.refundId : e.chargeId,
    chargeId: e.chargeId,
    refundId: refund ? e.refundId : null,
    workshopId: 1,
    commissionId: e.commissionId,
    invoiceKind: refund ? null : (e.kind as "deposit" | "balance"),
    exchangeRate: null,
    inPeriod: true,
    ...over,
  };
}
function refundOf(p: LedgerCardEntry, over: Partial<LedgerCardEntry> = {}): LedgerCardEntry {
  const n = id++;
  return payment({ kind: "refund", amountMinor: 50_000, feeMinor: null, chargeId: p.chargeId, refundId: `re_${n}`, balanceTxnId: `txn_${n}`, date: at(12), ...over });
}

describe("reconcileMonth", () => {
  it("pairs a payment and a refund with their transactions and raises nothing when both sides agree", () => {
    const p = payment();
    const r = refundOf(p);
    const res = reconcileMonth(MONTH, [p, r], [txnFor(p), txnFor(r)]);
    expect(res.exceptions).toEqual([]);
    expect(res.matches.map((m) => [m.paymentId, m.txnType, m.ledgerAmountMinor, m.processorNetMinor])).toEqual([
      [p.paymentId, "charge", 210_000, 206_930],
      [r.paymentId, "refund", -50_000, -50_000],
    ]);
  });

  it("finds the transaction by its source when the ledger stored no transaction id", () => {
    const p = payment({ balanceTxnId: null });
    const res = reconcileMonth(MONTH, [p], [txnFor(p, { id: "txn_found_by_source" })]);
    expect(res.exceptions).toEqual([]);
    expect(res.matches[0]?.txnId).toBe("txn_found_by_source");
  });

  it("raises 'in the ledger, not at the processor' for a settled entry the processor does not have", () => {
    const p = payment();
    const res = reconcileMonth(MONTH, [p], []);
    expect(res.exceptions).toMatchObject([{ kind: "missing_at_processor", paymentId: p.paymentId, processorRef: null, ledgerAmountMinor: 210_000 }]);
  });

  it("raises 'in the ledger, not at the processor' for a refund the processor returned (refund_failure)", () => {
    const p = payment();
    const r = refundOf(p);
    const back: ProcessorTxn = { ...txnFor(r), id: "txn_back", type: "refund_failure", amountMinor: 50_000, netMinor: 50_000 };
    const res = reconcileMonth(MONTH, [p, r], [txnFor(p), txnFor(r), back]);
    expect(res.exceptions).toMatchObject([{ kind: "missing_at_processor", paymentId: r.paymentId, processorRef: "txn_back" }]);
    // Once the ledger records the failure, the two transactions pair with it and nothing is raised.
    const recorded = { ...r, status: "failed" as const, reversalTxnId: "txn_back" };
    expect(reconcileMonth(MONTH, [p, recorded], [txnFor(p), txnFor(r), back]).exceptions).toEqual([]);
  });

  it("raises 'at the processor, not in the ledger' for a charge of ours with no settled entry, naming the pending checkout", () => {
    const pending = payment({ status: "pending", chargeId: null, balanceTxnId: null, feeMinor: null, commissionId: 9, commissionNumber: "2027-009" });
    const charge: ProcessorTxn = { ...txnFor(payment()), commissionId: 9, invoiceKind: "balance" };
    const res = reconcileMonth(MONTH, [pending], [charge]);
    expect(res.exceptions).toHaveLength(1);
    expect(res.exceptions[0]).toMatchObject({ kind: "missing_in_ledger", paymentId: pending.paymentId, processorRef: charge.id, processorAmountMinor: 210_000 });
    expect(res.exceptions[0]!.detail).toMatch(/checkout of commission 2027-009 as pending/);
  });

  it("raises an amount mismatch for a different gross or fee, and a currency mismatch for another currency", () => {
    const a = payment();
    const b = payment();
    const c = payment();
    const res = reconcileMonth(MONTH, [a, b, c], [txnFor(a, { amountMinor: 209_000, netMinor: 205_930 }), txnFor(b, { feeMinor: 4_000, netMinor: 206_000 }), txnFor(c, { currency: "USD", exchangeRate: 1.08 })]);
    expect(res.exceptions.map((e) => [e.kind, e.paymentId])).toEqual([
      ["amount_mismatch", a.paymentId],
      ["amount_mismatch", b.paymentId],
      ["currency_mismatch", c.paymentId],
    ]);
    expect(res.exceptions[2]!.detail).toMatch(/rate of 1\.08/);
    // A mismatch still pairs the two sides.
    expect(res.matches).toHaveLength(3);
  });

  it("raises 'refunded at the processor, not recorded' for a refund of a ledger payment the ledger lacks, or still has pending", () => {
    const p = payment();
    const processorOnly: ProcessorTxn = { ...txnFor(refundOf(p)), id: "txn_re_only", sourceId: "re_only", refundId: "re_only" };
    const res = reconcileMonth(MONTH, [p], [txnFor(p), processorOnly]);
    expect(res.exceptions).toMatchObject([{ kind: "refund_not_recorded", paymentId: p.paymentId, processorRef: "txn_re_only" }]);
    const stillPending = refundOf(p, { status: "pending" });
    const res2 = reconcileMonth(MONTH, [p, stillPending], [txnFor(p), txnFor(stillPending)]);
    expect(res2.exceptions).toMatchObject([{ kind: "refund_not_recorded", paymentId: stillPending.paymentId }]);
  });

  it("pairs across months as a timing difference, without raising anything in either month", () => {
    const p = payment({ date: at(31) });
    const april = txnFor(p, { created: at(1, 4), inPeriod: false });
    const march = reconcileMonth(MONTH, [p], [april]);
    expect(march.exceptions).toEqual([]);
    expect(march.matches[0]?.otherMonth).toBe("2027-04");
    const aprilRun = reconcileMonth("2027-04", [{ ...p, inPeriod: false }], [{ ...april, inPeriod: true }]);
    expect(aprilRun.exceptions).toEqual([]);
    expect(aprilRun.matches[0]?.otherMonth).toBe("2027-03");
  });

  it("gives each difference a fingerprint that stays while it stays the same, and changes with the amounts", () => {
    const p = payment();
    const one = reconcileMonth(MONTH, [p], [txnFor(p, { amountMinor: 1 })]).exceptions[0]!;
    const again = reconcileMonth(MONTH, [p], [txnFor(p, { amountMinor: 1 })]).exceptions[0]!;
    const other = reconcileMonth(MONTH, [p], [txnFor(p, { amountMinor: 2 })]).exceptions[0]!;
    expect(again.fingerprint).toBe(one.fingerprint);
    expect(other.fingerprint).not.toBe(one.fingerprint);
  });

  it("ignores payouts and adjustments, and card rows that never settled", () => {
    const declined = payment({ status: "failed" });
    const payout: ProcessorTxn = { ...txnFor(payment()), id: "txn_po", type: "payout", amountMinor: -500_000 };
    const adjustment: ProcessorTxn = { ...txnFor(payment()), id: "txn_adj", type: "adjustment" };
    expect(reconcileMonth(MONTH, [declined], [payout, adjustment])).toEqual({ matches: [], exceptions: [] });
  });
});
