// Card payments end to end against the built app, the real MariaDB and the payments fake through
// the real stripe SDK: checkout (one open session per invoice), the signed webhook (bad signatures,
// duplicates, out-of-order delivery, the processor down), the deposit unlocking the build, refunds
// recorded on their events. The tests in this file run in order because they steer the shared
// fake (delivery rules, outages); other payment tests make no processor calls.
//
// Fee figures are the payments fake's published schedule (README, "Payments fake": 1.45 % of the
// amount, rounded, plus 25 minor units for EUR) — our own schedule, no outside source.
import Stripe from "stripe";
import { afterAll, afterEach, beforeAll, describe, expect, it } from "vitest";
import { DEFAULT_BUILD_STAGES } from "@/lib/workflow/stages";
import { closeTestDb, testDb } from "../setup/test-db";
import { base } from "./commission-helpers";
import { createWorkshopWithMembers, uid, type TestWorkshop } from "./fixtures";
import { waitForEmail } from "./inbox";
import {
  CARD_DECLINED,
  auditActions,
  checkout,
  commissionAwaitingDeposit,
  commissionStage,
  deliveriesOf,
  eventsAbout,
  payAtProcessor,
  paymentRows,
  paymentsOf,
  processor,
  settled,
  stripeAdmin,
  stripeFakeUrl,
  waitFor,
} from "./payment-helpers";
import { anonymous, signIn, type HttpSession } from "./session";

let ws: TestWorkshop;
let owner: HttpSession, builder: HttpSession, bookkeeper: HttpSession, client: HttpSession;
const FIRST_BUILD_STAGE = DEFAULT_BUILD_STAGES[0]!.key;
const WEBHOOK_SECRET = () => process.env.STRIPE_WEBHOOK_SECRET!;

beforeAll(async () => {
  ws = await createWorkshopWithMembers();
  [owner, builder, bookkeeper, client] = await Promise.all([signIn(ws.owner), signIn(ws.builder), signIn(ws.bookkeeper), signIn(ws.client)]);
});
afterEach(async () => {
  await stripeAdmin("/admin/outage", { mode: "none" });
  await fetch(stripeFakeUrl("/admin/webhooks/rules"), { method: "DELETE" });
});
afterAll(closeTestDb);

const people = () => ({ owner, builder, client });

/** E-mails queued for this commission's client, by template (receipts, stage news). */
async function templatesAbout(number: string): Promise<string[]> {
  const rows = await testDb()("email_outbox").where({ to_address: ws.client.email }).orderBy("id").select("template", "props");
  return rows.filter((r: { props: unknown }) => (typeof r.props === "string" ? JSON.parse(r.props) : r.props).commissionNumber === number).map((r: { template: string }) => r.template);
}

/** Opens the deposit checkout as the client and pays it at the processor; waits for nothing. */
async function payDeposit(commissionId: number, card?: string) {
  const co = await checkout(client, ws, commissionId);
  expect(co.status, JSON.stringify(co.error)).toBe(201);
  const paid = await payAtProcessor(co.checkout.sessionId, card);
  expect(paid.status).toBe(200);
  const pi = String(paid.json.session.payment_intent);
  return { sessionId: co.checkout.sessionId, paymentId: co.checkout.paymentId, pi };
}

/** Pays the deposit with only checkout.session.completed able to record it, and holds that event back. */
async function payWithCompletionHeld(commissionId: number): Promise<Stripe.Event> {
  await stripeAdmin("/admin/webhooks/rules", { action: "drop", event_type: "payment_intent.succeeded" });
  await stripeAdmin("/admin/webhooks/rules", { action: "hold", event_type: "checkout.session.completed" });
  const { sessionId } = await payDeposit(commissionId);
  return (await eventsAbout([sessionId])).find((e) => e.type === "checkout.session.completed")!;
}

async function allEventIds(sessionId: string, pi: string) {
  return (await eventsAbout([sessionId, pi])).map((e) => e.id);
}

function postWebhook(payload: string, signature?: string) {
  return anonymous().fetch("/api/webhooks/stripe", {
    method: "POST",
    body: payload,
    headers: { "content-type": "application/json", ...(signature ? { "stripe-signature": signature } : {}) },
  });
}

