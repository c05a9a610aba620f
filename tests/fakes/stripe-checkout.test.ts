// The Stripe fake with the real SDK: checkout sessions created by the app's client, paid or
// declined on the hosted page as a browser posts it, webhooks verified by stripe.webhooks.constructEvent.
import Stripe from "stripe";
import { beforeEach, describe, expect, it } from "vitest";
import { processingFee } from "@/fakes/stripe/fees";
import { pause } from "./helpers/webhook-listener";
import { CARD_DECLINED, CARD_NO_FUNDS, CARD_OK, depositSession, payOnHostedPage, useStripeRig, type StripeRig } from "./helpers/stripe-setup";

const rigs = useStripeRig();
let rig: StripeRig;
beforeEach(() => {
  rig = rigs.get();
});

const types = (events: Stripe.Event[]) => events.map((e) => e.type);

describe("Stripe fake: checkout", () => {
  it("creates a session with the SDK and shows it on the hosted page", async () => {
    const s = await depositSession(rig.stripe);
    expect(s).toMatchObject({ object: "checkout.session", mode: "payment", status: "open", payment_status: "unpaid", currency: "eur", amount_total: 125_000 });
    expect(s.id).toMatch(/^cs_test_/);
    expect(s.metadata).toEqual({ invoice_id: "41", commission_id: "12", workshop: "fernhollow", kind: "deposit" });
    expect(s.client_reference_id).toBe("invoice_41");
    expect(s.url).toBe(`${rig.fake.url}/pay/${s.id}`);
    const page = await fetch(s.url!);
    expect(page.status).toBe(200);
    const html = await page.text();
    expect(html).toContain("€1,250.00");
    expect(html).toContain("Deposit: commission FH-0012");

    const again = await rig.stripe.checkout.sessions.retrieve(s.id, { expand: ["line_items"] });
    expect(again.line_items?.data[0]).toMatchObject({ quantity: 1, amount_total: 125_000, description: "Deposit: commission FH-0012" });
    // The fake's overview page lists it.
    expect(await (await fetch(`${rig.fake.url}/`)).text()).toContain(s.id.slice(0, 22));
  });

  it("pays with a succeeding card: redirect to success_url, signed webhooks, payment intent, charge and fee", async () => {
    const s = await depositSession(rig.stripe);
    const paid = await payOnHostedPage(s.url!, CARD_OK);
    expect(paid.status).toBe(303);
    expect(paid.location).toBe(`http://localhost:3999/fernhollow/commissions/FH-0012?paid=${s.id}`);

    const events = rig.events(await rig.hooks.waitFor(4));
    expect(types(events)).toEqual(["payment_intent.created", "charge.succeeded", "payment_intent.succeeded", "checkout.session.completed"]);
    const completed = events[3]!.data.object as Stripe.Checkout.Session;
    expect(completed).toMatchObject({ id: s.id, status: "complete", payment_status: "paid", metadata: s.metadata, client_reference_id: "invoice_41" });
    expect(completed.customer_details?.email).toBe("nadia.fensome@example.com");

    const pi = await rig.stripe.paymentIntents.retrieve(String(completed.payment_intent), { expand: ["latest_charge.balance_transaction"] });
    expect(pi).toMatchObject({ status: "succeeded", amount: 125_000, amount_received: 125_000, currency: "eur", metadata: { invoice_id: "41", commission_id: "12" } });
    const charge = pi.latest_charge as Stripe.Charge;
    expect(charge.payment_method_details?.card?.last4).toBe("4242");
    const txn = charge.balance_transaction as Stripe.BalanceTransaction;
    // The fake's documented fee: 1.45 % rounded, plus 25 cents for EUR (fakes/stripe/fees.ts).
    const fee = Math.round(125_000 * 0.0145) + 25;
    expect(processingFee(125_000, "eur")).toBe(fee);
    expect(txn).toMatchObject({ type: "charge", amount: 125_000, fee, net: 125_000 - fee, source: charge.id, currency: "eur" });

    // Paying twice (double submit) does not charge twice.
    const twice = await payOnHostedPage(s.url!, CARD_OK).catch(() => null);
    expect(twice).toBeNull(); // the page is gone once paid: no form to submit
    const again = await fetch(s.url!, { method: "POST", body: new URLSearchParams({ card_number: CARD_OK }), redirect: "manual" });
    expect(again.status).toBe(303);
    expect((await rig.stripe.balanceTransactions.list({ type: "charge" })).data).toHaveLength(1);
  });

  it("a declined card sends payment_intent.payment_failed, makes no balance transaction, and the session stays open", async () => {
    const s = await depositSession(rig.stripe);
    const declined = await payOnHostedPage(s.url!, CARD_DECLINED);
    expect(declined.status).toBe(402);
    expect(declined.html).toContain("Your card was declined.");
    const events = rig.events(await rig.hooks.waitFor(3));
    expect(types(events)).toEqual(["payment_intent.created", "charge.failed", "payment_intent.payment_failed"]);
    const failed = events[2]!.data.object as Stripe.PaymentIntent;
    expect(failed.status).toBe("requires_payment_method");
    expect(failed.last_payment_error).toMatchObject({ type: "card_error", code: "card_declined", decline_code: "generic_decline" });
    expect((await rig.stripe.balanceTransactions.list()).data).toEqual([]);
    expect((await rig.stripe.checkout.sessions.retrieve(s.id)).status).toBe("open");

    // The payer tries again with a good card: same payment intent, now succeeded.
    expect((await payOnHostedPage(s.url!, CARD_OK)).status).toBe(303);
    const all = rig.events(await rig.hooks.waitFor(6));
    const succeeded = all.find((e) => e.type === "payment_intent.succeeded")!.data.object as Stripe.PaymentIntent;
    expect(succeeded.id).toBe(failed.id);
  });

  it("insufficient funds is a decline with its own decline_code", async () => {
    const s = await depositSession(rig.stripe);
    const res = await payOnHostedPage(s.url!, CARD_NO_FUNDS);
    expect(res.status).toBe(402);
    expect(res.html).toContain("insufficient funds");
    const events = rig.events(await rig.hooks.waitFor(3));
    expect((events[2]!.data.object as Stripe.PaymentIntent).last_payment_error?.decline_code).toBe("insufficient_funds");
  });

  it("a mistyped card number is a form error: nothing is created and nothing is sent", async () => {
    const s = await depositSession(rig.stripe);
    const res = await payOnHostedPage(s.url!, "4242 4242 4242 4241");
    expect(res.status).toBe(422);
    expect(res.html).toContain("That card number is not valid.");
    await pause(150);
    expect(rig.hooks.received).toHaveLength(0);
    expect((await rig.stripe.checkout.sessions.retrieve(s.id)).payment_intent).toBeNull();
  });

  it("expiring a session sends checkout.session.expired and closes the page", async () => {
    const s = await depositSession(rig.stripe);
    const expired = await rig.stripe.checkout.sessions.expire(s.id);
    expect(expired.status).toBe("expired");
    const [e] = rig.events(await rig.hooks.waitFor(1));
    expect(e!.type).toBe("checkout.session.expired");
    expect(await (await fetch(s.url!)).text()).toContain("This checkout has expired");
    const late = await fetch(s.url!, { method: "POST", body: new URLSearchParams({ card_number: CARD_OK }), redirect: "manual" });
    expect(late.status).toBe(410);
    await expect(rig.stripe.checkout.sessions.expire(s.id)).rejects.toBeInstanceOf(Stripe.errors.StripeInvalidRequestError);
  });

  it("a session whose expires_at passes expires by itself", async () => {
    // A few seconds ahead: the fake refuses a time already past when the request arrives, and a
    // busy machine can take more than a second to deliver it.
    const s = await depositSession(rig.stripe, 10_000, { expires_at: Math.floor(Date.now() / 1000) + 3 });
    const [e] = rig.events(await rig.hooks.waitFor(1, 15_000));
    expect(e!.type).toBe("checkout.session.expired");
    expect((e!.data.object as Stripe.Checkout.Session).id).toBe(s.id);
  });

  it("rejects bad create parameters the way the API does, naming the parameter", async () => {
    const err = await rig.stripe.checkout.sessions
      .create({ mode: "payment", success_url: "http://localhost:3999/ok" } as Stripe.Checkout.SessionCreateParams)
      .catch((e: unknown) => e);
    expect(err).toBeInstanceOf(Stripe.errors.StripeInvalidRequestError);
    expect(err).toMatchObject({ statusCode: 400, param: "line_items", code: "parameter_missing" });
    const bad = await depositSession(rig.stripe, -5).catch((e: unknown) => e);
    expect(bad).toMatchObject({ param: "line_items[0][price_data][unit_amount]" });
    const missing = await rig.stripe.checkout.sessions.retrieve("cs_test_nope").catch((e: unknown) => e);
    expect(missing).toMatchObject({ statusCode: 404, code: "resource_missing" });
  });
});
