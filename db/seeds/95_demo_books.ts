import { createServer, type Server } from "node:http";
import type { AddressInfo } from "node:net";
import type { Knex } from "knex";
import type Stripe from "stripe";
import { db } from "../knex";
import { dbEnvironment } from "../config";
import { resolveMemberAccess } from "../../lib/auth/workshop-access";
import type { WorkshopScope } from "../../lib/auth/scope";
import { getCommissionPayments, openCardCheckout } from "../../lib/data/card-payments";
import { createCommission } from "../../lib/data/commissions";
import { recordOfflinePayment } from "../../lib/data/payments";
import { requestRefund } from "../../lib/data/refunds";
import { approveSpecVersion, createSpecVersion, submitSpecVersion } from "../../lib/data/spec-versions";
import { BOOKS_DEMO_COMMISSIONS, BOOKS_DEMO_CONVERSION, BOOKS_DEMO_REFUND_SHARE, BOOKS_DEMO_SHORTFALL_MINOR, BOOKS_DEMO_WORKSHOP, type BooksDemoCommission } from "../../lib/demo/books";
import { presetById } from "../../lib/lutherie/presets";
import { stripeRefundProcessor } from "../../lib/payments/refunds";
import { stripeCheckoutProcessor } from "../../lib/payments/stripe-checkout";
import { handleStripeEvent } from "../../lib/payments/stripe-events";
import { buildOptionsSchema } from "../../lib/schemas/build-options";
import { createStripeClient, stripeSettings, verifyStripeWebhook } from "../../lib/services/stripe";

// The books demo, made through the payments fake (lib/demo/books.ts says what happens to each
// commission). The demo's people do it with the app's own code: the owner opens each commission,
// the builder drafts and sends the spec, the client approves it, the bookkeeper records the deposit
// (the build starts), the client pays the balance at a Checkout Session made with the stripe SDK
// and paid on the fake (the same path as its hosted page). The fake's signed webhooks are received
// here — the fake is pointed at a listener of this process while the seed runs — and handled by the
// webhook's own code (signature check, then handleStripeEvent), because the app is not serving yet
// when `npm start` seeds. Then the fake's own controls make the processor differ from the ledger:
// a dropped confirmation, a changed amount and currency, a refund made at the processor alone, a
// refund returned by the bank whose notice is dropped. Everything is dated now, so the month to
// reconcile is the current one.
//
// It needs the payments fake running (the launcher seeds after starting the fakes); run by hand
// without it (`npm run db:seed` with the app stopped), it says so and leaves the books demo for the
// next `npm start`. A commission already there (by title) is skipped, so a second run adds nothing.

export interface BooksDemoRig {
  stripe: Stripe;
  /** The fake's base URL (for /admin/…). */
  fakeUrl: string;
  webhookSecret: string;
  log?: (message: string) => void;
}

interface Cast {
  slug: string;
  owner: number;
  builder: number;
  bookkeeper: number;
  clients: Map<string, number>;
}

async function admin<T = unknown>(rig: BooksDemoRig, path: string, body?: unknown): Promise<T> {
  const res = await fetch(`${rig.fakeUrl}${path}`, {
    method: body === undefined ? "GET" : "POST",
    headers: { "content-type": "application/json" },
    body: body === undefined ? undefined : JSON.stringify(body),
  });
  const json = (await res.json()) as T;
  if (!res.ok) throw new Error(`payments fake ${path} answered ${res.status}: ${JSON.stringify(json)}`);
  return json;
}

/** A listener that verifies each delivery's signature and hands the event to the webhook's handler. */
async function startWebhookReceiver(rig: BooksDemoRig): Promise<{ url: string; close: () => Promise<void> }> {
  const settings = stripeSettings({ ...process.env, STRIPE_WEBHOOK_SECRET: rig.webhookSecret, STRIPE_SECRET_KEY: process.env.STRIPE_SECRET_KEY || "sk_unused" });
  const server: Server = createServer((req, res) => {
    const chunks: Buffer[] = [];
    req.on("data", (c: Buffer) => chunks.push(c));
    req.on("end", () => {
      void (async () => {
        try {
          const event = verifyStripeWebhook(Buffer.concat(chunks), String(req.headers["stripe-signature"] ?? ""), settings);
          const outcome = await handleStripeEvent(event, rig.stripe);
          res.writeHead(200, { "content-type": "application/json" }).end(JSON.stringify({ outcome }));
        } catch (err) {
          rig.log?.(`webhook not applied (the fake will retry): ${err instanceof Error ? err.message : String(err)}`);
          res.writeHead(500).end();
        }
      })();
    });
  });
  await new Promise<void>((r) => server.listen(0, "127.0.0.1", () => r()));
  const { port } = server.address() as AddressInfo;
  return {
    url: `http://127.0.0.1:${port}/api/webhooks/stripe`,
    close: () =>
      new Promise<void>((r) => {
        server.closeAllConnections();
        server.close(() => r());
      }),
  };
}

