// The metadata we put on every Checkout Session and payment intent, and reading it back from what
// the processor returns: which workshop, commission and invoice a payment belongs to.
import { z } from "zod";
import { INVOICE_KINDS, type InvoiceKind } from "@/lib/money/invoices";

export interface CheckoutReference {
  workshopId: number;
  commissionId: number;
  kind: InvoiceKind;
  payerUserId: number;
}

const id = z.coerce.number().int().positive().max(2_147_483_647);
const schema = z.object({
  scalewright_workshop_id: id,
  scalewright_commission_id: id,
  scalewright_invoice: z.enum(INVOICE_KINDS),
  scalewright_payer_id: id,
});

export function checkoutMetadata(ref: CheckoutReference): Record<string, string> {
  return {
    scalewright_workshop_id: String(ref.workshopId),
    scalewright_commission_id: String(ref.commissionId),
    scalewright_invoice: ref.kind,
    scalewright_payer_id: String(ref.payerUserId),
  };
}

/** Our reference from a session's metadata; null for a session that is not one of ours. */
export function readCheckoutMetadata(metadata: Record<string, string> | null | undefined): CheckoutReference | null {
  const parsed = schema.safeParse(metadata ?? {});
  if (!parsed.success) return null;
  const m = parsed.data;
  return { workshopId: m.scalewright_workshop_id, commissionId: m.scalewright_commission_id, kind: m.scalewright_invoice, payerUserId: m.scalewright_payer_id };
}

/** A session's status as we handle it: anything unknown counts as still open (nothing happens on it). */
export function sessionStatus(status: string | null | undefined): "open" | "complete" | "expired" {
  return status === "complete" || status === "expired" ? status : "open";
}