describe("card checkout", () => {
  it("opens one session per invoice however often the client clicks, and a paid deposit starts the build with one receipt", async () => {
    const c = await commissionAwaitingDeposit(people(), ws);
    const first = await checkout(client, ws, c.id);
    expect(first.status).toBe(201);
    expect(first.checkout.url).toBe(stripeFakeUrl(`/pay/${first.checkout.sessionId}`));
    const again = await checkout(client, ws, c.id);
    expect(again.status).toBe(200);
    expect(again.checkout).toEqual({ ...first.checkout, reused: true });
    const both = await Promise.all([checkout(client, ws, c.id), checkout(client, ws, c.id)]);
    expect(both.map((b) => b.checkout.sessionId)).toEqual([first.checkout.sessionId, first.checkout.sessionId]);
    expect((await paymentRows(c.id)).map((r) => [r.kind, r.status, r.amount_minor])).toEqual([["deposit", "pending", 90_000]]);

    // What the processor was asked for: the outstanding deposit, back to the payments page.
    const session = await processor().checkout.sessions.retrieve(first.checkout.sessionId);
    expect(session.amount_total).toBe(90_000);
    expect(session.currency).toBe("eur");
    expect(session.success_url).toContain(`/${ws.slug}/commissions/${c.id}/payments?checkout=success&session_id={CHECKOUT_SESSION_ID}`);
    expect(session.cancel_url).toContain(`/${ws.slug}/commissions/${c.id}/payments?checkout=cancelled`);
    expect(session.customer_email).toBe(ws.client.email);

    await payAtProcessor(first.checkout.sessionId);
    const paid = await waitFor("the payment to be confirmed", async () => (await paymentRows(c.id)).find((r) => r.status === "paid"));
    expect(paid.fee_minor).toBe(1_305 + 25); // 1.45 % of 900.00 = 13.05, plus 0.25
    expect(paid.net_minor).toBe(90_000 - 1_330);
    const after = await processor().checkout.sessions.retrieve(first.checkout.sessionId, { expand: ["payment_intent.latest_charge.balance_transaction"] });
    const pi = after.payment_intent as Stripe.PaymentIntent;
    const charge = pi.latest_charge as Stripe.Charge;
    const txn = charge.balance_transaction as Stripe.BalanceTransaction;
    expect([paid.processor_payment_id, paid.processor_charge_id, paid.processor_balance_txn_id]).toEqual([pi.id, charge.id, txn.id]);
    expect([paid.fee_minor, paid.net_minor]).toEqual([txn.fee, txn.net]);

    expect(await commissionStage(c.id)).toBe(FIRST_BUILD_STAGE);
    const history = await testDb()("stage_history").where({ commission_id: c.id, from_stage: "deposit" }).select("to_stage", "note");
    expect(history).toEqual([{ to_stage: FIRST_BUILD_STAGE, note: "Deposit received." }]);
    await settled(await allEventIds(first.checkout.sessionId, pi.id));
    expect((await templatesAbout(c.number)).filter((t) => t === "payment-receipt" || t === "build-started").sort()).toEqual(["build-started", "payment-receipt"]);
    const receipt = await waitForEmail(ws.client.email, { subject: new RegExp(`^Receipt: deposit of €900\\.00 for ${c.number} `) });
    expect(receipt.text).toContain(charge.id);
    expect(await auditActions(ws.id, { type: "payment", ids: [paid.id] })).toEqual(["payment.checkout_started", "payment.received"]);

    // The client now sees the deposit paid and the balance due; the processor's ids are the workshop's.
    const view = await paymentsOf(client, ws, c.id);
    expect(view.invoices.map((i) => [i.kind, i.status, i.payable])).toEqual([
      ["deposit", "paid", false],
      ["balance", "due", true],
    ]);
    expect(view.payments[0]!.processor).toBeNull();
    expect((await paymentsOf(bookkeeper, ws, c.id)).payments[0]!.processor).toMatchObject({ chargeId: charge.id, feeMinor: 1_330 });
    // Paying the deposit again is refused; the balance opens its own session.
    expect((await checkout(client, ws, c.id, "deposit")).status).toBe(409);
    const balance = await checkout(client, ws, c.id, "balance");
    expect(balance.status).toBe(201);
    expect((await processor().checkout.sessions.retrieve(balance.checkout.sessionId)).amount_total).toBe(210_000);
  });

  it("keeps the payment pending with the decline shown, until a good card pays the same session", async () => {
    const c = await commissionAwaitingDeposit(people(), ws);
    const { sessionId, pi } = await payDeposit(c.id, CARD_DECLINED);
    const declined = await waitFor("the decline to be recorded", async () => (await paymentRows(c.id)).find((r) => r.failure_message));
    expect(declined).toMatchObject({ status: "pending", failure_message: "Your card was declined." });
    expect((await paymentsOf(client, ws, c.id)).payments[0]!.failureMessage).toBe("Your card was declined.");
    expect(await commissionStage(c.id)).toBe("deposit");

    await payAtProcessor(sessionId);
    const paid = await waitFor("the payment", async () => (await paymentRows(c.id)).find((r) => r.status === "paid"));
    expect(paid).toMatchObject({ id: declined.id, failure_message: null, processor_payment_id: pi });
    expect(await commissionStage(c.id)).toBe(FIRST_BUILD_STAGE);
    await settled(await allEventIds(sessionId, pi));
  });

  it("hands out a new session when the open one expired", async () => {
    const c = await commissionAwaitingDeposit(people(), ws);
    const first = await checkout(client, ws, c.id);
    await processor().checkout.sessions.expire(first.checkout.sessionId);
    const second = await checkout(client, ws, c.id);
    expect(second.status).toBe(201);
    expect(second.checkout.sessionId).not.toBe(first.checkout.sessionId);
    const rows = await waitFor("the expired attempt to be closed", async () => {
      const r = await paymentRows(c.id);
      return r[0]?.status === "cancelled" ? r : undefined;
    });
    expect(rows.map((r) => r.status)).toEqual(["cancelled", "pending"]);
  });
});

