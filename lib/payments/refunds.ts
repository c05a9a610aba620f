// "Refund" on the payments page and its route: the processor side of a card refund, made with the
// stripe SDK; the rows and the checks live in lib/data/refunds.ts.
import type Stripe from "stripe";
import type { WorkshopScope } from "@/lib/auth/scope";
import { requestRefund, type RefundProcessor } from "@/lib/data/refunds";
import type { PaymentOut, RefundRequest } from "@/lib/schemas/payment";
import { stripe } from "@/lib/services/stripe";
import { callProcessor } from "./processor-errors";

export function stripeRefundProcessor(client: Stripe = stripe()): RefundProcessor {
  return {
    create: (req) =>
      callProcessor(async () => {
        const refund = await client.refunds.create(
          { payment_intent: req.paymentIntentId, amount: req.amountMinor, reason: "requested_by_customer", metadata: req.metadata },
          { idempotencyKey: req.idempotencyKey },
        );
        return { id: refund.id };
      }),
  };
}

/** Refunds all or part of a payment: card payments through the processor, offline ones at once. */
export function refundPayment(scope: WorkshopScope, commissionId: number, input: RefundRequest): Promise<PaymentOut> {
  return requestRefund(scope, commissionId, input, stripeRefundProcessor());
}
