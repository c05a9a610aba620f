// /admin/… — JSON controls for tests and demos (no key: the fake listens on 127.0.0.1 only).
// Each one is listed, with its body, by GET /admin.
import type { IncomingMessage, ServerResponse } from "node:http";
import { readJsonBody, type Router, sendJson } from "../kit/http";
import type { Outage, OutageMode } from "../kit/serve";
import type { StripeContext } from "./context";
import { found, invalid, StripeFakeError } from "./errors";
import { jsonParams, optInt, optString, type Params } from "./params";
import { addBalanceTransaction, addCharge, attemptPayment } from "./payments";
import { runPayouts } from "./payout-run";
import { createRefund, failRefund } from "./refunding";
import { refundRequest } from "./resources/payments-read";
import { checkCard, parseExpiry } from "./test-cards";
import { feeDetails, fixedFee, FEE_PERCENT, processingFee } from "./fees";
import { parseRule } from "./webhooks/rules";
import type { WebhookDispatcher } from "./webhooks/dispatcher";

export const ADMIN_ENDPOINTS: Record<string, string> = {
  "GET /admin/state": "counts, outage, webhook URL, rules",
  "POST /admin/reset": "forget everything (sessions, payments, events, deliveries, rules, outage)",
  "POST /admin/outage": '{mode:"unavailable"|"refuse"|"none", seconds?} — 503 for the API and hosted page, or refuse connections for `seconds` (default 5)',
  "GET /admin/webhooks/deliveries": "?event_type=&event_id=&status= — every delivery with its attempts",
  "POST /admin/webhooks/rules": '{action:"duplicate"|"delay"|"drop"|"hold", event_type?, count?=1, copies?=2, delay_ms?=1000} — applies to the next `count` matching events',
  "GET /admin/webhooks/rules": "rules not yet used up",
  "DELETE /admin/webhooks/rules": "remove all rules",
  "POST /admin/webhooks/release": '{order?:"reverse"|"as_held", event_ids?:[…]} — send held deliveries in that order',
  "POST /admin/webhooks/flush": "send every waiting retry and delayed delivery now",
  "POST /admin/webhooks/redeliver": "{event_id} — one more delivery of an event",
  "POST /admin/webhooks/endpoint": "{url|null} — where webhooks go (null = STRIPE_WEBHOOK_URL)",
  "POST /admin/checkout/sessions/:id/pay": "{card_number?=4242…, name?, email?} — pay without the browser (same path as the page)",
  "POST /admin/payouts/run": "{currency?} — pay out every available balance now",
  "POST /admin/balance-transactions": '{amount, currency, type?:"charge"|"adjustment", description?} — money the app has no record of',
  "POST /admin/balance-transactions/:id": "{amount?, fee?, currency?, exchange_rate?} — change the amounts (or the settlement currency) silently (no event)",
  "POST /admin/refunds": "{payment_intent|charge, amount?, reason?} — refund without telling the app (no webhook)",
  "POST /admin/refunds/:id/fail": "{reason?} — the refund bounces: refund.updated + refund.failed, money back in the balance",
  "GET /admin/fees": "the fee formula",
};