describe("webhook", () => {
  it("answers 400 to a missing, wrong, stale or tampered signature and changes nothing", async () => {
    const c = await commissionAwaitingDeposit(people(), ws);
    const co = await checkout(client, ws, c.id);
    const eventId = `evt_forged_${uid()}`;
    const payload = JSON.stringify({
      id: eventId,
      object: "event",
      type: "checkout.session.completed",
      created: Math.floor(Date.now() / 1000),
      livemode: false,
      data: { object: { id: co.checkout.sessionId, object: "checkout.session", status: "complete", payment_status: "paid" } },
    });
    const sign = (body: string, secret = WEBHOOK_SECRET(), timestamp?: number) => Stripe.webhooks.generateTestHeaderString({ payload: body, secret, timestamp });
    const attempts = [
      await postWebhook(payload),
      await postWebhook(payload, sign(payload, "whsec_not_the_right_one")),
      await postWebhook(payload, sign(payload, WEBHOOK_SECRET(), Math.floor(Date.now() / 1000) - 3600)),
      await postWebhook(payload.replace('"paid"', '"paid" '), sign(payload)),
      await postWebhook(payload, "t=1,v1=deadbeef"),
    ];
    for (const res of attempts) {
      expect(res.status).toBe(400);
      expect(((await res.json()) as { error: { code: string } }).error.code).toBe("bad_request");
    }
    expect(await testDb()("processor_events").where({ event_id: eventId }).first()).toBeUndefined();
    expect((await paymentRows(c.id)).map((r) => r.status)).toEqual(["pending"]);
    expect(await commissionStage(c.id)).toBe("deposit");
    expect(await templatesAbout(c.number)).not.toContain("payment-receipt");

    // Even correctly signed, an event only makes the app look: the processor says the session is open.
    const ok = await postWebhook(payload, sign(payload));
    expect(ok.status).toBe(200);
    expect((await paymentRows(c.id)).map((r) => r.status)).toEqual(["pending"]);
    expect(await commissionStage(c.id)).toBe("deposit");
  });

  it("makes one payment of an event delivered three times", async () => {
    const c = await commissionAwaitingDeposit(people(), ws);
    // Only checkout.session.completed may record the payment here, and it arrives three times.
    await stripeAdmin("/admin/webhooks/rules", { action: "drop", event_type: "payment_intent.succeeded" });
    await stripeAdmin("/admin/webhooks/rules", { action: "duplicate", event_type: "checkout.session.completed", copies: 3 });
    const { sessionId, pi } = await payDeposit(c.id);
    const ids = await allEventIds(sessionId, pi);
    await settled(ids);
    const completed = (await eventsAbout([sessionId])).find((e) => e.type === "checkout.session.completed")!;
    const deliveries = await deliveriesOf([completed.id]);
    expect(deliveries.map((d) => [d.status, d.attempts.at(-1)?.status])).toEqual([
      ["delivered", 200],
      ["delivered", 200],
      ["delivered", 200],
    ]);
    expect(await testDb()("processor_events").where({ event_id: completed.id }).count({ n: "*" })).toEqual([{ n: 1 }]);
    expect((await paymentRows(c.id)).map((r) => [r.kind, r.status, r.amount_minor])).toEqual([["deposit", "paid", 90_000]]);
    expect((await templatesAbout(c.number)).filter((t) => t === "payment-receipt")).toHaveLength(1);
    expect(await testDb()("stage_history").where({ commission_id: c.id, from_stage: "deposit" }).count({ n: "*" })).toEqual([{ n: 1 }]);
  });

  it("applies an event once when the same delivery arrives three times at once", async () => {
    const c = await commissionAwaitingDeposit(people(), ws);
    const event = await payWithCompletionHeld(c.id);
    const payload = JSON.stringify(await processor().events.retrieve(event.id));
    const signature = Stripe.webhooks.generateTestHeaderString({ payload, secret: WEBHOOK_SECRET() });
    const answers = await Promise.all([1, 2, 3].map(() => postWebhook(payload, signature)));
    const outcomes = await Promise.all(answers.map(async (r) => ((await r.json()) as { outcome: string }).outcome));
    expect(answers.map((r) => r.status)).toEqual([200, 200, 200]);
    expect(outcomes.sort()).toEqual(["applied", "duplicate", "duplicate"]);
    // The held delivery comes later still and changes nothing.
    await stripeAdmin("/admin/webhooks/release", {});
    await settled([event.id]);
    expect((await paymentRows(c.id)).map((r) => r.status)).toEqual(["paid"]);
    expect((await templatesAbout(c.number)).filter((t) => t === "payment-receipt")).toHaveLength(1);
  });

  it("ends a refund delivered before the payment's completion in the same state as in order", async () => {
    /** Pays 900.00, refunds 300.00 at the processor itself; `reverse` delivers every event newest first. */
    async function scenario(reverse: boolean) {
      const c = await commissionAwaitingDeposit(people(), ws);
      if (reverse) {
        for (const [type, count] of [["payment_intent.*", 2], ["charge.*", 2], ["checkout.session.*", 1], ["refund.*", 1]] as const) {
          await stripeAdmin("/admin/webhooks/rules", { action: "hold", event_type: type, count });
        }
      }
      const { sessionId, pi } = await payDeposit(c.id);
      await processor().refunds.create({ payment_intent: pi, amount: 30_000 });
      const ids = await allEventIds(sessionId, pi);
      if (reverse) {
        expect((await paymentRows(c.id)).map((r) => r.status)).toEqual(["pending"]);
        await stripeAdmin("/admin/webhooks/release", { order: "reverse" });
      }
      await settled(ids);
      const rows = await paymentRows(c.id);
      const view = await paymentsOf(owner, ws, c.id);
      const applied = (await testDb()("processor_events").whereIn("event_id", ids).where({ outcome: "applied" }).orderBy("received_at").pluck("type")) as string[];
      return {
        applied,
        state: {
          stage: await commissionStage(c.id),
          rows: rows.map((r) => ({ kind: r.kind, status: r.status, amount: r.amount_minor, fee: r.fee_minor, net: r.net_minor, refundOf: r.refund_of_payment_id === rows[0]!.id })),
          invoices: view.invoices.map((i) => [i.kind, i.status, i.paidMinor, i.outstandingMinor]),
          totals: view.totals,
          emails: (await templatesAbout(c.number)).filter((t) => t === "payment-receipt" || t === "build-started"),
        },
      };
    }
    const inOrder = await scenario(false);
    const outOfOrder = await scenario(true);
    // The refund's events were the first the app heard of this payment.
    expect(outOfOrder.applied[0]).toBe("charge.refunded");
    expect(inOrder.applied.indexOf("payment_intent.succeeded")).toBeLessThan(inOrder.applied.indexOf("charge.refunded"));
    expect(outOfOrder.state).toEqual(inOrder.state);
    expect(outOfOrder.state).toMatchObject({
      stage: FIRST_BUILD_STAGE,
      rows: [
        { kind: "deposit", status: "paid", amount: 90_000, fee: 1_330, net: 88_670, refundOf: false },
        { kind: "refund", status: "paid", amount: 30_000, net: -30_000, refundOf: true },
      ],
      invoices: [
        ["deposit", "part_paid", 60_000, 30_000],
        ["balance", "not_due", 0, 210_000],
      ],
      totals: { paidMinor: 60_000, refundedMinor: 30_000, refundPendingMinor: 0 },
    });
    expect(outOfOrder.state.emails.sort()).toEqual(["build-started", "payment-receipt"]);
  });

  it("answers 503 while it cannot read the processor, and applies the event when it is delivered again", async () => {
    const c = await commissionAwaitingDeposit(people(), ws);
    const event = await payWithCompletionHeld(c.id);
    await stripeAdmin("/admin/outage", { mode: "unavailable" });
    await stripeAdmin("/admin/webhooks/release", {});
    await waitFor("a refused delivery", async () => (await deliveriesOf([event.id]))[0]?.attempts.some((a) => a.status === 503));
    expect((await paymentRows(c.id)).map((r) => r.status)).toEqual(["pending"]);
    await stripeAdmin("/admin/outage", { mode: "none" });
    await stripeAdmin("/admin/webhooks/flush", {});
    await settled([event.id]);
    expect((await deliveriesOf([event.id]))[0]!.status).toBe("delivered");
    expect((await paymentRows(c.id)).map((r) => r.status)).toEqual(["paid"]);
    expect(await commissionStage(c.id)).toBe(FIRST_BUILD_STAGE);
  });
});

