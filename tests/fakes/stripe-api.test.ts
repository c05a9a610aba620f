// The app's Stripe client (lib/services/stripe.ts, configured from the environment) against the
// fake the launcher started for `npm test`; and outages and restarts on a fake of the test's own.
import { mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import Stripe from "stripe";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { startStripeFake } from "@/fakes/stripe/app";
import { testOptions } from "@/fakes/stripe/options";
import { createStripeClient, stripeSettings } from "@/lib/services/stripe";
import { pause } from "./helpers/webhook-listener";
import { depositSession, startStripeRig, type StripeRig } from "./helpers/stripe-setup";

describe("the app's Stripe client against the launcher's fake", () => {
  const settings = stripeSettings();
  const stripe = createStripeClient(settings);

  beforeAll(async () => {
    const health = await fetch(`http://127.0.0.1:${settings.STRIPE_API_PORT}/health`).catch(() => null);
    if (!health?.ok) throw new Error(`no Stripe fake on port ${settings.STRIPE_API_PORT}: run these tests through \`npm test\``);
  });

  it("creates and retrieves a checkout session", async () => {
    const s = await depositSession(stripe);
    expect(s.url).toContain(`/pay/${s.id}`);
    expect((await stripe.checkout.sessions.retrieve(s.id)).amount_total).toBe(125_000);
  });

  it("a wrong secret key is a 401 StripeAuthenticationError", async () => {
    const wrong = createStripeClient({ ...settings, STRIPE_SECRET_KEY: "sk_test_not_our_key_000" });
    const err = await wrong.checkout.sessions.list().catch((e: unknown) => e);
    expect(err).toBeInstanceOf(Stripe.errors.StripeAuthenticationError);
    expect(err).toMatchObject({ statusCode: 401, type: "StripeAuthenticationError" });
    expect((err as Error).message).toMatch(/^Invalid API Key provided: sk_test_/);
  });

  it("an Idempotency-Key returns the same object, and refuses other parameters", async () => {
    const key = `test-${Date.now()}-${Math.random()}`;
    const params = {
      mode: "payment" as const,
      line_items: [{ quantity: 2, price_data: { currency: "usd", unit_amount: 4_950, product_data: { name: "Setup and fret dress" } } }],
      success_url: "http://localhost:3999/ok",
    };
    const first = await stripe.checkout.sessions.create(params, { idempotencyKey: key });
    const second = await stripe.checkout.sessions.create(params, { idempotencyKey: key });
    expect(second.id).toBe(first.id);
    expect(second.lastResponse.headers["idempotent-replayed"]).toBe("true");
    const other = await stripe.checkout.sessions.create({ ...params, success_url: "http://localhost:3999/other" }, { idempotencyKey: key }).catch((e: unknown) => e);
    expect(other).toBeInstanceOf(Stripe.errors.StripeIdempotencyError);
    // Without a key each create is new.
    expect((await stripe.checkout.sessions.create(params)).id).not.toBe(first.id);
  });
});

describe("Stripe fake outages and restarts", () => {
  let rig: StripeRig;
  beforeAll(async () => {
    rig = await startStripeRig();
  });
  afterAll(() => rig.close());

  it("refusing connections: the SDK (with the app's one retry) raises StripeConnectionError; afterwards it works", async () => {
    const appLike = createStripeClient(stripeSettings({ ...process.env, STRIPE_SECRET_KEY: rig.fake.ctx.opts.secretKey, STRIPE_API_PORT: String(rig.fake.port), STRIPE_MAX_NETWORK_RETRIES: "1" }));
    // Long enough for the SDK's retry (0.5–1 s later) to be refused too.
    expect((await rig.admin("/admin/outage", { mode: "refuse", seconds: 3 })).json.mode).toBe("refuse");
    await pause(50);
    const err = await depositSession(appLike).catch((e: unknown) => e);
    expect(err).toBeInstanceOf(Stripe.errors.StripeConnectionError);
    for (let i = 0; i < 100 && !(await fetch(`${rig.fake.url}/health`).then((r) => r.ok, () => false)); i++) await pause(100);
    expect((await depositSession(appLike)).status).toBe("open");
  });

  it("answering 503: the SDK raises StripeAPIError, and nothing was created", async () => {
    await rig.admin("/admin/outage", { mode: "unavailable" });
    const before = Object.keys(rig.fake.ctx.state.checkout_sessions).length;
    const err = await depositSession(rig.stripe).catch((e: unknown) => e);
    expect(err).toBeInstanceOf(Stripe.errors.StripeAPIError);
    expect(err).toMatchObject({ statusCode: 503 });
    expect(Object.keys(rig.fake.ctx.state.checkout_sessions).length).toBe(before);
    await rig.admin("/admin/outage", { mode: "none" });
    expect((await depositSession(rig.stripe)).status).toBe("open");
  });

  it("keeps sessions and undelivered webhooks across a restart", async () => {
    const dir = mkdtempSync(join(tmpdir(), "stripe-fake-"));
    try {
      rig.hooks.received.length = 0;
      rig.hooks.failing = true;
      const first = await startStripeFake(testOptions({ dataDir: dir, webhookUrl: rig.hooks.url, retryBaseMs: 100 }));
      const client = createStripeClient(stripeSettings({ STRIPE_SECRET_KEY: first.ctx.opts.secretKey, STRIPE_WEBHOOK_SECRET: "whsec_x", STRIPE_API_PORT: String(first.port), STRIPE_MAX_NETWORK_RETRIES: "0" }));
      const s = await depositSession(client);
      await client.checkout.sessions.expire(s.id);
      await pause(150);
      const port = first.port;
      await first.close();
      rig.hooks.failing = false;
      const second = await startStripeFake(testOptions({ dataDir: dir, port, webhookUrl: rig.hooks.url, retryBaseMs: 100 }));
      try {
        expect((await client.checkout.sessions.retrieve(s.id)).status).toBe("expired");
        const [delivered] = await rig.hooks.waitFor(1, 5000);
        expect(client.webhooks.constructEvent(delivered!.raw, delivered!.signature, first.ctx.opts.webhookSecret).type).toBe("checkout.session.expired");
      } finally {
        await second.close();
      }
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  });
});
