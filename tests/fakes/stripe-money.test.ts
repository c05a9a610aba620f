// Money after the payment: refunds through the SDK (full, partial, too much), negative balance
// transactions, payouts that group them, paginated lists, and the admin seeds for each
// reconciliation exception (unmatched money, altered amounts, a refund the app was not told about).
import Stripe from "stripe";
import { beforeEach, describe, expect, it } from "vitest";
import { pause } from "./helpers/webhook-listener";
import { CARD_OK, depositSession, payOnHostedPage, startStripeRig, useStripeRig, type StripeRig } from "./helpers/stripe-setup";

const rigs = useStripeRig();
let rig: StripeRig;
beforeEach(() => {
  rig = rigs.get();
});

/** Pays a session and returns its succeeded payment intent id. */
async function payDeposit(amount = 125_000): Promise<string> {
  const s = await depositSession(rig.stripe, amount);
  expect((await payOnHostedPage(s.url!, CARD_OK)).status).toBe(303);
  return String((await rig.stripe.checkout.sessions.retrieve(s.id)).payment_intent);
}

async function eventsOfType(type: string, count: number): Promise<Stripe.Event[]> {
  const deadline = Date.now() + 5000;
  for (;;) {
    const found = rig.events().filter((e) => e.type === type);
    if (found.length >= count || Date.now() > deadline) return found;
    await pause(20);
  }
}

