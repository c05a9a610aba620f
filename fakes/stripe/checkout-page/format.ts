// Amounts in minor units shown in their currency (2 decimals for EUR, 0 for JPY, …).
export function formatMoney(minor: number, currency: string): string {
  const fmt = new Intl.NumberFormat("en-GB", { style: "currency", currency: currency.toUpperCase() });
  const digits = fmt.resolvedOptions().maximumFractionDigits ?? 2;
  return fmt.format(minor / 10 ** digits);
}