export function registerAdmin(router: Router, ctx: StripeContext, outage: Outage, webhooks: WebhookDispatcher, onReset: () => void): void {
  const json =
    (fn: (p: Params, path: Record<string, string>, url: URL) => unknown) =>
    async (req: IncomingMessage, res: ServerResponse, path: Record<string, string>, url: URL) => {
      const body = req.method === "GET" || req.method === "DELETE" ? {} : await readJsonBody(req, res);
      if (body === undefined) return;
      try {
        const result = fn(jsonParams(body), path, url);
        ctx.store.changed();
        sendJson(res, 200, result);
      } catch (err) {
        if (!(err instanceof StripeFakeError)) throw err;
        sendJson(res, err.status, err.toBody());
      }
    };
  const s = () => ctx.state;

  router.on("GET", "/admin", json(() => ({ endpoints: ADMIN_ENDPOINTS })));
  router.on(
    "GET",
    "/admin/state",
    json(() => ({
      outage: outage.describe(),
      webhook_url: webhooks.targetUrl(),
      rules: s().rules,
      counts: Object.fromEntries(
        (["checkout_sessions", "payment_intents", "charges", "refunds", "balance_transactions", "payouts", "events", "deliveries"] as const).map(
          (k) => [k, Object.keys(s()[k]).length],
        ),
      ),
    })),
  );
  router.on("GET", "/admin/fees", json(() => ({ percent: FEE_PERCENT, fixed_minor: { eur: fixedFee("eur"), usd: fixedFee("usd"), gbp: fixedFee("gbp"), other: fixedFee("xxx") }, example_eur_10000: processingFee(10000, "eur") })));
  router.on(
    "POST",
    "/admin/reset",
    json(() => {
      outage.end();
      ctx.store.reset();
      onReset();
      return { ok: true };
    }),
  );
  router.on(
    "POST",
    "/admin/outage",
    json((p) => {
      const mode = (optString(p, "mode") ?? "unavailable") as OutageMode;
      if (!["unavailable", "refuse", "none"].includes(mode)) throw invalid('mode must be "unavailable", "refuse" or "none"', "mode");
      const seconds = p.seconds === undefined ? null : Number(p.seconds);
      if (seconds !== null && !(seconds > 0 && seconds <= 600)) throw invalid("seconds must be between 0 and 600", "seconds");
      outage.start(mode, seconds);
      return outage.describe();
    }),
  );

  router.on(
    "GET",
    "/admin/webhooks/deliveries",
    json((_p, _path, url) => {
      const q = url.searchParams;
      const list = Object.values(s().deliveries)
        .filter(
          (d) =>
            (!q.get("event_type") || d.event_type === q.get("event_type")) &&
            (!q.get("event_id") || d.event_id === q.get("event_id")) &&
            (!q.get("status") || d.status === q.get("status")),
        )
        .sort((a, b) => a.seq - b.seq);
      return { data: list };
    }),
  );
  router.on(
    "POST",
    "/admin/webhooks/rules",
    json((p) => {
      const rule = parseRule(p);
      s().rules.push(rule);
      return rule;
    }),
  );
  router.on("GET", "/admin/webhooks/rules", json(() => ({ data: s().rules })));
  router.on(
    "DELETE",
    "/admin/webhooks/rules",
    json(() => {
      s().rules.splice(0);
      return { data: [] };
    }),
  );
  router.on(
    "POST",
    "/admin/webhooks/release",
    json((p) => {
      const order = optString(p, "order") === "as_held" ? "as_held" : "reverse";
      const ids = Array.isArray(p.event_ids) ? p.event_ids.map(String) : null;
      return { data: webhooks.release(order, ids) };
    }),
  );
  router.on("POST", "/admin/webhooks/flush", json(() => ({ due_now: webhooks.flush() })));
  router.on(
    "POST",
    "/admin/webhooks/redeliver",
    json((p) => {
      const id = optString(p, "event_id");
      if (!id) throw invalid("event_id is required", "event_id");
      return webhooks.redeliver(id);
    }),
  );
  router.on(
    "POST",
    "/admin/webhooks/endpoint",
    json((p) => {
      const url = optString(p, "url");
      if (url && !/^https?:\/\//.test(url)) throw invalid("url must be http(s)", "url");
      s().webhook_url = url;
      return { webhook_url: webhooks.targetUrl() };
    }),
  );

  router.on(
    "POST",
    "/admin/checkout/sessions/:id/pay",
    json((p, { id }) => {
      const session = found(s().checkout_sessions[id!], "checkout.session", id!);
      if (session.status !== "open") throw invalid(`Checkout Session is ${session.status}.`);
      const card = checkCard({ number: optString(p, "card_number") ?? "4242424242424242", exp: optString(p, "card_exp") ?? "12/34", cvc: "123" });
      if (!card.valid) throw invalid(card.message, card.field);
      const exp = parseExpiry(optString(p, "card_exp") ?? "12/34")!;
      const payer = { name: optString(p, "name"), email: optString(p, "email") ?? session.customer_email, last4: card.last4, exp_month: exp.month, exp_year: exp.year };
      const result = attemptPayment(ctx, session, payer, card.outcome);
      return { ...result, session, payment_intent: session.payment_intent ? s().payment_intents[session.payment_intent] : null };
    }),
  );
  router.on(
    "POST",
    "/admin/payouts/run",
    json((p) => ({ data: runPayouts(ctx, optString(p, "currency")?.toLowerCase() ?? null, false) })),
  );
  router.on(
    "POST",
    "/admin/balance-transactions",
    json((p) => {
      const amount = optInt(p, "amount", "amount", -1e12);
      const currency = optString(p, "currency")?.toLowerCase();
      if (amount === null || amount === 0) throw invalid("amount (minor units, not 0) is required", "amount");
      if (!currency || !/^[a-z]{3}$/.test(currency)) throw invalid("currency is required", "currency");
      const type = optString(p, "type") ?? "charge";
      const description = optString(p, "description") ?? "Payment with no order (seeded by admin)";
      if (type === "charge") {
        if (amount < 0) throw invalid("a charge needs a positive amount", "amount");
        const charge = addCharge(ctx, {
          amount,
          currency,
          intent: null,
          payer: { name: null, email: null, last4: "4242", exp_month: 12, exp_year: 2034 },
          outcome: { ok: true, brand: "visa", funding: "credit" },
          description,
        });
        return { charge, balance_transaction: s().balance_transactions[charge.balance_transaction!] };
      }
      if (type !== "adjustment") throw invalid('type must be "charge" or "adjustment"', "type");
      return { balance_transaction: addBalanceTransaction(ctx, { amount, currency, type: "adjustment", source: null, description }) };
    }),
  );
  router.on(
    "POST",
    "/admin/balance-transactions/:id",
    json((p, { id }) => {
      const t = found(s().balance_transactions[id!], "balance transaction", id!);
      const amount = optInt(p, "amount", "amount", -1e12);
      const fee = optInt(p, "fee", "fee", 0);
      const currency = optString(p, "currency")?.toLowerCase();
      if (currency !== undefined && !/^[a-z]{3}$/.test(currency)) throw invalid("currency must be a 3-letter code", "currency");
      const rate = p.exchange_rate === undefined ? undefined : Number(p.exchange_rate);
      if (rate !== undefined && !(rate > 0)) throw invalid("exchange_rate must be a positive number", "exchange_rate");
      // Settled in another currency than charged: the processor converted it (at exchange_rate).
      if (currency) t.currency = currency;
      if (rate !== undefined) t.exchange_rate = rate;
      if (amount !== null) t.amount = amount;
      if (fee !== null) {
        t.fee = fee;
        t.fee_details = feeDetails(fee, t.currency);
      }
      t.net = t.amount - t.fee;
      return t;
    }),
  );
  router.on("POST", "/admin/refunds", json((p) => createRefund(ctx, refundRequest(p), false)));
  router.on("POST", "/admin/refunds/:id/fail", json((p, { id }) => failRefund(ctx, id!, optString(p, "reason") ?? undefined)));
}