describe("processor down", () => {
  it("tells the client to try again and leaves no payment behind", async () => {
    const c = await commissionAwaitingDeposit(people(), ws);
    // "unavailable": the API answers 503; "refuse": connections are refused for a few seconds.
    for (const outage of [{ mode: "unavailable" }, { mode: "refuse", seconds: 3 }]) {
      await stripeAdmin("/admin/outage", outage);
      const r = await checkout(client, ws, c.id);
      expect(r.status, outage.mode).toBe(503);
      expect(r.error).toMatchObject({ code: "unavailable", retryAfterSeconds: 30 });
      expect(r.error!.message).toMatch(/not answering.*Nothing was charged and nothing was recorded; try again/);
      expect(r.retryAfter).toBe("30");
      if (outage.mode === "unavailable") await stripeAdmin("/admin/outage", { mode: "none" });
      else await waitFor("the fake to listen again", () => fetch(stripeFakeUrl("/health")).then((res) => res.ok, () => false), 15_000);
    }
    expect(await paymentRows(c.id)).toEqual([]);
    expect(await testDb()("audit_log").where({ workshop_id: ws.id, action: "payment.checkout_started" }).whereRaw("JSON_EXTRACT(data, '$.commissionId') = ?", [c.id]).first()).toBeUndefined();
    const retry = await checkout(client, ws, c.id);
    expect(retry.status).toBe(201);
    expect((await paymentRows(c.id)).map((r) => r.status)).toEqual(["pending"]);
  });

  it("refuses a refund with the same message and records none", async () => {
    const c = await commissionAwaitingDeposit(people(), ws);
    const { sessionId, pi, paymentId } = await payDeposit(c.id);
    await waitFor("the payment", async () => (await paymentRows(c.id)).find((r) => r.status === "paid"));
    await settled(await allEventIds(sessionId, pi));
    await stripeAdmin("/admin/outage", { mode: "unavailable" });
    const r = await owner.fetch(`${base(ws)}/${c.id}/refunds`, { method: "POST", json: { paymentId, amountMinor: 1_000 } });
    expect(r.status).toBe(503);
    await stripeAdmin("/admin/outage", { mode: "none" });
    expect((await paymentRows(c.id)).map((x) => x.kind)).toEqual(["deposit"]);
    expect((await processor().refunds.list({ payment_intent: pi })).data).toEqual([]);
  });
});

