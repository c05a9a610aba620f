// Small statistics and calendar arithmetic for the owner's overview. Pure: no React, no database.
// Every date here is a UTC calendar date ("2027-03-31"); instants are Date objects or ISO strings.

const DAY_MS = 86_400_000;

/**
 * The median of a list of numbers: the middle value of the sorted list, or the mean of the two
 * middle values when the count is even (the usual textbook definition). Null for an empty list.
 */
export function median(values: readonly number[]): number | null {
  const finite = values.filter((v) => Number.isFinite(v));
  if (finite.length === 0) return null;
  const sorted = [...finite].sort((a, b) => a - b);
  const mid = sorted.length >> 1;
  return sorted.length % 2 === 1 ? sorted[mid]! : (sorted[mid - 1]! + sorted[mid]!) / 2;
}

/** The UTC calendar date of an instant, as "YYYY-MM-DD". */
export function utcDate(instant: Date | string): string {
  const d = instant instanceof Date ? instant : new Date(instant);
  if (Number.isNaN(d.getTime())) throw new RangeError(`not a date: ${String(instant)}`);
  return d.toISOString().slice(0, 10);
}

function dayNumber(date: string): number {
  const [y, m, d] = date.split("-").map(Number);
  return Date.UTC(y!, m! - 1, d!) / DAY_MS;
}

/**
 * Whole calendar days from one UTC date to another (negative when `to` is earlier). Dates are taken
 * as UTC calendar dates, so a move at 23:50 and a look at 00:10 the next day count one day, and no
 * daylight-saving change can add or lose an hour.
 */
export function daysBetween(from: Date | string, to: Date | string): number {
  const a = typeof from === "string" && from.length === 10 ? from : utcDate(from);
  const b = typeof to === "string" && to.length === 10 ? to : utcDate(to);
  return Math.round(dayNumber(b) - dayNumber(a));
}

/** The UTC date `days` after `date` ("YYYY-MM-DD"). */
export function addDays(date: string, days: number): string {
  return new Date((dayNumber(date) + days) * DAY_MS).toISOString().slice(0, 10);
}

/** A share as a fraction 0…1, null when there is nothing to share. */
export function share(part: number, whole: number): number | null {
  return whole > 0 ? part / whole : null;
}