describe("Stripe fake: refunds, balance and payouts", () => {
  it("refunds part of a payment, then the rest, with events and negative balance transactions", async () => {
    const pi = await payDeposit(125_000);
    const part = await rig.stripe.refunds.create({ payment_intent: pi, amount: 25_000, reason: "requested_by_customer", metadata: { refund_request: "r-7" } });
    expect(part).toMatchObject({ object: "refund", status: "succeeded", amount: 25_000, currency: "eur", payment_intent: pi, metadata: { refund_request: "r-7" } });
    const [created] = await eventsOfType("refund.created", 1);
    expect((created!.data.object as Stripe.Refund).id).toBe(part.id);
    const [refunded] = await eventsOfType("charge.refunded", 1);
    expect(refunded!.data.object).toMatchObject({ amount_refunded: 25_000, refunded: false });
    expect(refunded!.data.previous_attributes).toEqual({ amount_refunded: 0, refunded: false });

    const txn = await rig.stripe.balanceTransactions.retrieve(String(part.balance_transaction));
    expect(txn).toMatchObject({ type: "refund", amount: -25_000, fee: 0, net: -25_000, source: part.id });

    const tooMuch = await rig.stripe.refunds.create({ payment_intent: pi, amount: 100_001 }).catch((e: unknown) => e);
    expect(tooMuch).toBeInstanceOf(Stripe.errors.StripeInvalidRequestError);
    expect(tooMuch).toMatchObject({ code: "amount_too_large", param: "amount" });

    const rest = await rig.stripe.refunds.create({ payment_intent: pi });
    expect(rest.amount).toBe(100_000);
    const charges = await eventsOfType("charge.refunded", 2);
    expect(charges[1]!.data.object).toMatchObject({ amount_refunded: 125_000, refunded: true });
    const again = await rig.stripe.refunds.create({ payment_intent: pi }).catch((e: unknown) => e);
    expect(again).toMatchObject({ code: "charge_already_refunded" });
    expect((await rig.stripe.refunds.list({ payment_intent: pi })).data.map((r) => r.amount)).toEqual([100_000, 25_000]);
  });

  it("a refund that bounces sends refund.updated and refund.failed and puts the money back", async () => {
    const pi = await payDeposit(40_000);
    const refund = await rig.stripe.refunds.create({ payment_intent: pi, amount: 10_000 });
    const failed = await rig.admin(`/admin/refunds/${refund.id}/fail`, {});
    expect(failed.json).toMatchObject({ status: "failed", failure_reason: "lost_or_stolen_card" });
    const [updated] = await eventsOfType("refund.updated", 1);
    expect(updated!.data.object).toMatchObject({ id: refund.id, status: "failed" });
    expect(updated!.data.previous_attributes).toEqual({ status: "succeeded" });
    expect((await eventsOfType("refund.failed", 1)).length).toBe(1);
    const back = await rig.stripe.balanceTransactions.list({ type: "refund_failure" as Stripe.BalanceTransactionListParams["type"] });
    expect(back.data.map((t) => t.amount)).toEqual([10_000]);
  });

  it("a payout sweeps the available balance; balance transactions can be listed by payout", async () => {
    const a = await payDeposit(125_000);
    await payDeposit(80_000);
    await rig.stripe.refunds.create({ payment_intent: a, amount: 5_000 });
    const run = await rig.admin("/admin/payouts/run", {});
    expect(run.json.data).toHaveLength(1);
    const payout = run.json.data[0] as Stripe.Payout;
    const fees = Math.round(125_000 * 0.0145) + 25 + Math.round(80_000 * 0.0145) + 25;
    expect(payout.amount).toBe(125_000 + 80_000 - fees - 5_000);

    const listed = await rig.stripe.payouts.list();
    expect(listed.data.map((p) => p.id)).toEqual([payout.id]);
    expect(await rig.stripe.payouts.retrieve(payout.id)).toMatchObject({ status: "paid", currency: "eur", amount: payout.amount });
    const inPayout = await rig.stripe.balanceTransactions.list({ payout: payout.id, limit: 100 });
    expect(inPayout.data.map((t) => t.type).sort()).toEqual(["charge", "charge", "payout", "refund"]);
    // Its lines add up to nothing: what came in went out to the bank.
    expect(inPayout.data.reduce((s, t) => s + t.net, 0)).toBe(0);
    expect((await eventsOfType("payout.paid", 1))[0]!.data.object).toMatchObject({ id: payout.id });
    // Nothing is left to pay out.
    expect((await rig.admin("/admin/payouts/run", {})).json.data).toEqual([]);
    const balance = await rig.stripe.balance.retrieve();
    expect(balance.available).toEqual([{ amount: 0, currency: "eur", source_types: { card: 0 } }]);
  });

  it("balances become available after the configured delay, and automatic payouts pick them up", async () => {
    const slow = await startStripeRig({ availableAfterSeconds: 1, payoutEverySeconds: 1 });
    try {
      const s = await depositSession(slow.stripe, 30_000);
      expect((await payOnHostedPage(s.url!, CARD_OK)).status).toBe(303);
      const [txn] = (await slow.stripe.balanceTransactions.list({ type: "charge" })).data;
      expect(txn).toMatchObject({ status: "pending" });
      expect(txn!.available_on).toBe(txn!.created + 1);
      const deadline = Date.now() + 6000;
      while (!slow.events().some((e) => e.type === "payout.paid") && Date.now() < deadline) await pause(50);
      const paid = slow.events().find((e) => e.type === "payout.paid")!.data.object as Stripe.Payout;
      expect(paid).toMatchObject({ automatic: true, amount: txn!.net, currency: "eur" });
      expect((await slow.stripe.balanceTransactions.retrieve(txn!.id)).status).toBe("available");
    } finally {
      await slow.close();
    }
  });

  it("pages balance transactions like the API: limit, has_more, starting_after, ending_before, auto-paging", async () => {
    const ids: string[] = [];
    for (let i = 1; i <= 23; i++) {
      const r = await rig.admin("/admin/balance-transactions", { amount: 1000 + i, currency: "usd", type: "adjustment", description: `seed ${i}` });
      ids.unshift(r.json.balance_transaction.id); // the API lists newest first
    }
    const first = await rig.stripe.balanceTransactions.list({ limit: 10 });
    expect(first.data.map((t) => t.id)).toEqual(ids.slice(0, 10));
    expect(first.has_more).toBe(true);
    const second = await rig.stripe.balanceTransactions.list({ limit: 10, starting_after: first.data.at(-1)!.id });
    expect(second.data.map((t) => t.id)).toEqual(ids.slice(10, 20));
    const third = await rig.stripe.balanceTransactions.list({ limit: 10, starting_after: second.data.at(-1)!.id });
    expect(third.data.map((t) => t.id)).toEqual(ids.slice(20));
    expect(third.has_more).toBe(false);
    const back = await rig.stripe.balanceTransactions.list({ limit: 5, ending_before: second.data[0]!.id });
    expect(back.data.map((t) => t.id)).toEqual(ids.slice(5, 10));
    const all = await rig.stripe.balanceTransactions.list({ limit: 7, type: "adjustment" }).autoPagingToArray({ limit: 100 });
    expect(all.map((t) => t.id)).toEqual(ids);
    const bySource = await rig.stripe.balanceTransactions.list({ type: "charge" });
    expect(bySource.data).toEqual([]);
    const badCursor = await rig.stripe.balanceTransactions.list({ starting_after: "txn_nope" }).catch((e: unknown) => e);
    expect(badCursor).toMatchObject({ statusCode: 404, param: "starting_after" });
  });

  it("admin seeds each reconciliation exception: unmatched money, altered amounts, a refund the app never hears of", async () => {
    // Money with no order behind it.
    const orphan = await rig.admin("/admin/balance-transactions", { amount: 4_200, currency: "eur" });
    expect(orphan.json.charge).toMatchObject({ object: "charge", amount: 4_200, payment_intent: null, metadata: {} });
    expect((await rig.stripe.balanceTransactions.list({ source: orphan.json.charge.id })).data).toHaveLength(1);

    // A payment whose processor-side amount no longer matches what the app recorded.
    const pi = await payDeposit(50_000);
    const charge = (await rig.stripe.charges.list({ payment_intent: pi })).data[0]!;
    await rig.admin(`/admin/balance-transactions/${String(charge.balance_transaction)}`, { amount: 49_000 });
    const altered = await rig.stripe.balanceTransactions.retrieve(String(charge.balance_transaction));
    expect(altered.amount).toBe(49_000);
    expect(altered.net).toBe(49_000 - altered.fee);

    // A refund made behind the app's back: in the ledger, no webhook.
    rig.hooks.received.length = 0;
    const silent = await rig.admin("/admin/refunds", { payment_intent: pi, amount: 7_500 });
    expect(silent.json).toMatchObject({ object: "refund", amount: 7_500, status: "succeeded" });
    await pause(200);
    expect(rig.hooks.received).toHaveLength(0);
    expect((await rig.stripe.balanceTransactions.list({ type: "refund" })).data.map((t) => t.amount)).toEqual([-7_500]);
  });
});