/** Waits until the fake has no delivery waiting (each one handled or dropped). */
async function deliveriesSettled(rig: BooksDemoRig, timeoutMs = 60_000) {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const { data } = await admin<{ data: Array<{ status: string }> }>(rig, "/admin/webhooks/deliveries");
    if (!data.some((d) => d.status === "pending" || d.status === "held")) return;
    if (Date.now() > deadline) throw new Error("the payments fake's webhooks did not settle within a minute");
    await new Promise((r) => setTimeout(r, 150));
  }
}

async function scopeOf(cast: Cast, userId: number): Promise<WorkshopScope> {
  return (await resolveMemberAccess(userId, cast.slug)).scope;
}

async function balancePayment(owner: WorkshopScope, commissionId: number) {
  const { payments } = await getCommissionPayments(owner, commissionId);
  const paid = payments.find((p) => p.kind === "balance" && p.status === "paid");
  if (!paid?.processor?.balanceTransactionId) throw new Error(`the balance of commission ${commissionId} was not confirmed`);
  return paid;
}

/** One commission from opening to its balance paid by card, then its twist at the processor. */
async function playOut(rig: BooksDemoRig, cast: Cast, c: BooksDemoCommission): Promise<void> {
  const clientId = cast.clients.get(c.client);
  if (!clientId) throw new Error(`books demo: ${c.client} is not a client of ${cast.slug}`);
  const [owner, builder, bookkeeper, client] = await Promise.all([scopeOf(cast, cast.owner), scopeOf(cast, cast.builder), scopeOf(cast, cast.bookkeeper), scopeOf(cast, clientId)]);
  const opened = await createCommission(owner, { title: c.title, clientId, builderId: cast.builder, priceMinor: c.priceMinor, requestNotes: "" });
  const version = await createSpecVersion(builder, opened.id, { spec: structuredClone(presetById("six").spec), options: buildOptionsSchema.parse({ bodyWood: c.title.split(": ")[1] ?? "" }) });
  await submitSpecVersion(builder, opened.id, version.id, null);
  await approveSpecVersion(client, opened.id, version.id);
  await recordOfflinePayment(bookkeeper, opened.id, { kind: "deposit", amountMinor: opened.money!.depositMinor, reference: `Bank transfer ${opened.number}` });

  const checkout = await openCardCheckout(client, opened.id, "balance", stripeCheckoutProcessor(rig.stripe));
  if (c.twist === "lost-confirmation") {
    // The two events that confirm a payment are lost on the way: the app never hears of it.
    for (const type of ["payment_intent.succeeded", "checkout.session.completed"]) await admin(rig, "/admin/webhooks/rules", { action: "drop", event_type: type });
  }
  const paid = await admin<{ ok: boolean; session: { status: string } }>(rig, `/admin/checkout/sessions/${checkout.sessionId}/pay`, { card_number: "4242424242424242" }).catch((err: Error) => {
    throw new Error(`${err.message} — if the fake remembers an earlier demo (a database reset without it), stop everything and delete .data/fakes/stripe`);
  });
  if (!paid.ok) throw new Error(`the demo card payment for "${c.title}" was declined`);
  await deliveriesSettled(rig);
  if (c.twist === "lost-confirmation" || c.twist === "clean") return;

  const payment = await balancePayment(owner, opened.id);
  const txnId = payment.processor!.balanceTransactionId!;
  const refundMinor = Math.round(payment.amountMinor * BOOKS_DEMO_REFUND_SHARE);
  if (c.twist === "amount-changed") {
    await admin(rig, `/admin/balance-transactions/${txnId}`, { amount: payment.amountMinor - BOOKS_DEMO_SHORTFALL_MINOR });
  } else if (c.twist === "currency-changed") {
    const { rate, currency } = BOOKS_DEMO_CONVERSION;
    await admin(rig, `/admin/balance-transactions/${txnId}`, {
      currency,
      exchange_rate: rate,
      amount: Math.round(payment.amountMinor * rate),
      fee: Math.round((payment.processor!.feeMinor ?? 0) * rate),
    });
  } else if (c.twist === "refund-untold") {
    await admin(rig, "/admin/refunds", { payment_intent: payment.processor!.paymentIntentId, amount: refundMinor });
  } else if (c.twist === "refund-bounced") {
    const refund = await requestRefund(bookkeeper, opened.id, { paymentId: payment.id, amountMinor: refundMinor, reason: "Client changed the hardware" }, stripeRefundProcessor(rig.stripe));
    await deliveriesSettled(rig);
    for (const type of ["refund.updated", "refund.failed"]) await admin(rig, "/admin/webhooks/rules", { action: "drop", event_type: type });
    await admin(rig, `/admin/refunds/${refund.processor!.refundId}/fail`, { reason: "expired_or_canceled_card" });
    await deliveriesSettled(rig);
  }
}

