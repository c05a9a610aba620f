// What happens when a payer submits the hosted checkout form: the payment intent is created on the
// first attempt, each attempt makes a charge, and a successful one a balance transaction with the
// fee. Events go out in the order the hosted service sends them.
import type { StripeContext } from "./context";
import { feeDetails, processingFee } from "./fees";
import { newId, nowSeconds } from "./ids";
import type { CardOutcome } from "./test-cards";
import type { BalanceTransaction, Charge, CheckoutSession, PaymentIntent } from "./types";

export interface Payer {
  name: string | null;
  email: string | null;
  last4: string;
  exp_month: number;
  exp_year: number;
}

export type AttemptResult = { ok: true; session: CheckoutSession } | { ok: false; message: string; code: string; decline_code: string | null };

function intentFor(ctx: StripeContext, s: CheckoutSession, payer: Payer): PaymentIntent {
  if (s.payment_intent) return ctx.state.payment_intents[s.payment_intent]!;
  const extra = ctx.state.session_intent_data[s.id] ?? { metadata: {}, description: null };
  const id = newId("pi");
  const pi: PaymentIntent = {
    id,
    object: "payment_intent",
    amount: s.amount_total,
    amount_capturable: 0,
    amount_received: 0,
    canceled_at: null,
    capture_method: "automatic_async",
    client_secret: `${id}_secret_${newId("x", 25).slice(2)}`,
    confirmation_method: "automatic",
    created: nowSeconds(),
    currency: s.currency,
    customer: null,
    description: extra.description,
    last_payment_error: null,
    latest_charge: null,
    livemode: false,
    metadata: { ...extra.metadata },
    payment_method: null,
    payment_method_types: ["card"],
    receipt_email: s.customer_email ?? payer.email,
    status: "requires_payment_method",
  };
  ctx.state.payment_intents[id] = pi;
  s.payment_intent = id;
  ctx.emit("payment_intent.created", pi);
  return pi;
}

/** A balance transaction; becomes available `availableAfterSeconds` after it is made. */
export function addBalanceTransaction(
  ctx: StripeContext,
  fields: Pick<BalanceTransaction, "amount" | "currency" | "type" | "source" | "description"> & { fee?: number },
): BalanceTransaction {
  const created = nowSeconds();
  const fee = fields.fee ?? 0;
  const txn: BalanceTransaction = {
    id: newId("txn"),
    object: "balance_transaction",
    amount: fields.amount,
    available_on: created + ctx.opts.availableAfterSeconds,
    created,
    currency: fields.currency,
    description: fields.description,
    exchange_rate: null,
    fee,
    fee_details: feeDetails(fee, fields.currency),
    net: fields.amount - fee,
    reporting_category: fields.type === "refund_failure" ? "refund_failure" : fields.type,
    source: fields.source,
    status: ctx.opts.availableAfterSeconds > 0 ? "pending" : "available",
    type: fields.type,
  };
  ctx.state.balance_transactions[txn.id] = txn;
  return txn;
}

/** A charge on a card, succeeded or failed; a succeeded one gets its balance transaction. */
export function addCharge(
  ctx: StripeContext,
  f: { amount: number; currency: string; intent: PaymentIntent | null; payer: Payer; outcome: CardOutcome; description: string | null },
): Charge {
  const ok = f.outcome.ok;
  const charge: Charge = {
    id: newId("ch"),
    object: "charge",
    amount: f.amount,
    amount_captured: ok ? f.amount : 0,
    amount_refunded: 0,
    balance_transaction: null,
    billing_details: { email: f.payer.email, name: f.payer.name, address: null, phone: null },
    captured: ok,
    created: nowSeconds(),
    currency: f.currency,
    description: f.description,
    failure_code: ok ? null : f.outcome.code,
    failure_message: ok ? null : f.outcome.message,
    livemode: false,
    metadata: { ...(f.intent?.metadata ?? {}) },
    outcome: ok
      ? { network_status: "approved_by_network", reason: null, risk_level: "normal", seller_message: "Payment complete.", type: "authorized" }
      : {
          network_status: "declined_by_network",
          reason: f.outcome.decline_code ?? f.outcome.code,
          risk_level: "normal",
          seller_message: "The bank did not return any further details with this decline.",
          type: "issuer_declined",
        },
    paid: ok,
    payment_intent: f.intent?.id ?? null,
    payment_method: newId("pm"),
    payment_method_details: {
      type: "card",
      card: {
        brand: f.outcome.brand,
        last4: f.payer.last4,
        exp_month: f.payer.exp_month,
        exp_year: f.payer.exp_year,
        funding: f.outcome.ok ? f.outcome.funding : "credit",
        country: "US",
      },
    },
    receipt_email: f.intent?.receipt_email ?? f.payer.email,
    refunded: false,
    status: ok ? "succeeded" : "failed",
  };
  if (ok) {
    const fee = processingFee(f.amount, f.currency);
    charge.balance_transaction = addBalanceTransaction(ctx, {
      amount: f.amount,
      currency: f.currency,
      type: "charge",
      source: charge.id,
      description: f.description,
      fee,
    }).id;
  }
  ctx.state.charges[charge.id] = charge;
  return charge;
}

/** One payment attempt on an open session with a test card's outcome. */
export function attemptPayment(ctx: StripeContext, s: CheckoutSession, payer: Payer, outcome: CardOutcome): AttemptResult {
  const pi = intentFor(ctx, s, payer);
  const charge = addCharge(ctx, { amount: s.amount_total, currency: s.currency, intent: pi, payer, outcome, description: pi.description });
  pi.latest_charge = charge.id;
  pi.payment_method = charge.payment_method;
  if (!outcome.ok) {
    pi.last_payment_error = { type: "card_error", code: outcome.code, decline_code: outcome.decline_code, message: outcome.message, charge: charge.id };
    ctx.emit("charge.failed", charge);
    ctx.emit("payment_intent.payment_failed", pi);
    ctx.store.changed();
    return { ok: false, message: outcome.message, code: outcome.code, decline_code: outcome.decline_code };
  }
  pi.status = "succeeded";
  pi.amount_received = pi.amount;
  pi.last_payment_error = null;
  s.status = "complete";
  s.payment_status = "paid";
  s.url = null;
  s.customer_details = { email: s.customer_email ?? payer.email, name: payer.name, address: null, phone: null };
  ctx.emit("charge.succeeded", charge);
  ctx.emit("payment_intent.succeeded", pi, { previous: { status: "requires_payment_method" } });
  ctx.emit("checkout.session.completed", s);
  ctx.store.changed();
  return { ok: true, session: s };
}
