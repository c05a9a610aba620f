// A payout broken down into the transactions it pays out. Identity from the processor's API reference
// (from memory): a payout's amount is the sum of the nets of the balance transactions it settles; its
// own transaction (type payout) carries the same amount negated.
import { describe, expect, it } from "vitest";
import type { ProcessorTxn } from "@/lib/books/matching";
import { breakDownPayout } from "@/lib/books/payouts";

const t = (id: string, type: string, amount: number, fee: number, workshopId: number | null, extra: Partial<ProcessorTxn> = {}): ProcessorTxn => ({
  id,
  type,
  amountMinor: amount,
  feeMinor: fee,
  netMinor: amount - fee,
  currency: "EUR",
  created: new Date(Date.UTC(2027, 2, Number(id.replace(/\D/g, "")) || 1)),
  sourceId: null,
  chargeId: type === "charge" ? `ch_${id}` : null,
  refundId: type === "refund" ? `re_${id}` : null,
  workshopId,
  commissionId: null,
  invoiceKind: null,
  exchangeRate: null,
  inPeriod: true,
  ...extra,
});

describe("breakDownPayout", () => {
  it("names this workshop's transactions with their ledger entries and sums the rest", () => {
    const txns = [t("t3", "charge", 90_000, 1_330, 1), t("t5", "refund", -20_000, 0, 1), t("t4", "charge", 50_000, 750, 2), t("t6", "adjustment", -100, 0, null)];
    const net = txns.reduce((s, x) => s + x.netMinor, 0);
    const own = t("t9", "payout", -net, 0, null);
    const refs = { byTxn: new Map([["t3", 11]]), byCharge: new Map<string, number>(), byRefund: new Map([["re_t5", 12]]) };
    const b = breakDownPayout({ id: "po_1", amountMinor: net, currency: "EUR", created: new Date(), arrival: new Date(), status: "paid" }, [...txns, own], 1, refs);
    expect(b.lines.map((l) => [l.txnId, l.paymentId, l.netMinor])).toEqual([
      ["t3", 11, 88_670],
      ["t5", 12, -20_000],
    ]);
    expect(b.workshopNetMinor).toBe(68_670);
    expect([b.otherCount, b.otherNetMinor]).toEqual([2, 49_150]);
    expect(b.balanced).toBe(true);
  });

  it("says when the transactions do not add up to the payout", () => {
    const b = breakDownPayout({ id: "po_2", amountMinor: 1, currency: "EUR", created: new Date(), arrival: new Date(), status: "paid" }, [t("t1", "charge", 100, 0, 1)], 1, { byTxn: new Map(), byCharge: new Map(), byRefund: new Map() });
    expect(b.balanced).toBe(false);
    expect(b.lines[0]?.paymentId).toBeNull();
  });
});
