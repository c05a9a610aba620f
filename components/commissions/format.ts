// How the commission screens show dates and money: dates as the calendar date (UTC, the way they
// are stored), times in the reader's locale, money through lib/money.
import { formatMoney, money } from "@/lib/money/money";
import type { CommissionMoney } from "@/lib/schemas/commission-out";

const DATE = new Intl.DateTimeFormat("en-GB", { day: "numeric", month: "short", year: "numeric", timeZone: "UTC" });
const DATE_TIME = new Intl.DateTimeFormat("en-GB", { day: "numeric", month: "short", year: "numeric", hour: "2-digit", minute: "2-digit", timeZone: "UTC" });

/** "2027-03-31" → "31 Mar 2027"; null → "—". */
export function formatDay(isoDate: string | null): string {
  if (!isoDate) return "—";
  const d = new Date(`${isoDate.slice(0, 10)}T00:00:00Z`);
  return Number.isNaN(d.getTime()) ? isoDate : DATE.format(d);
}

/** An ISO timestamp as "31 Mar 2027, 14:05 UTC". */
export function formatWhen(iso: string): string {
  const d = new Date(iso);
  return Number.isNaN(d.getTime()) ? iso : `${DATE_TIME.format(d)} UTC`;
}

export function formatPrice(m: CommissionMoney, field: "priceMinor" | "depositMinor"): string {
  return formatMoney(money(m[field], m.currency));
}

export function formatMinor(amountMinor: number, currency: string): string {
  return formatMoney(money(amountMinor, currency));
}