async function castOf(knex: Knex, slug: string, emails: { owner: string; builder: string; bookkeeper: string }): Promise<Cast | null> {
  const ws = await knex("workshops").where({ slug }).first("id");
  if (!ws) return null;
  const members = (await knex("memberships as m").join("users as u", "u.id", "m.user_id").where("m.workshop_id", ws.id).select("u.id", "u.email", "m.role")) as Array<{ id: number; email: string; role: string }>;
  const idOf = (email: string) => members.find((m) => m.email === email)?.id;
  const owner = idOf(emails.owner);
  const builder = idOf(emails.builder);
  const bookkeeper = idOf(emails.bookkeeper);
  if (!owner || !builder || !bookkeeper) return null;
  return { slug, owner, builder, bookkeeper, clients: new Map(members.filter((m) => m.role === "client").map((m) => [m.email, m.id])) };
}

/**
 * Plays the books demo out in workshop `slug` (the demo's people by e-mail; tests pass their own
 * workshop, people and commissions). Returns how many commissions it made.
 */
export async function seedBooksDemo(
  knex: Knex,
  rig: BooksDemoRig,
  who: { slug: string; owner: string; builder: string; bookkeeper: string; commissions?: readonly BooksDemoCommission[] },
): Promise<number> {
  const cast = await castOf(knex, who.slug, who);
  if (!cast) return 0;
  const existing = new Set((await knex("commissions as c").join("workshops as w", "w.id", "c.workshop_id").where("w.slug", who.slug).pluck("c.title")) as string[]);
  const todo = (who.commissions ?? BOOKS_DEMO_COMMISSIONS).filter((c) => !existing.has(c.title));
  if (todo.length === 0) return 0;
  const receiver = await startWebhookReceiver(rig);
  await admin(rig, "/admin/webhooks/endpoint", { url: receiver.url });
  try {
    for (const c of todo) {
      await playOut(rig, cast, c);
      rig.log?.(`books demo: ${c.title} (${c.twist})`);
    }
    // Pay out what is available, so the month has payouts to break down.
    await admin(rig, "/admin/payouts/run", {});
    await deliveriesSettled(rig);
  } finally {
    await admin(rig, "/admin/webhooks/endpoint", { url: null }).catch(() => undefined);
    await receiver.close();
  }
  return todo.length;
}

export async function seed(knex: Knex): Promise<void> {
  // The test database is never seeded with processor data: tests run seedBooksDemo on their own fake.
  if (dbEnvironment() === "test") return;
  const port = process.env.FAKE_STRIPE_PORT ?? "3411";
  const fakeUrl = `http://127.0.0.1:${port}`;
  const up = await fetch(`${fakeUrl}/health`, { signal: AbortSignal.timeout(2000) }).then(
    (r) => r.ok,
    () => false,
  );
  if (!up) {
    console.log(`[seed] books demo skipped: the payments fake is not running on ${fakeUrl} (npm start seeds it once the fakes are up)`);
    return;
  }
  try {
    const settings = stripeSettings();
    const made = await seedBooksDemo(knex, { stripe: createStripeClient(settings), fakeUrl, webhookSecret: settings.STRIPE_WEBHOOK_SECRET, log: (m) => console.log(`[seed] ${m}`) }, {
      slug: BOOKS_DEMO_WORKSHOP,
      owner: "maren.ostby@example.com",
      builder: "tobias.reyne@example.com",
      bookkeeper: "corin.batt@example.com",
    });
    if (made) console.log(`[seed] books demo: ${made} commissions paid through the payments fake`);
  } finally {
    // The data functions above use the app's own connection pool; let this process end.
    await db.destroy();
  }
}
