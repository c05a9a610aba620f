// Payouts: every available, not yet paid-out balance transaction of a currency is swept into one
// payout (when the sum is positive), so reconciliation can match a bank deposit to the payments in it.
import type { StripeContext } from "./context";
import { newId, nowSeconds } from "./ids";
import { addBalanceTransaction } from "./payments";
import type { BalanceTransaction, Payout } from "./types";

/** Pending → available once available_on has passed. */
export function settleBalance(ctx: StripeContext): void {
  const now = nowSeconds();
  for (const t of Object.values(ctx.state.balance_transactions)) if (t.status === "pending" && t.available_on <= now) t.status = "available";
}

export function runPayouts(ctx: StripeContext, currency: string | null, automatic: boolean): Payout[] {
  settleBalance(ctx);
  const due = new Map<string, BalanceTransaction[]>();
  for (const t of Object.values(ctx.state.balance_transactions)) {
    if (t.type === "payout" || t.status !== "available" || ctx.state.payout_of[t.id]) continue;
    if (currency && t.currency !== currency) continue;
    due.set(t.currency, [...(due.get(t.currency) ?? []), t]);
  }
  const made: Payout[] = [];
  for (const [cur, txns] of due) {
    const total = txns.reduce((s, t) => s + t.net, 0);
    if (total <= 0) continue;
    const now = nowSeconds();
    const payout: Payout = {
      id: newId("po"),
      object: "payout",
      amount: total,
      arrival_date: now,
      automatic,
      balance_transaction: "",
      created: now,
      currency: cur,
      description: "STRIPE PAYOUT",
      destination: "ba_fake_local_bank",
      failure_code: null,
      failure_message: null,
      livemode: false,
      metadata: {},
      method: "standard",
      reconciliation_status: "completed",
      source_type: "card",
      statement_descriptor: null,
      status: "paid",
      type: "bank_account",
    };
    const own = addBalanceTransaction(ctx, { amount: -total, currency: cur, type: "payout", source: payout.id, description: "STRIPE PAYOUT" });
    own.status = "available";
    payout.balance_transaction = own.id;
    ctx.state.payouts[payout.id] = payout;
    for (const t of [...txns, own]) ctx.state.payout_of[t.id] = payout.id;
    ctx.emit("payout.created", payout);
    ctx.emit("payout.paid", payout);
    made.push(payout);
  }
  ctx.store.changed();
  return made;
}
