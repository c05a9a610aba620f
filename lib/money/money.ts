// Money in integer minor units with an ISO 4217 currency. No floats are ever stored.

export interface Money {
  /** Integer amount in the currency's minor unit (cents for EUR/USD, yen for JPY). */
  amountMinor: number;
  /** ISO 4217 code, upper case. */
  currency: string;
}

export const CURRENCIES = ["EUR", "USD", "GBP", "CHF", "SEK", "NOK", "DKK", "CAD", "AUD", "NZD", "JPY", "PLN", "CZK"] as const;
export type Currency = (typeof CURRENCIES)[number];

const exponentCache = new Map<string, number>();

/** Digits after the decimal point for a currency (2 for EUR, 0 for JPY), from the platform's ICU data. */
export function minorUnitExponent(currency: string): number {
  const code = currency.toUpperCase();
  let e = exponentCache.get(code);
  if (e === undefined) {
    e = new Intl.NumberFormat("en", { style: "currency", currency: code }).resolvedOptions().maximumFractionDigits ?? 2;
    exponentCache.set(code, e);
  }
  return e;
}

export function money(amountMinor: number, currency: string): Money {
  if (!Number.isSafeInteger(amountMinor)) throw new RangeError(`amount must be a whole number of minor units, got ${amountMinor}`);
  return { amountMinor, currency: currency.toUpperCase() };
}

function sameCurrency(a: Money, b: Money): void {
  if (a.currency !== b.currency) throw new RangeError(`cannot combine ${a.currency} with ${b.currency}`);
}

export function add(a: Money, b: Money): Money {
  sameCurrency(a, b);
  return money(a.amountMinor + b.amountMinor, a.currency);
}

export function subtract(a: Money, b: Money): Money {
  sameCurrency(a, b);
  return money(a.amountMinor - b.amountMinor, a.currency);
}

export function sum(items: readonly Money[], currency: string): Money {
  return items.reduce((acc, m) => add(acc, m), money(0, currency));
}

/**
 * A percentage of an amount, rounded half away from zero to the minor unit.
 * `percent` may have decimals (e.g. 33.5 %); it is applied in basis points to stay exact.
 */
export function percentOf(amount: Money, percent: number): Money {
  const bp = Math.round(percent * 100);
  const raw = (amount.amountMinor * bp) / 10_000;
  return money(Math.sign(raw) * Math.round(Math.abs(raw)), amount.currency);
}

/** Parses what a person types in major units ("1,234.50", "1234.5") into minor units; null if not a number. */
export function parseMajor(text: string, currency: string): Money | null {
  const cleaned = text.replace(/[\s,_']/g, "");
  if (!/^-?\d+(\.\d+)?$/.test(cleaned)) return null;
  const e = minorUnitExponent(currency);
  const [whole, frac = ""] = cleaned.replace("-", "").split(".");
  if (frac.length > e) return null;
  const minor = Number(whole) * 10 ** e + Number(frac.padEnd(e, "0") || "0");
  if (!Number.isSafeInteger(minor)) return null;
  return money(cleaned.startsWith("-") ? -minor : minor, currency);
}

/** Major units as a plain decimal string ("1234.50"), for CSV exports and form fields. */
export function toMajorString(m: Money): string {
  const e = minorUnitExponent(m.currency);
  const sign = m.amountMinor < 0 ? "-" : "";
  const abs = Math.abs(m.amountMinor);
  if (e === 0) return `${sign}${abs}`;
  const s = String(abs).padStart(e + 1, "0");
  return `${sign}${s.slice(0, -e)}.${s.slice(-e)}`;
}

/** For people: "€1,234.50" in the given locale. */
export function formatMoney(m: Money, locale = "en-GB"): string {
  const e = minorUnitExponent(m.currency);
  return new Intl.NumberFormat(locale, { style: "currency", currency: m.currency, minimumFractionDigits: e, maximumFractionDigits: e }).format(
    m.amountMinor / 10 ** e,
  );
}
