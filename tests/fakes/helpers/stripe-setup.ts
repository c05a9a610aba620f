// An in-process Stripe fake with a webhook listener, and the app's own client pointed at it.
import type Stripe from "stripe";
import { afterAll, beforeAll, beforeEach } from "vitest";
import { startStripeFake, type StripeFake } from "@/fakes/stripe/app";
import { testOptions, type StripeFakeOptions } from "@/fakes/stripe/options";
import { createStripeClient, stripeSettings, verifyStripeWebhook } from "@/lib/services/stripe";
import { startWebhookListener, type Received, type WebhookListener } from "./webhook-listener";

export interface StripeRig {
  fake: StripeFake;
  hooks: WebhookListener;
  stripe: Stripe;
  secret: string;
  /** Verifies deliveries with the app's helper (the SDK's constructEvent on the raw body). */
  events(list?: Received[]): Stripe.Event[];
  admin(path: string, body?: unknown, method?: string): Promise<{ status: number; json: any }>;
  close(): Promise<void>;
}

export async function startStripeRig(overrides: Partial<StripeFakeOptions> = {}): Promise<StripeRig> {
  const hooks = await startWebhookListener();
  const fake = await startStripeFake(testOptions({ webhookUrl: hooks.url, ...overrides }));
  const settings = stripeSettings({
    STRIPE_SECRET_KEY: fake.ctx.opts.secretKey,
    STRIPE_WEBHOOK_SECRET: fake.ctx.opts.webhookSecret,
    STRIPE_API_HOST: "127.0.0.1",
    STRIPE_API_PORT: String(fake.port),
    STRIPE_API_PROTOCOL: "http",
    STRIPE_MAX_NETWORK_RETRIES: "0",
  });
  const stripe = createStripeClient(settings);
  const secret = fake.ctx.opts.webhookSecret;
  return {
    fake,
    hooks,
    stripe,
    secret,
    events: (list = hooks.received) => list.map((r) => verifyStripeWebhook(r.raw, r.signature, settings)),
    async admin(path, body, method = body === undefined ? "GET" : "POST") {
      const res = await fetch(`${fake.url}${path}`, {
        method,
        headers: { "Content-Type": "application/json" },
        body: body === undefined ? undefined : JSON.stringify(body),
      });
      return { status: res.status, json: await res.json() };
    },
    async close() {
      await fake.close();
      await hooks.close();
    },
  };
}

/**
 * One rig for a test file: started before all tests, reset (state, received deliveries, listener
 * healthy) before each, closed after all. Read it through `get()` inside the tests.
 */
export function useStripeRig(overrides: Partial<StripeFakeOptions> = {}): { get(): StripeRig } {
  let rig: StripeRig | null = null;
  beforeAll(async () => {
    rig = await startStripeRig(overrides);
  });
  afterAll(() => rig?.close());
  beforeEach(async () => {
    await rig!.admin("/admin/reset", {});
    rig!.hooks.received.length = 0;
    rig!.hooks.failing = false;
  });
  return { get: () => rig! };
}

export const CARD_OK = "4242 4242 4242 4242";
export const CARD_DECLINED = "4000 0000 0000 0002";
export const CARD_NO_FUNDS = "4000 0000 0000 9995";

/** A deposit-like session: one line item in EUR with our metadata. */
export function depositSession(stripe: Stripe, amount = 125_000, extra: Partial<Stripe.Checkout.SessionCreateParams> = {}) {
  return stripe.checkout.sessions.create({
    mode: "payment",
    line_items: [{ quantity: 1, price_data: { currency: "eur", unit_amount: amount, product_data: { name: "Deposit: commission FH-0012" } } }],
    success_url: "http://localhost:3999/fernhollow/commissions/FH-0012?paid={CHECKOUT_SESSION_ID}",
    cancel_url: "http://localhost:3999/fernhollow/commissions/FH-0012",
    client_reference_id: "invoice_41",
    customer_email: "nadia.fensome@example.com",
    metadata: { invoice_id: "41", commission_id: "12", workshop: "fernhollow", kind: "deposit" },
    payment_intent_data: { metadata: { invoice_id: "41", commission_id: "12" }, description: "Deposit FH-0012" },
    ...extra,
  });
}

/**
 * Pays on the hosted page the way a browser does: GET the page, read its form's action and
 * fields, POST them form-encoded, and do not follow the redirect.
 */
export async function payOnHostedPage(sessionUrl: string, cardNumber: string, extra: Record<string, string> = {}) {
  const page = await (await fetch(sessionUrl)).text();
  const action = /<form method="post" action="([^"]+)"/.exec(page)?.[1];
  if (!action) throw new Error("no payment form on the hosted page");
  const names = [...page.matchAll(/<input id="[^"]+" name="([^"]+)"/g)].map((m) => m[1]!);
  const values: Record<string, string> = { card_name: "Nadia Fensome", card_number: cardNumber, card_exp: "09/31", card_cvc: "314", email: "payer@example.com", ...extra };
  const form = new URLSearchParams(names.map((n) => [n, values[n] ?? ""]));
  const res = await fetch(new URL(action, sessionUrl), {
    method: "POST",
    headers: { "Content-Type": "application/x-www-form-urlencoded" },
    body: form,
    redirect: "manual",
  });
  return { status: res.status, location: res.headers.get("location"), html: res.status === 303 ? "" : await res.text() };
}
