// A month of card payments with one of each reconciliation exception, made through the running app
// and the shared payments fake (the browser tests run alone, after Vitest, so steering the fake's
// webhook rules here disturbs no other test): clients pay balances on Checkout, the fake's webhooks
// reach the app's webhook route, then the fake's controls make the processor differ from the ledger.
import { expect } from "@playwright/test";
import { approvedCommission, recordPayment } from "../http/books-helpers";
import { base, signInRoles } from "../http/commission-helpers";
import type { TestMember, TestWorkshop } from "../http/fixtures";
import { checkout, eventsAbout, payAtProcessor, paymentRows, settled, stripeAdmin, waitFor } from "../http/payment-helpers";
import { signIn } from "../http/session";

export type Twist = "clean" | "lost-confirmation" | "amount-changed" | "currency-changed" | "refund-untold" | "refund-bounced";
export const TWISTS: Twist[] = ["clean", "lost-confirmation", "amount-changed", "currency-changed", "refund-untold", "refund-bounced"];

const dropNext = async (...types: string[]) => {
  for (const event_type of types) expect((await stripeAdmin("/admin/webhooks/rules", { action: "drop", event_type })).status).toBe(200);
};

/** Plays one commission out: opened, spec approved, deposit recorded, balance paid by card, then its twist. */
async function playOut(ws: TestWorkshop, client: TestMember, twist: Twist, n: number) {
  const s = await signInRoles(ws);
  const payer = await signIn(client);
  const c = await approvedCommission({ ...s, client: payer }, ws, { title: `Bookkeeper journey ${n}: ${twist}`, priceMinor: 300_000 + n * 10_000, clientId: client.userId });
  await recordPayment(s.bookkeeper, ws, c.id, { kind: "deposit", amountMinor: c.money!.depositMinor });
  const co = await checkout(payer, ws, c.id, "balance");
  expect(co.status, JSON.stringify(co.error)).toBe(201);
  if (twist === "lost-confirmation") await dropNext("payment_intent.succeeded", "checkout.session.completed");
  const paid = await payAtProcessor(co.checkout.sessionId);
  expect(paid.status).toBe(200);
  const pi = String(paid.json.session.payment_intent);
  await settled((await eventsAbout([co.checkout.sessionId, pi])).map((e) => e.id));
  if (twist === "lost-confirmation") return;
  const row = await waitFor("the balance to be recorded", async () => (await paymentRows(c.id)).find((r) => r.kind === "balance" && r.status === "paid"));
  const txn = row.processor_balance_txn_id!;
  if (twist === "amount-changed") await stripeAdmin(`/admin/balance-transactions/${txn}`, { amount: row.amount_minor - 1_250 });
  if (twist === "currency-changed") await stripeAdmin(`/admin/balance-transactions/${txn}`, { currency: "usd", exchange_rate: 1.0842, amount: Math.round(row.amount_minor * 1.0842) });
  if (twist === "refund-untold") await stripeAdmin("/admin/refunds", { payment_intent: pi, amount: 20_000 });
  if (twist === "refund-bounced") {
    const r = await s.bookkeeper.json<{ refund: { id: number; processor: { refundId: string } } }>(`${base(ws)}/${c.id}/refunds`, { json: { paymentId: row.id, amountMinor: 20_000 } });
    expect(r.status).toBe(202);
    await waitFor("the refund to be confirmed", async () => (await paymentRows(c.id)).find((x) => x.kind === "refund" && x.status === "paid"));
    await dropNext("refund.updated", "refund.failed");
    expect((await stripeAdmin(`/admin/refunds/${r.body.refund.processor.refundId}/fail`, {})).status).toBe(200);
    await settled((await eventsAbout([pi])).map((e) => e.id));
  }
}

/** Every twist once (clients taking turns), then a payout of what the processor holds. */
export async function cardMonth(ws: TestWorkshop): Promise<void> {
  const clients = ws.members.filter((m) => m.role === "client");
  for (const [i, twist] of TWISTS.entries()) await playOut(ws, clients[i % clients.length]!, twist, i + 1);
  expect((await stripeAdmin("/admin/payouts/run", {})).status).toBe(200);
}
