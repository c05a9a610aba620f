// Payments test helpers over HTTP: a commission in its deposit stage, the client's checkout, the
// payments fake (`npm test` runs it on FAKE_STRIPE_PORT and it posts webhooks to the test app),
// and the rows the tests check.
import type Stripe from "stripe";
import type { CheckoutOut, CommissionPaymentsOut } from "@/lib/schemas/payment";
import { createStripeClient, stripeSettings } from "@/lib/services/stripe";
import { testDb } from "../setup/test-db";
import { approveSpec, base, openCommission } from "./commission-helpers";
import type { TestWorkshop } from "./fixtures";
import type { HttpSession } from "./session";

export const CARD_OK = "4242 4242 4242 4242";
export const CARD_DECLINED = "4000 0000 0000 0002";

export function stripeFakeUrl(path = ""): string {
  const port = process.env.FAKE_STRIPE_PORT;
  if (!port) throw new Error("FAKE_STRIPE_PORT is not set: run these tests through `npm test`");
  return `http://127.0.0.1:${port}${path}`;
}

/** The SDK client the app uses, on the same settings (for what a test reads or does at the processor). */
let client: Stripe | undefined;
export function processor(): Stripe {
  client ??= createStripeClient(stripeSettings({ ...process.env, STRIPE_MAX_NETWORK_RETRIES: "0" }));
  return client;
}

/** The fake's admin API (JSON in and out). */
export async function stripeAdmin<T = any>(path: string, body?: unknown): Promise<{ status: number; json: T }> {
  const res = await fetch(stripeFakeUrl(path), {
    method: body === undefined ? "GET" : "POST",
    headers: { "content-type": "application/json" },
    body: body === undefined ? undefined : JSON.stringify(body),
  });
  return { status: res.status, json: (await res.json()) as T };
}

/** Opens a commission (price 3,000.00 EUR, deposit 30 %) and takes it through spec approval to the deposit stage. */
export async function commissionAwaitingDeposit(s: { owner: HttpSession; builder: HttpSession; client: HttpSession }, ws: TestWorkshop, extra: Record<string, unknown> = {}) {
  const c = await openCommission(s.owner, ws, extra);
  await approveSpec(s.builder, s.client, ws, c.id);
  return c;
}

export async function checkout(client: HttpSession, ws: TestWorkshop, commissionId: number, kind: "deposit" | "balance" = "deposit") {
  const r = await client.fetch(`${base(ws)}/${commissionId}/checkout`, { method: "POST", json: { kind } });
  const body = (await r.json()) as { checkout: CheckoutOut; error?: { code: string; message: string; retryAfterSeconds?: number } };
  return { status: r.status, retryAfter: r.headers.get("retry-after"), ...body };
}

/** Pays an open session the way the hosted page does (the fake's admin shortcut takes the same path). */
export async function payAtProcessor(sessionId: string, card = CARD_OK) {
  return stripeAdmin(`/admin/checkout/sessions/${sessionId}/pay`, { card_number: card });
}

export async function paymentsOf(s: HttpSession, ws: TestWorkshop, commissionId: number): Promise<CommissionPaymentsOut> {
  const r = await s.json<CommissionPaymentsOut>(`${base(ws)}/${commissionId}/payments`);
  if (r.status !== 200) throw new Error(`payments ${r.status} ${JSON.stringify(r.body)}`);
  return r.body;
}

export interface PaymentDbRow {
  id: number;
  kind: string;
  status: string;
  method: string;
  amount_minor: number;
  fee_minor: number | null;
  net_minor: number | null;
  processor_session_id: string | null;
  processor_payment_id: string | null;
  processor_charge_id: string | null;
  processor_refund_id: string | null;
  processor_balance_txn_id: string | null;
  refund_of_payment_id: number | null;
  failure_message: string | null;
}

export async function paymentRows(commissionId: number): Promise<PaymentDbRow[]> {
  const rows = await testDb()("payments").where({ commission_id: commissionId }).orderBy("id").select("*");
  return rows.map((r: PaymentDbRow) => ({ ...r, amount_minor: Number(r.amount_minor), fee_minor: r.fee_minor === null ? null : Number(r.fee_minor), net_minor: r.net_minor === null ? null : Number(r.net_minor) }));
}

export async function commissionStage(commissionId: number): Promise<string> {
  return (await testDb()("commissions").where({ id: commissionId }).first("stage")).stage;
}

export async function auditActions(workshopId: number, entity: { type: string; ids: Array<number | string> }): Promise<string[]> {
  return (await testDb()("audit_log")
    .where({ workshop_id: workshopId, entity_type: entity.type })
    .whereIn("entity_id", entity.ids.map(String))
    .orderBy("id")
    .pluck("action")) as string[];
}

/** Polls until `check` returns a value that is not undefined/false, or throws after `timeoutMs`. */
export async function waitFor<T>(what: string, check: () => Promise<T | undefined | false>, timeoutMs = 20_000): Promise<T> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const v = await check();
    if (v !== undefined && v !== false) return v;
    if (Date.now() > deadline) throw new Error(`timed out waiting for ${what}`);
    await new Promise((r) => setTimeout(r, 200));
  }
}

interface Delivery {
  event_id: string;
  event_type: string;
  status: string;
  attempts: Array<{ status: number | null; error: string | null }>;
}

/** The fake's deliveries of the events of one payment intent or session (by event ids). */
export async function deliveriesOf(eventIds: string[]): Promise<Delivery[]> {
  const all = (await stripeAdmin<{ data: Delivery[] }>("/admin/webhooks/deliveries")).json.data;
  return all.filter((d) => eventIds.includes(d.event_id));
}

/** Every event the processor recorded about this payment intent or session, oldest first. */
export async function eventsAbout(ids: string[]): Promise<Stripe.Event[]> {
  const list = await processor().events.list({ limit: 100 });
  return list.data
    .filter((e) => {
      const o = e.data.object as unknown as Record<string, unknown>;
      return ids.includes(String(o.id)) || ids.includes(String(o.payment_intent)) || ids.includes(String(o.charge));
    })
    .reverse();
}

/** Waits until none of these events has a delivery waiting (pending or held). */
export async function settled(eventIds: string[], timeoutMs = 30_000) {
  await waitFor(
    "webhook deliveries to settle",
    async () => {
      const ds = await deliveriesOf(eventIds);
      return ds.length > 0 && ds.every((d) => d.status !== "pending" && d.status !== "held") ? ds : undefined;
    },
    timeoutMs,
  );
}
