// The processor side of a card checkout: a Checkout Session for one invoice, made with the stripe
// SDK (lib/services/stripe.ts points it at the local fake or the hosted API).
import type Stripe from "stripe";
import type { WorkshopScope } from "@/lib/auth/scope";
import { appLink } from "@/lib/auth/links";
import { openCardCheckout, type CheckoutProcessor, type CheckoutRequest, type CheckoutSessionState } from "@/lib/data/card-payments";
import type { InvoiceKind } from "@/lib/money/invoices";
import type { CheckoutOut } from "@/lib/schemas/payment";
import { stripe } from "@/lib/services/stripe";
import { callProcessor } from "./processor-errors";
import { checkoutMetadata, sessionStatus } from "./processor-metadata";

const KIND_NAME: Record<InvoiceKind, string> = { deposit: "Deposit", balance: "Balance" };

/** Where the processor sends the payer back: the commission's payments page. */
export function paymentsPagePath(slug: string, commissionId: number): string {
  return `/${slug}/commissions/${commissionId}/payments`;
}

function sessionState(s: Stripe.Checkout.Session): CheckoutSessionState {
  return { id: s.id, url: s.url ?? null, status: sessionStatus(s.status), amountMinor: s.amount_total ?? 0 };
}

/** The session parameters for one invoice (exported for the tests that check them). */
export function sessionParams(req: CheckoutRequest): Stripe.Checkout.SessionCreateParams {
  const page = appLink(paymentsPagePath(req.workshop.slug, req.commission.id));
  const what = `${KIND_NAME[req.kind]}, commission ${req.commission.number}`;
  const metadata = checkoutMetadata({ workshopId: req.workshop.id, commissionId: req.commission.id, kind: req.kind, payerUserId: req.payer.userId });
  return {
    mode: "payment",
    line_items: [
      {
        quantity: 1,
        price_data: {
          currency: req.currency.toLowerCase(),
          unit_amount: req.amountMinor,
          product_data: { name: `${what}: ${req.commission.title}`.slice(0, 250) },
        },
      },
    ],
    // The processor fills in {CHECKOUT_SESSION_ID}; the braces must stay as they are.
    success_url: `${page}?checkout=success&session_id={CHECKOUT_SESSION_ID}`,
    cancel_url: `${page}?checkout=cancelled`,
    client_reference_id: `commission-${req.commission.id}-${req.kind}`,
    customer_email: req.payer.email,
    metadata,
    payment_intent_data: { metadata, description: `${what} (${req.workshop.name})`.slice(0, 1000) },
  };
}

/** The Checkout calls through the shared SDK client, with processor errors mapped for people. */
export function stripeCheckoutProcessor(client: Stripe = stripe()): CheckoutProcessor {
  return {
    create: (req) => callProcessor(async () => sessionState(await client.checkout.sessions.create(sessionParams(req), { idempotencyKey: req.idempotencyKey }))),
    retrieve: (id) => callProcessor(async () => sessionState(await client.checkout.sessions.retrieve(id))),
    expire: (id) =>
      callProcessor(async () => {
        try {
          return sessionState(await client.checkout.sessions.expire(id));
        } catch (err) {
          // It may have completed or expired meanwhile: what it is now is the answer.
          if ((err as { code?: string }).code === "checkout_session_not_open") return sessionState(await client.checkout.sessions.retrieve(id));
          throw err;
        }
      }),
  };
}

/** "Pay deposit" / "Pay balance": the hosted payment page to send the client to. */
export function startCheckout(scope: WorkshopScope, commissionId: number, kind: InvoiceKind): Promise<CheckoutOut> {
  return openCardCheckout(scope, commissionId, kind, stripeCheckoutProcessor());
}
