// The Stripe fake's webhook delivery and its test controls: duplicate, delay, hold and release in
// another order, drop, retries with backoff while the app is down, redelivery.
import type Stripe from "stripe";
import { beforeEach, describe, expect, it } from "vitest";
import type { Delivery } from "@/fakes/stripe/types";
import { pause } from "./helpers/webhook-listener";
import { CARD_OK, depositSession, payOnHostedPage, startStripeRig, useStripeRig, type StripeRig } from "./helpers/stripe-setup";

const rigs = useStripeRig({ retryBaseMs: 50, retryMaxMs: 200, maxAttempts: 20 });
let rig: StripeRig;
beforeEach(() => {
  rig = rigs.get();
});

const types = (events: Stripe.Event[]) => events.map((e) => e.type);

async function paidSession() {
  const s = await depositSession(rig.stripe);
  expect((await payOnHostedPage(s.url!, CARD_OK)).status).toBe(303);
  return s;
}

/** Polls until `check` holds (5 s at most). */
async function until(check: () => Promise<boolean>): Promise<void> {
  const deadline = Date.now() + 5000;
  while (!(await check())) {
    if (Date.now() > deadline) throw new Error("condition not reached in 5 s");
    await pause(20);
  }
}

async function deliveries(query = ""): Promise<Delivery[]> {
  return (await rig.admin(`/admin/webhooks/deliveries${query}`)).json.data;
}

describe("Stripe fake: webhook controls", () => {
  it("duplicate: the same event (same id) arrives the given number of times", async () => {
    expect((await rig.admin("/admin/webhooks/rules", { action: "duplicate", event_type: "checkout.session.completed", copies: 3 })).status).toBe(200);
    await paidSession();
    const events = rig.events(await rig.hooks.waitFor(6));
    const completed = events.filter((e) => e.type === "checkout.session.completed");
    expect(completed).toHaveLength(3);
    expect(new Set(completed.map((e) => e.id)).size).toBe(1);
    // The rule is used up: the next payment's event arrives once.
    rig.hooks.received.length = 0;
    await paidSession();
    expect(types(rig.events(await rig.hooks.waitFor(4))).filter((t) => t === "checkout.session.completed")).toHaveLength(1);
  });

  it("delay: a delayed event arrives after the events sent later", async () => {
    await rig.admin("/admin/webhooks/rules", { action: "delay", event_type: "payment_intent.succeeded", delay_ms: 1000 });
    await paidSession();
    const events = rig.events(await rig.hooks.waitFor(4));
    expect(types(events)).toEqual(["payment_intent.created", "charge.succeeded", "checkout.session.completed", "payment_intent.succeeded"]);
    const [d] = await deliveries("?event_type=payment_intent.succeeded");
    expect(d!.note).toMatch(/^delay/);
  });

  it("hold and release: held events are sent in reverse (or any chosen) order", async () => {
    await rig.admin("/admin/webhooks/rules", { action: "hold", count: 4 });
    await paidSession();
    await pause(150);
    expect(rig.hooks.received).toHaveLength(0);
    expect((await deliveries("?status=held")).length).toBe(4);
    await rig.admin("/admin/webhooks/release", { order: "reverse" });
    const events = rig.events(await rig.hooks.waitFor(4));
    expect(types(events)).toEqual(["checkout.session.completed", "payment_intent.succeeded", "charge.succeeded", "payment_intent.created"]);
  });

  it("drop: a dropped event never arrives, is recorded as dropped, and can be redelivered", async () => {
    await rig.admin("/admin/webhooks/rules", { action: "drop", event_type: "checkout.session.completed" });
    await paidSession();
    await rig.hooks.waitFor(3);
    await pause(150);
    expect(types(rig.events())).not.toContain("checkout.session.completed");
    const [dropped] = await deliveries("?event_type=checkout.session.completed");
    expect(dropped).toMatchObject({ status: "dropped", attempts: [] });
    // The same event is still in the API's event list, as a reconciliation job would see it.
    const listed = await rig.stripe.events.list({ type: "checkout.session.completed" });
    expect(listed.data.map((e) => e.id)).toEqual([dropped!.event_id]);
    await rig.admin("/admin/webhooks/redeliver", { event_id: dropped!.event_id });
    const all = rig.events(await rig.hooks.waitFor(4));
    expect(all.at(-1)!.id).toBe(dropped!.event_id);
  });

  it("retries with backoff while the app answers 500 or is not listening, then delivers", async () => {
    const attempts = async () => (await deliveries())[0]?.attempts ?? [];
    rig.hooks.failing = true;
    const s = await depositSession(rig.stripe);
    await rig.stripe.checkout.sessions.expire(s.id);
    await until(async () => (await attempts()).length >= 3);
    await rig.hooks.stop(); // now connections are refused
    rig.hooks.failing = false;
    await until(async () => (await attempts()).some((a) => a.error === "ECONNREFUSED"));
    await rig.hooks.restart();
    const [e] = rig.events(await rig.hooks.waitFor(1, 5000));
    expect(e!.type).toBe("checkout.session.expired");
    const [d] = await deliveries();
    expect(d!.status).toBe("delivered");
    expect(d!.attempts.slice(0, 3).map((a) => a.error)).toEqual(["HTTP 500", "HTTP 500", "HTTP 500"]);
    expect(d!.attempts.some((a) => a.status === null && a.error === "ECONNREFUSED")).toBe(true);
    expect(d!.attempts.at(-1)).toMatchObject({ status: 200, error: null });
    // The wait doubles: at least 50 ms after the first failure, 100 ms after the second.
    const times = d!.attempts.map((a) => Date.parse(a.at));
    expect(times[2]! - times[1]!).toBeGreaterThanOrEqual(100);
  });

  it("gives up after maxAttempts and marks the delivery failed; flush sends waiting retries at once", async () => {
    const quick = await startStripeRig({ retryBaseMs: 10_000, retryMaxMs: 10_000, maxAttempts: 2 });
    try {
      quick.hooks.failing = true;
      const s = await depositSession(quick.stripe);
      await quick.stripe.checkout.sessions.expire(s.id);
      await pause(150);
      let [d] = (await quick.admin("/admin/webhooks/deliveries")).json.data as Delivery[];
      expect(d).toMatchObject({ status: "pending" });
      expect(d!.attempts).toHaveLength(1);
      await quick.admin("/admin/webhooks/flush", {});
      await pause(150);
      [d] = (await quick.admin("/admin/webhooks/deliveries")).json.data as Delivery[];
      expect(d).toMatchObject({ status: "failed" });
      expect(d!.attempts).toHaveLength(2);
    } finally {
      await quick.close();
    }
  });

  it("signs every delivery with a fresh timestamp, and a wrong secret fails verification", async () => {
    await paidSession();
    const [first] = await rig.hooks.waitFor(1);
    expect(first!.signature).toMatch(/^t=\d+,v1=[0-9a-f]{64}/);
    const t = Number(/t=(\d+)/.exec(first!.signature)![1]);
    expect(Math.abs(t - Date.now() / 1000)).toBeLessThan(5);
    expect(() => rig.stripe.webhooks.constructEvent(first!.raw, first!.signature, "whsec_not_the_secret")).toThrow(/signature/i);
    expect(() => rig.stripe.webhooks.constructEvent(first!.raw.replace("payment_intent", "payment_intenx"), first!.signature, rig.secret)).toThrow();
  });
});
