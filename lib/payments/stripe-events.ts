// What the webhook does with a verified event: find the Checkout Session it concerns, read that
// session, its payment and refunds from the processor as they are now, and hand the snapshot to
// lib/data/processor-events.ts, which applies it once per event id.
import Stripe from "stripe";
import { z } from "zod";
import { resolveProcessorEventScope } from "@/lib/auth/workshop-access";
import {
  applyCheckoutSnapshot,
  isProcessorEventRecorded,
  recordIgnoredEvent,
  type CheckoutSnapshot,
  type EventOutcome,
  type ProcessorEventInfo,
  type RefundSnapshot,
} from "@/lib/data/processor-events";
import { AppError, zodIssues } from "@/lib/http/errors";
import { stripe } from "@/lib/services/stripe";
import { readCheckoutMetadata, sessionStatus } from "./processor-metadata";

/** The event types that can change a payment of ours; every other type is acknowledged and left alone. */
export const HANDLED_EVENT_TYPES = new Set([
  "checkout.session.completed",
  "checkout.session.expired",
  "checkout.session.async_payment_succeeded",
  "checkout.session.async_payment_failed",
  "payment_intent.succeeded",
  "payment_intent.payment_failed",
  "charge.refunded",
  "charge.refund.updated",
  "refund.created",
  "refund.updated",
  "refund.failed",
]);

const idOf = (v: string | { id: string } | null | undefined): string | null => (v == null ? null : typeof v === "string" ? v : v.id);

/** What the handler reads of a handled event; a signed event without it is refused (400), never a crash. */
const handledEventSchema = z.object({
  id: z.string().min(1).max(191),
  type: z.string().max(100),
  created: z.number().int().min(0),
  data: z.object({
    object: z.looseObject({
      id: z.string().min(1).max(191),
      payment_intent: z.union([z.string().max(191), z.looseObject({ id: z.string().max(191) }), z.null()]).optional(),
    }),
  }),
});

/** True for the processor's "no such object" (a session or payment intent that is not in this account). */
const isMissingAtProcessor = (err: unknown) => err instanceof Stripe.errors.StripeInvalidRequestError && err.statusCode === 404;

/** The payment intent an event's object belongs to (or the session itself for checkout events). */
function subjectOf(event: Stripe.Event): { sessionId: string } | { intentId: string } | null {
  const obj = event.data.object as unknown as Record<string, unknown>;
  if (event.type.startsWith("checkout.session.")) return { sessionId: String(obj.id) };
  if (event.type.startsWith("payment_intent.")) return { intentId: String(obj.id) };
  const intent = idOf(obj.payment_intent as string | null);
  return intent ? { intentId: intent } : null;
}

async function sessionIdFor(client: Stripe, subject: NonNullable<ReturnType<typeof subjectOf>>): Promise<string | null> {
  if ("sessionId" in subject) return subject.sessionId;
  const list = await client.checkout.sessions.list({ payment_intent: subject.intentId, limit: 1 });
  return list.data[0]?.id ?? null;
}

function refundSnapshot(r: Stripe.Refund): RefundSnapshot {
  return {
    id: r.id,
    amountMinor: r.amount,
    status: (r.status ?? "pending") as RefundSnapshot["status"],
    balanceTxnId: idOf(r.balance_transaction),
    reversalTxnId: idOf(r.failure_balance_transaction),
    failureReason: r.failure_reason ?? null,
    createdAt: new Date(r.created * 1000),
  };
}

/** Reads a session with its payment, fee and refunds as the processor has them now. */
export async function loadCheckoutSnapshot(client: Stripe, sessionId: string): Promise<{ snapshot: CheckoutSnapshot; metadata: Stripe.Metadata | null }> {
  const s = await client.checkout.sessions.retrieve(sessionId, { expand: ["payment_intent.latest_charge.balance_transaction"] });
  const intent = typeof s.payment_intent === "object" ? s.payment_intent : null;
  const charge = intent && typeof intent.latest_charge === "object" ? intent.latest_charge : null;
  const txn = charge && typeof charge.balance_transaction === "object" ? charge.balance_transaction : null;
  const ref = readCheckoutMetadata(s.metadata);
  const refunds = intent ? (await client.refunds.list({ payment_intent: intent.id, limit: 100 })).data : [];
  const card = charge?.payment_method_details?.card;
  const snapshot: CheckoutSnapshot = {
    sessionId: s.id,
    kind: ref?.kind ?? "deposit",
    status: sessionStatus(s.status),
    paid: s.payment_status === "paid",
    amountMinor: s.amount_total ?? 0,
    currency: (s.currency ?? "").toUpperCase(),
    payment:
      intent && intent.status === "succeeded"
        ? {
            intentId: intent.id,
            chargeId: charge?.id ?? null,
            balanceTxnId: txn?.id ?? idOf(charge?.balance_transaction),
            feeMinor: txn ? txn.fee : null,
            netMinor: txn ? txn.net : null,
            paidAt: new Date((charge?.created ?? s.created) * 1000),
            card: card ? { brand: card.brand ?? "card", last4: card.last4 ?? "" } : null,
          }
        : null,
    lastError: intent?.last_payment_error?.message ?? null,
    refunds: refunds.map(refundSnapshot),
  };
  return { snapshot, metadata: s.metadata };
}

/**
 * Handles one verified event. Processor calls that fail throw (the route answers 5xx and the
 * processor delivers the event again later); a repeated event id changes nothing.
 */
export async function handleStripeEvent(event: Stripe.Event, client: Stripe = stripe()): Promise<EventOutcome> {
  if (!HANDLED_EVENT_TYPES.has(event.type)) return "ignored";
  const shape = handledEventSchema.safeParse(event);
  if (!shape.success) throw new AppError("bad_request", "The event does not have the fields of a processor event.", zodIssues(shape.error));
  if (await isProcessorEventRecorded(event.id)) return "duplicate";
  const subject = subjectOf(event);
  const info: ProcessorEventInfo = {
    id: event.id,
    type: event.type,
    objectId: idOf((event.data.object as { id?: string }).id ?? null),
    createdAt: new Date(event.created * 1000),
  };
  let loaded: Awaited<ReturnType<typeof loadCheckoutSnapshot>>;
  try {
    const sessionId = subject ? await sessionIdFor(client, subject) : null;
    if (!sessionId) return recordIgnoredEvent(info);
    loaded = await loadCheckoutSnapshot(client, sessionId);
  } catch (err) {
    // A session or payment the processor does not know is not one of ours.
    if (isMissingAtProcessor(err)) return recordIgnoredEvent(info);
    throw err;
  }
  const { snapshot, metadata } = loaded;
  const ref = readCheckoutMetadata(metadata);
  if (!ref) return recordIgnoredEvent(info);
  const scope = await resolveProcessorEventScope(ref.workshopId, ref.commissionId);
  if (!scope) return recordIgnoredEvent(info);
  return applyCheckoutSnapshot(scope, ref.commissionId, info, snapshot);
}
