// Reading a processor balance transaction (shape per the processor's API reference for balance
// transactions, charges and refunds, with `source` and `source.charge` expanded — from memory of its
// documented fields) and placing it in a workshop by our metadata.
import type Stripe from "stripe";
import { describe, expect, it } from "vitest";
import { toProcessorTxn } from "@/lib/books/processor-txn";

const meta = { scalewright_workshop_id: "12", scalewright_commission_id: "345", scalewright_invoice: "balance", scalewright_payer_id: "9" };
const charge = { id: "ch_1", object: "charge", metadata: meta };
const txn = (over: Record<string, unknown>) =>
  ({ id: "txn_1", object: "balance_transaction", amount: 10_000, fee: 170, net: 9_830, currency: "eur", created: 1_806_000_000, exchange_rate: null, type: "charge", source: charge, ...over }) as unknown as Stripe.BalanceTransaction;

describe("toProcessorTxn", () => {
  it("reads a charge's transaction and its workshop, commission and invoice from the charge's metadata", () => {
    expect(toProcessorTxn(txn({}), true)).toMatchObject({
      id: "txn_1",
      type: "charge",
      amountMinor: 10_000,
      feeMinor: 170,
      netMinor: 9_830,
      currency: "EUR",
      created: new Date(1_806_000_000 * 1000),
      sourceId: "ch_1",
      chargeId: "ch_1",
      refundId: null,
      workshopId: 12,
      commissionId: 345,
      invoiceKind: "balance",
      inPeriod: true,
    });
  });

  it("places a refund by the charge it returns, even one made at the processor with no metadata of ours", () => {
    const refund = { id: "re_1", object: "refund", metadata: {}, charge };
    expect(toProcessorTxn(txn({ type: "refund", amount: -2_000, fee: 0, net: -2_000, source: refund }), false)).toMatchObject({ type: "refund", chargeId: "ch_1", refundId: "re_1", workshopId: 12, inPeriod: false });
    const returned = toProcessorTxn(txn({ type: "refund_failure", amount: 2_000, fee: 0, net: 2_000, source: { ...refund, charge: "ch_1", metadata: { scalewright_workshop_id: "12" } } }), true);
    expect(returned).toMatchObject({ type: "refund_failure", chargeId: "ch_1", refundId: "re_1", workshopId: 12 });
  });

  it("leaves money with no metadata of ours, adjustments and payouts out of every workshop", () => {
    expect(toProcessorTxn(txn({ source: { id: "ch_2", object: "charge", metadata: {} } }), true).workshopId).toBeNull();
    expect(toProcessorTxn(txn({ type: "adjustment", source: null }), true)).toMatchObject({ workshopId: null, sourceId: null });
    expect(toProcessorTxn(txn({ type: "payout", source: { id: "po_1", object: "payout" } }), true)).toMatchObject({ workshopId: null, sourceId: "po_1", chargeId: null });
    expect(toProcessorTxn(txn({ source: { id: "ch_3", object: "charge", metadata: { scalewright_workshop_id: "0x1" } } }), true).workshopId).toBeNull();
  });

  it("keeps the exchange rate of a converted transaction", () => {
    expect(toProcessorTxn(txn({ currency: "usd", exchange_rate: 0.92 }), true)).toMatchObject({ currency: "USD", exchangeRate: 0.92 });
  });
});
