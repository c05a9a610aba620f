// Read endpoints for what a payment leaves behind: payment intents, charges, refunds (create too),
// balance transactions, payouts, events and the balance.
import type { ApiRoutes } from "../api";
import { expand, type StripeContext } from "../context";
import { found, invalid, noSuch } from "../errors";
import { newestFirst, paginate } from "../lists";
import { expandList, metadata, optInt, optString, rangeFilter, type Params } from "../params";
import { createRefund } from "../refunding";
import { settleBalance } from "../payout-run";
import type { Refund } from "../types";

const REASONS = ["duplicate", "fraudulent", "requested_by_customer"] as const;

export function refundRequest(p: Params) {
  const reason = optString(p, "reason");
  if (reason && !(REASONS as readonly string[]).includes(reason)) throw invalid(`Invalid reason: must be one of ${REASONS.join(", ")}`, "reason");
  return {
    payment_intent: optString(p, "payment_intent"),
    charge: optString(p, "charge"),
    amount: optInt(p, "amount", "amount", 1),
    reason: reason as Refund["reason"],
    metadata: metadata(p),
  };
}

function retrieve<T>(ctx: StripeContext, table: Record<string, T>, what: string) {
  return (p: Params, path: Record<string, string>) => {
    return expand(ctx.state, found(table[path.id!], what, path.id!), expandList(p));
  };
}

export function registerPaymentReads(api: ApiRoutes, ctx: StripeContext): void {
  // Tables are looked up per call: a reset swaps the whole state object.
  api.get("/v1/payment_intents/:id", (p, path) => retrieve(ctx, ctx.state.payment_intents, "payment_intent")(p, path));
  api.get("/v1/payment_intents", (p) => {
    const created = rangeFilter(p, "created");
    const list = newestFirst(ctx.state.payment_intents).filter((pi) => !created || created(pi.created));
    return expand(ctx.state, paginate(list, p, "/v1/payment_intents", "payment_intent"), expandList(p));
  });
  api.get("/v1/charges/:id", (p, path) => retrieve(ctx, ctx.state.charges, "charge")(p, path));
  api.get("/v1/charges", (p) => {
    const pi = optString(p, "payment_intent");
    const list = newestFirst(ctx.state.charges).filter((c) => !pi || c.payment_intent === pi);
    return expand(ctx.state, paginate(list, p, "/v1/charges", "charge"), expandList(p));
  });

  api.post("/v1/refunds", (p) => expand(ctx.state, createRefund(ctx, refundRequest(p)), expandList(p)));
  api.get("/v1/refunds/:id", (p, path) => retrieve(ctx, ctx.state.refunds, "refund")(p, path));
  api.get("/v1/refunds", (p) => {
    const pi = optString(p, "payment_intent");
    const ch = optString(p, "charge");
    const list = newestFirst(ctx.state.refunds).filter((r) => (!pi || r.payment_intent === pi) && (!ch || r.charge === ch));
    return expand(ctx.state, paginate(list, p, "/v1/refunds", "refund"), expandList(p));
  });

  api.get("/v1/balance_transactions/:id", (p, path) => {
    settleBalance(ctx);
    return retrieve(ctx, ctx.state.balance_transactions, "balance transaction")(p, path);
  });
  api.get("/v1/balance_transactions", (p) => {
    settleBalance(ctx);
    const type = optString(p, "type");
    const source = optString(p, "source");
    const payout = optString(p, "payout");
    const currency = optString(p, "currency");
    const created = rangeFilter(p, "created");
    if (payout && !ctx.state.payouts[payout]) throw noSuch("payout", payout, "payout");
    const list = newestFirst(ctx.state.balance_transactions).filter(
      (t) =>
        (!type || t.type === type) &&
        (!source || t.source === source) &&
        (!payout || ctx.state.payout_of[t.id] === payout) &&
        (!currency || t.currency === currency) &&
        (!created || created(t.created)),
    );
    return expand(ctx.state, paginate(list, p, "/v1/balance_transactions", "balance transaction"), expandList(p));
  });

  api.get("/v1/payouts/:id", (p, path) => retrieve(ctx, ctx.state.payouts, "payout")(p, path));
  api.get("/v1/payouts", (p) => {
    const status = optString(p, "status");
    const created = rangeFilter(p, "created");
    const arrival = rangeFilter(p, "arrival_date");
    const list = newestFirst(ctx.state.payouts).filter(
      (po) => (!status || po.status === status) && (!created || created(po.created)) && (!arrival || arrival(po.arrival_date)),
    );
    return expand(ctx.state, paginate(list, p, "/v1/payouts", "payout"), expandList(p));
  });

  api.get("/v1/events/:id", (p, path) => retrieve(ctx, ctx.state.events, "event")(p, path));
  api.get("/v1/events", (p) => {
    const type = optString(p, "type");
    const created = rangeFilter(p, "created");
    const matches = (t: string) => !type || (type.endsWith(".*") ? t.startsWith(type.slice(0, -1)) : t === type);
    const list = newestFirst(ctx.state.events).filter((e) => matches(e.type) && (!created || created(e.created)));
    return paginate(list, p, "/v1/events", "event");
  });

  api.get("/v1/balance", () => {
    settleBalance(ctx);
    const sums = new Map<string, { available: number; pending: number }>();
    for (const t of Object.values(ctx.state.balance_transactions)) {
      const b = sums.get(t.currency) ?? { available: 0, pending: 0 };
      b[t.status] += t.net;
      sums.set(t.currency, b);
    }
    const of = (k: "available" | "pending") => [...sums].map(([currency, b]) => ({ amount: b[k], currency, source_types: { card: b[k] } }));
    return { object: "balance", available: of("available"), pending: of("pending"), livemode: false };
  });
}
