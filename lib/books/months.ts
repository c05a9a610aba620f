// Calendar months in UTC, the unit the books are reconciled and locked in ("2027-03"). Pure.

export const MONTH_PATTERN = /^(\d{4})-(0[1-9]|1[0-2])$/;

export type Month = string;

export function isMonth(value: unknown): value is Month {
  return typeof value === "string" && MONTH_PATTERN.test(value);
}

/** The month (UTC) a moment falls in. */
export function monthOf(at: Date): Month {
  return at.toISOString().slice(0, 7);
}

/** The first instant of the month and of the month after it: [start, end). */
export function monthRange(month: Month): { start: Date; end: Date } {
  const m = MONTH_PATTERN.exec(month);
  if (!m) throw new RangeError(`not a month: ${month}`);
  const year = Number(m[1]);
  const index = Number(m[2]) - 1;
  return { start: new Date(Date.UTC(year, index, 1)), end: new Date(Date.UTC(year, index + 1, 1)) };
}

/** The month `n` months after (negative: before) `month`. */
export function addMonths(month: Month, n: number): Month {
  const { start } = monthRange(month);
  return monthOf(new Date(Date.UTC(start.getUTCFullYear(), start.getUTCMonth() + n, 1)));
}

/** "March 2027". */
export function monthLabel(month: Month): string {
  return new Intl.DateTimeFormat("en-GB", { month: "long", year: "numeric", timeZone: "UTC" }).format(monthRange(month).start);
}

/** True once the month has ended at `now`. */
export function isMonthOver(month: Month, now: Date): boolean {
  return monthRange(month).end.getTime() <= now.getTime();
}

/** Every month from `first` to `last`, both included, newest first. */
export function monthsBetween(first: Month, last: Month): Month[] {
  const out: Month[] = [];
  for (let m = last; m >= first; m = addMonths(m, -1)) out.push(m);
  return out;
}
