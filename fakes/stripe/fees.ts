// The fake processor's fee: our own schedule, realistic-looking but not any real price list.
//   fee = round(amount × 1.45 %) + a fixed part in the charge currency's minor units
// Refunds and payouts carry no fee.

const FIXED_MINOR: Record<string, number> = { eur: 25, usd: 30, gbp: 20, chf: 30, sek: 250, nok: 250, dkk: 180, jpy: 40 };
const DEFAULT_FIXED_MINOR = 30;
export const FEE_PERCENT = 1.45;

export function fixedFee(currency: string): number {
  return FIXED_MINOR[currency.toLowerCase()] ?? DEFAULT_FIXED_MINOR;
}

/** The `fee_details` list of a balance transaction carrying `fee`. */
export function feeDetails(fee: number, currency: string) {
  return fee ? [{ amount: fee, application: null, currency, description: "Processing fee (local fake)", type: "stripe_fee" as const }] : [];
}

/** The fee on a successful charge of `amount` minor units; never more than the amount. */
export function processingFee(amount: number, currency: string): number {
  const fee = Math.round((amount * FEE_PERCENT) / 100) + fixedFee(currency);
  return Math.min(fee, amount);
}
