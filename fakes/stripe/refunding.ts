// Refunds of a succeeded charge, full or partial: a negative balance transaction, the charge's
// amount_refunded, and the events (unless the caller wants the app kept in the dark).
import type { StripeContext } from "./context";
import { found, invalid } from "./errors";
import { newId, nowSeconds } from "./ids";
import { addBalanceTransaction } from "./payments";
import type { Charge, Metadata, Refund } from "./types";

export interface RefundRequest {
  payment_intent: string | null;
  charge: string | null;
  amount: number | null;
  reason: Refund["reason"];
  metadata: Metadata;
}

function chargeToRefund(ctx: StripeContext, r: RefundRequest): Charge {
  if (r.charge) {
    return found(ctx.state.charges[r.charge], "charge", r.charge, "charge");
  }
  if (!r.payment_intent) throw invalid("One of the following params should be provided for this request: payment_intent or charge.", undefined, "parameter_missing");
  const pi = found(ctx.state.payment_intents[r.payment_intent], "payment_intent", r.payment_intent, "payment_intent");
  const ch = pi.latest_charge ? ctx.state.charges[pi.latest_charge] : undefined;
  if (pi.status !== "succeeded" || !ch) {
    throw invalid(`This PaymentIntent (${pi.id}) does not have a successful charge to refund.`, "payment_intent", "charge_not_refundable");
  }
  return ch;
}

export function createRefund(ctx: StripeContext, r: RefundRequest, notify = true): Refund {
  const ch = chargeToRefund(ctx, r);
  if (ch.status !== "succeeded") throw invalid(`Charge ${ch.id} has not succeeded and cannot be refunded.`, "charge", "charge_not_refundable");
  const left = ch.amount - ch.amount_refunded;
  if (left <= 0) throw invalid(`Charge ${ch.id} has already been refunded.`, undefined, "charge_already_refunded");
  const amount = r.amount ?? left;
  if (amount <= 0) throw invalid("Refund amount must be greater than 0.", "amount", "parameter_invalid_integer");
  if (amount > left) {
    throw invalid(`Refund amount (${amount}) is greater than unrefunded amount on charge (${left}).`, "amount", "amount_too_large");
  }
  const refund: Refund = {
    id: newId("re"),
    object: "refund",
    amount,
    balance_transaction: null,
    charge: ch.id,
    created: nowSeconds(),
    currency: ch.currency,
    metadata: r.metadata,
    payment_intent: ch.payment_intent,
    reason: r.reason,
    status: "succeeded",
  };
  refund.balance_transaction = addBalanceTransaction(ctx, {
    amount: -amount,
    currency: ch.currency,
    type: "refund",
    source: refund.id,
    description: "REFUND FOR CHARGE",
  }).id;
  ctx.state.refunds[refund.id] = refund;
  const previous = { amount_refunded: ch.amount_refunded, refunded: ch.refunded };
  ch.amount_refunded += amount;
  ch.refunded = ch.amount_refunded === ch.amount;
  ctx.emit("refund.created", refund, { notify });
  ctx.emit("charge.refunded", ch, { previous, notify });
  ctx.store.changed();
  return refund;
}

/** Admin: the bank returned a refund. A reversing balance transaction puts the money back. */
export function failRefund(ctx: StripeContext, id: string, reason = "lost_or_stolen_card"): Refund {
  const refund = found(ctx.state.refunds[id], "refund", id);
  if (refund.status !== "succeeded" && refund.status !== "pending") throw invalid(`Refund ${id} is ${refund.status}.`);
  const previous = { status: refund.status };
  refund.status = "failed";
  refund.failure_reason = reason;
  refund.failure_balance_transaction = addBalanceTransaction(ctx, {
    amount: refund.amount,
    currency: refund.currency,
    type: "refund_failure",
    source: refund.id,
    description: "REFUND FAILURE",
  }).id;
  const ch = ctx.state.charges[refund.charge];
  if (ch) {
    ch.amount_refunded -= refund.amount;
    ch.refunded = false;
  }
  ctx.emit("refund.updated", refund, { previous });
  ctx.emit("refund.failed", refund);
  ctx.store.changed();
  return refund;
}