describe("refunds", () => {
  it("records a part refund and the rest when their events arrive, and a bounced refund gives the money back", async () => {
    const c = await commissionAwaitingDeposit(people(), ws);
    const { sessionId, pi, paymentId } = await payDeposit(c.id);
    await waitFor("the payment", async () => (await paymentRows(c.id)).find((r) => r.status === "paid"));
    await settled(await allEventIds(sessionId, pi));

    // Part: pending until the processor's events are let through.
    await stripeAdmin("/admin/webhooks/rules", { action: "hold", event_type: "refund.created" });
    await stripeAdmin("/admin/webhooks/rules", { action: "hold", event_type: "charge.refunded" });
    const part = await owner.json<{ refund: { id: number; status: string; amountMinor: number } }>(`${base(ws)}/${c.id}/refunds`, {
      method: "POST",
      json: { paymentId, amountMinor: 20_000, reason: "Cheaper pickups chosen" },
    });
    expect(part.status).toBe(202);
    expect(part.body.refund).toMatchObject({ status: "pending", amountMinor: 20_000 });
    let view = await paymentsOf(owner, ws, c.id);
    expect(view.totals).toMatchObject({ refundedMinor: 0, refundPendingMinor: 20_000, paidMinor: 90_000 });
    expect(view.payments.find((p) => p.id === paymentId)!.refundableMinor).toBe(70_000);
    const tooMuch = await owner.json<{ error: { issues: Array<{ path: string }> } }>(`${base(ws)}/${c.id}/refunds`, { method: "POST", json: { paymentId, amountMinor: 70_001 } });
    expect(tooMuch.status).toBe(422);
    expect(tooMuch.body.error.issues[0]!.path).toBe("amountMinor");

    await stripeAdmin("/admin/webhooks/release", { order: "as_held" });
    const partRow = await waitFor("the part refund", async () => (await paymentRows(c.id)).find((r) => r.id === part.body.refund.id && r.status === "paid"));
    const atProcessor = (await processor().refunds.list({ payment_intent: pi })).data;
    expect(atProcessor.map((r) => [r.id, r.amount, r.balance_transaction])).toEqual([[partRow.processor_refund_id, 20_000, partRow.processor_balance_txn_id]]);
    view = await paymentsOf(owner, ws, c.id);
    expect(view.totals).toMatchObject({ refundedMinor: 20_000, refundPendingMinor: 0, paidMinor: 70_000 });
    expect(await auditActions(ws.id, { type: "payment", ids: [partRow.id] })).toEqual(["refund.requested", "refund.recorded"]);

    // The bank returns that refund: the money counts as paid again.
    await stripeAdmin(`/admin/refunds/${partRow.processor_refund_id}/fail`, {});
    await waitFor("the bounced refund", async () => (await paymentRows(c.id)).find((r) => r.id === partRow.id && r.status === "failed"));
    view = await paymentsOf(owner, ws, c.id);
    expect(view.totals).toMatchObject({ refundedMinor: 0, paidMinor: 90_000 });

    // Full: the bookkeeper returns all that is left (no amount given).
    const full = await bookkeeper.json<{ refund: { id: number; amountMinor: number } }>(`${base(ws)}/${c.id}/refunds`, { method: "POST", json: { paymentId, reason: "Commission cancelled" } });
    expect(full.status).toBe(202);
    expect(full.body.refund.amountMinor).toBe(90_000);
    await waitFor("the full refund", async () => (await paymentRows(c.id)).find((r) => r.id === full.body.refund.id && r.status === "paid"));
    view = await paymentsOf(owner, ws, c.id);
    expect(view.totals).toMatchObject({ refundedMinor: 90_000, paidMinor: 0 });
    expect(view.invoices[0]).toMatchObject({ paidMinor: 0, outstandingMinor: 90_000 });
    const again = await owner.fetch(`${base(ws)}/${c.id}/refunds`, { method: "POST", json: { paymentId } });
    expect(again.status).toBe(409);
    const charge = await processor().charges.retrieve((await paymentRows(c.id))[0]!.processor_charge_id!);
    expect(charge.amount_refunded).toBe(90_000);
  });
});
