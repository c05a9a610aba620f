// /v1/checkout/sessions: create (mode=payment with price_data line items), retrieve, list,
// line_items and expire.
import type { ApiRoutes } from "../api";
import { expand, type StripeContext } from "../context";
import { found, invalid, missingParam, noSuch } from "../errors";
import { newId, nowSeconds } from "../ids";
import { newestFirst, paginate } from "../lists";
import { expandList, metadata, optArray, optInt, optObject, optString, reqString, type Params } from "../params";
import type { CheckoutSession, LineItem } from "../types";

const DAY = 24 * 3600;

function lineItem(raw: unknown, i: number): LineItem {
  const path = `line_items[${i}]`;
  if (!raw || typeof raw !== "object") throw invalid(`Invalid object: ${path}`, path);
  const p = raw as Params;
  if (p.price !== undefined) throw noSuch("price", String(p.price), `${path}[price]`);
  const pd = optObject(p, "price_data", `${path}[price_data]`);
  if (!pd) throw missingParam(`${path}[price_data]`);
  const currency = reqString(pd, "currency", `${path}[price_data][currency]`).toLowerCase();
  if (!/^[a-z]{3}$/.test(currency)) throw invalid(`Invalid currency: ${currency}.`, `${path}[price_data][currency]`);
  const unit = optInt(pd, "unit_amount", `${path}[price_data][unit_amount]`);
  if (unit === null) throw missingParam(`${path}[price_data][unit_amount]`);
  const product = optObject(pd, "product_data", `${path}[price_data][product_data]`);
  if (!product) throw missingParam(`${path}[price_data][product_data]`);
  const name = reqString(product, "name", `${path}[price_data][product_data][name]`, 250);
  const quantity = optInt(p, "quantity", `${path}[quantity]`, 1);
  if (quantity === null) throw missingParam(`${path}[quantity]`);
  const total = unit * quantity;
  return {
    id: newId("li"),
    object: "item",
    amount_discount: 0,
    amount_subtotal: total,
    amount_tax: 0,
    amount_total: total,
    currency,
    description: name,
    price: {
      id: newId("price"),
      object: "price",
      active: false,
      currency,
      product: newId("prod", 14),
      type: "one_time",
      unit_amount: unit,
      unit_amount_decimal: String(unit),
    },
    quantity,
  };
}

export function createCheckoutSession(ctx: StripeContext, p: Params): CheckoutSession {
  const mode = reqString(p, "mode");
  if (mode !== "payment") throw invalid("This fake supports mode=payment only.", "mode", "parameter_invalid");
  const rawItems = optArray(p, "line_items");
  if (rawItems.length === 0) throw missingParam("line_items");
  const items = rawItems.map(lineItem);
  const currency = items[0]!.currency;
  if (items.some((li) => li.currency !== currency)) throw invalid("All line items must use the same currency.", "line_items");
  const total = items.reduce((s, li) => s + li.amount_total, 0);
  if (total <= 0) throw invalid("The Checkout Session's total amount due must be greater than 0.", "line_items", "amount_too_small");
  const successUrl = reqString(p, "success_url", "success_url", 5000);
  if (!/^https?:\/\//.test(successUrl)) throw invalid("Not a valid URL", "success_url", "url_invalid");
  const cancelUrl = optString(p, "cancel_url");
  if (cancelUrl && !/^https?:\/\//.test(cancelUrl)) throw invalid("Not a valid URL", "cancel_url", "url_invalid");
  const now = nowSeconds();
  const expiresAt = optInt(p, "expires_at") ?? now + DAY;
  if (expiresAt <= now || expiresAt > now + DAY) {
    throw invalid("expires_at must be in the future and at most 24 hours from now.", "expires_at");
  }
  const pid = optObject(p, "payment_intent_data") ?? {};
  const id = newId("cs_test", 58);
  const session: CheckoutSession = {
    id,
    object: "checkout.session",
    amount_subtotal: total,
    amount_total: total,
    cancel_url: cancelUrl,
    client_reference_id: optString(p, "client_reference_id", "client_reference_id", 200),
    created: now,
    currency,
    customer: null,
    customer_details: null,
    customer_email: optString(p, "customer_email", "customer_email", 512),
    expires_at: expiresAt,
    livemode: false,
    metadata: metadata(p),
    mode: "payment",
    payment_intent: null,
    payment_method_types: ["card"],
    payment_status: "unpaid",
    status: "open",
    success_url: successUrl,
    total_details: { amount_discount: 0, amount_shipping: 0, amount_tax: 0 },
    ui_mode: "hosted",
    url: `${ctx.publicUrl()}/pay/${id}`,
  };
  ctx.state.checkout_sessions[id] = session;
  ctx.state.line_items[id] = items;
  ctx.state.session_intent_data[id] = {
    metadata: metadata(pid, "metadata", "payment_intent_data[metadata]"),
    description: optString(pid, "description", "payment_intent_data[description]", 1000),
  };
  return session;
}

export function getSession(ctx: StripeContext, id: string): CheckoutSession {
  return found(ctx.state.checkout_sessions[id], "checkout.session", id);
}

/** Ends an open session (API expire, or its expires_at passed); sends checkout.session.expired. */
export function expireSession(ctx: StripeContext, s: CheckoutSession): CheckoutSession {
  if (s.status !== "open") {
    throw invalid(`Only Checkout Sessions with a status in ["open"] can be expired. This Checkout Session has a status of "${s.status}".`, undefined, "checkout_session_not_open");
  }
  s.status = "expired";
  s.url = null;
  ctx.emit("checkout.session.expired", s, { previous: { status: "open" } });
  ctx.store.changed();
  return s;
}

/** Expires open sessions whose expires_at has passed (called by the fake's clock). */
export function expireDueSessions(ctx: StripeContext): void {
  const now = nowSeconds();
  for (const s of Object.values(ctx.state.checkout_sessions)) if (s.status === "open" && s.expires_at <= now) expireSession(ctx, s);
}

export function registerCheckoutSessions(api: ApiRoutes, ctx: StripeContext): void {
  const base = "/v1/checkout/sessions";
  api.post(base, (p) => expand(ctx.state, createCheckoutSession(ctx, p), expandList(p)));
  api.get(`${base}/:id`, (p, { id }) => expand(ctx.state, getSession(ctx, id!), expandList(p)));
  api.post(`${base}/:id/expire`, (p, { id }) => expand(ctx.state, expireSession(ctx, getSession(ctx, id!)), expandList(p)));
  api.get(`${base}/:id/line_items`, (p, { id }) => {
    getSession(ctx, id!);
    return paginate([...(ctx.state.line_items[id!] ?? [])], p, `${base}/${id}/line_items`, "line item");
  });
  api.get(base, (p) => {
    const pi = optString(p, "payment_intent");
    const status = optString(p, "status");
    const ref = optString(p, "client_reference_id");
    const all = newestFirst(ctx.state.checkout_sessions).filter(
      (s) => (!pi || s.payment_intent === pi) && (!status || s.status === status) && (!ref || s.client_reference_id === ref),
    );
    return expand(ctx.state, paginate(all, p, base, "checkout.session"), expandList(p));
  });
}
