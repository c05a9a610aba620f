import { z } from "zod";
import { INVOICE_KINDS, type Invoice, type InvoiceKind, type PaymentStatus } from "../money/invoices";

// Inputs of the payments page and routes (the offline payment's schema is `offlinePaymentSchema`
// in ./commission.ts), and the shapes that leave lib/data for payments.

export const checkoutStartSchema = z.object({
  kind: z.enum(INVOICE_KINDS, { error: "Choose the deposit or the balance." }),
});
export type CheckoutStart = z.infer<typeof checkoutStartSchema>;

export const refundRequestSchema = z.object({
  paymentId: z.coerce.number().int().positive().max(2_147_483_647),
  /** Minor units; left out, the whole refundable amount goes back. */
  amountMinor: z.int().positive("Enter an amount above zero.").max(1e11).optional(),
  reason: z.string().trim().max(120, "At most 120 characters.").optional(),
});
export type RefundRequest = z.infer<typeof refundRequestSchema>;

/** The processor's ids and figures for one row (owner and bookkeeper only). */
export interface ProcessorDetails {
  sessionId: string | null;
  paymentIntentId: string | null;
  chargeId: string | null;
  refundId: string | null;
  balanceTransactionId: string | null;
  reversalTransactionId: string | null;
  feeMinor: number | null;
  netMinor: number | null;
}

export interface PaymentOut {
  id: number;
  kind: InvoiceKind | "refund";
  status: PaymentStatus;
  method: "offline" | "card";
  amountMinor: number;
  currency: string;
  reference: string | null;
  /** For a refund: the payment it returns. */
  refundOf: number | null;
  failureMessage: string | null;
  paidAt: string | null;
  createdAt: string;
  /** What could still be refunded of this payment (0 for refunds and unpaid rows). */
  refundableMinor: number;
  processor: ProcessorDetails | null;
}

export interface CommissionPaymentsOut {
  commission: { id: number; number: string; title: string; stage: string; stageLabel: string; currency: string; priceMinor: number; depositMinor: number; depositPercent: number };
  invoices: Invoice[];
  totals: { paidMinor: number; refundedMinor: number; refundPendingMinor: number; outstandingMinor: number; overpaidMinor: number };
  payments: PaymentOut[];
  /** What the caller may do here (the buttons to show). */
  can: { pay: boolean; record: boolean; refund: boolean };
}

export interface CheckoutOut {
  paymentId: number;
  sessionId: string;
  /** The processor's hosted payment page. */
  url: string;
  /** True when an open Checkout for the same invoice and amount was handed back instead of a new one. */
  reused: boolean;
}
