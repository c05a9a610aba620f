"use server";

import { revalidatePath } from "next/cache";
import { workshopAction } from "@/lib/auth/actions";
import { recordOfflinePayment } from "@/lib/data/payments";
import { refundPayment } from "@/lib/payments/refunds";
import { paymentsPagePath, startCheckout } from "@/lib/payments/stripe-checkout";
import { offlinePaymentSchema } from "@/lib/schemas/commission";
import { idParamSchema } from "@/lib/schemas/ids";
import { checkoutStartSchema, refundRequestSchema } from "@/lib/schemas/payment";

// Each action authorises itself through workshopAction (slug from the page's URL, workshop id from
// the caller's membership); the commission id is checked against the caller's scope in lib/data.
const onCommission = { commissionId: idParamSchema };

/** "Pay deposit" / "Pay balance": answers the hosted payment page's URL for the browser to open. */
export const payInvoiceAction = workshopAction({ permission: "payment.pay", schema: checkoutStartSchema.extend(onCommission) }, async ({ commissionId, kind }, ctx) => {
  const checkout = await startCheckout(ctx.scope, commissionId, kind);
  return { url: checkout.url, reused: checkout.reused };
});

export const recordPaymentAction = workshopAction(
  { permission: "payment.record", schema: offlinePaymentSchema.extend(onCommission) },
  async ({ commissionId, ...input }, ctx) => {
    const result = await recordOfflinePayment(ctx.scope, commissionId, input);
    revalidatePath(paymentsPagePath(ctx.workshop.slug, commissionId));
    return result;
  },
);

export const refundAction = workshopAction({ permission: "payment.refund", schema: refundRequestSchema.extend(onCommission) }, async ({ commissionId, ...input }, ctx) => {
  const refund = await refundPayment(ctx.scope, commissionId, input);
  revalidatePath(paymentsPagePath(ctx.workshop.slug, commissionId));
  return { id: refund.id, status: refund.status, amountMinor: refund.amountMinor };
});
