// What has been paid on a commission: the figures the stage guards and the pages need.
import type { Trx } from "./transaction";

export interface PaymentTotals {
  /** Deposits paid, less deposit refunds. */
  depositPaidMinor: number;
  /** Everything paid (deposits and balance), less refunds. */
  paidMinor: number;
  refundedMinor: number;
}

export async function paymentTotals(trx: Trx, workshopId: number, commissionId: number): Promise<PaymentTotals> {
  const rows = (await trx("payments as p")
    .leftJoin("payments as o", "o.id", "p.refund_of_payment_id")
    .where({ "p.workshop_id": workshopId, "p.commission_id": commissionId, "p.status": "paid" })
    .select("p.kind", "p.amount_minor", "o.kind as refunded_kind")) as Array<{ kind: string; amount_minor: number; refunded_kind: string | null }>;
  let deposit = 0;
  let paid = 0;
  let refunded = 0;
  for (const r of rows) {
    const amount = Number(r.amount_minor);
    if (r.kind === "refund") {
      refunded += amount;
      paid -= amount;
      if (r.refunded_kind === "deposit") deposit -= amount;
    } else {
      paid += amount;
      if (r.kind === "deposit") deposit += amount;
    }
  }
  return { depositPaidMinor: deposit, paidMinor: paid, refundedMinor: refunded };
}

/** The guards' view: a deposit of 0 needs no payment; the balance is the whole price. */
export function paidFlags(t: PaymentTotals, c: { deposit_minor: number | string; price_minor: number | string }) {
  return { depositPaid: t.depositPaidMinor >= Number(c.deposit_minor), balancePaid: t.paidMinor >= Number(c.price_minor) };
}
