// The payment webhook's benchmark: POST /api/webhooks/stripe with a signed checkout.session.completed
// event, a new event id on every request, for a deposit paid through the payments fake (so each
// request verifies the signature, reads the session, its payment and refunds from the fake and
// records the event once), against its floor: POST /api/bench/stripe-signature, the same body and
// signature checked and nothing else. Used by `npm run bench`.
import Stripe from "stripe";
import { signInRoles } from "../../tests/http/commission-helpers";
import { createWorkshopWithMembers } from "../../tests/http/fixtures";
import { checkout, commissionAwaitingDeposit, payAtProcessor, paymentRows, waitFor } from "../../tests/http/payment-helpers";
import { met, runGroup, type BenchRow, type LoadPlan, type RunningApp } from "./harness";

/** A commission whose deposit was paid by card at the fake and recorded through its webhook; its session id. (Needs pointTestHelpersAt.) */
export async function preparePaidCheckout(): Promise<string> {
  const ws = await createWorkshopWithMembers();
  const s = await signInRoles(ws);
  const c = await commissionAwaitingDeposit(s, ws);
  const co = await checkout(s.client, ws, c.id);
  if (co.status !== 201) throw new Error(`checkout ${co.status}: ${JSON.stringify(co.error)}`);
  const paid = await payAtProcessor(co.checkout.sessionId);
  if (paid.status !== 200) throw new Error(`paying at the fake: ${paid.status}`);
  await waitFor("the deposit recorded by the webhook", async () => (await paymentRows(c.id)).some((p) => p.status === "paid"));
  return co.checkout.sessionId;
}

/** A signed event body per request: the same session, a new event id each time. */
function signedEvents(sessionId: string, secret: string) {
  let n = 0;
  const run = `${process.pid}_${Date.now()}`;
  return (req: { headers?: Record<string, string> }) => {
    n += 1;
    const body = JSON.stringify({
      id: `evt_bench_${run}_${n}`,
      object: "event",
      type: "checkout.session.completed",
      created: Math.floor(Date.now() / 1000),
      livemode: false,
      data: { object: { id: sessionId, object: "checkout.session", status: "complete", payment_status: "paid" } },
    });
    const signature = Stripe.webhooks.generateTestHeaderString({ payload: body, secret });
    return { ...req, body, headers: { ...req.headers, "stripe-signature": signature } };
  };
}

/** The webhook at 10 connections against its floor (the floor needs BENCH_FLOOR_TOKEN = `token` in the app). */
export async function benchWebhook(app: RunningApp, sessionId: string, token: string, plan: LoadPlan): Promise<BenchRow[]> {
  const secret = process.env.STRIPE_WEBHOOK_SECRET;
  if (!secret) throw new Error("STRIPE_WEBHOOK_SECRET is not set (.env.example)");
  const headers = { "content-type": "application/json" };
  // One of each before timing: the route records the event (not a duplicate, not ignored).
  const probe = signedEvents(sessionId, secret)({ headers });
  const res = await fetch(`${app.base}/api/webhooks/stripe`, { method: "POST", headers: probe.headers, body: probe.body });
  const answer = (await res.json()) as { outcome?: string };
  if (res.status !== 200 || answer.outcome !== "applied") throw new Error(`the webhook answered ${res.status} ${JSON.stringify(answer)}`);
  return runGroup(
    app,
    {
      connections: 10,
      floor: { name: "webhook: signature check only", url: `${app.base}/api/bench/stripe-signature`, method: "POST", headers: { ...headers, "x-bench-token": token }, setupRequest: signedEvents(sessionId, secret), expectStatus: 200 },
      targets: [{ name: "POST /api/webhooks/stripe, new event each", url: `${app.base}/api/webhooks/stripe`, method: "POST", headers, setupRequest: signedEvents(sessionId, secret), expectStatus: 200 }],
      goal: (r) => `p95 ≤ 100 ms: ${met(r.p95Ms <= 100)}`,
    },
    plan,
  );
}
