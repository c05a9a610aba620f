// Median and UTC day counts for the owner's overview, checked against textbook definitions and an
// independent calendar algorithm rather than against the code's own arithmetic.
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { addDays, daysBetween, median, share, utcDate } from "@/lib/overview/stats";

/**
 * Julian Day Number of a Gregorian date by integer arithmetic alone (no Date object): Fliegel &
 * Van Flandern, "A machine algorithm for processing calendar dates", Communications of the ACM
 * 11(10), 1968, p. 657. Division truncates toward zero as in the published FORTRAN.
 */
function julianDayNumber(y: number, m: number, d: number): number {
  const t = Math.trunc;
  const a = t((m - 14) / 12);
  return t((1461 * (y + 4800 + a)) / 4) + t((367 * (m - 2 - 12 * a)) / 12) - t((3 * t((y + 4900 + a) / 100)) / 4) + d - 32075;
}

const iso = (y: number, m: number, d: number) => `${String(y).padStart(4, "0")}-${String(m).padStart(2, "0")}-${String(d).padStart(2, "0")}`;

describe("median", () => {
  // Textbook definition (NIST/SEMATECH e-Handbook of Statistical Methods, 1.3.5.1 Measures of
  // Location): the middle value of the sorted data for an odd count, the mean of the two middle
  // values for an even count.
  it("takes the middle value of an odd count, whatever the order", () => {
    expect(median([7, 1, 3])).toBe(3);
    expect(median([5])).toBe(5);
    expect(median([2, 2, 9, 1, 2])).toBe(2);
  });

  it("takes the mean of the two middle values of an even count", () => {
    expect(median([1, 2, 3, 4])).toBe(2.5);
    expect(median([10, 0])).toBe(5);
    expect(median([4, 4, 1, 9])).toBe(4);
  });

  it("has no median for no data", () => {
    expect(median([])).toBeNull();
  });

  // Defining property of a median (same source): at least half the values lie at or below it and
  // at least half at or above it.
  it("splits any list in halves", () => {
    fc.assert(
      fc.property(fc.array(fc.integer({ min: -1000, max: 1000 }), { minLength: 1, maxLength: 60 }), (xs) => {
        const m = median(xs)!;
        expect(xs.filter((x) => x <= m).length * 2).toBeGreaterThanOrEqual(xs.length);
        expect(xs.filter((x) => x >= m).length * 2).toBeGreaterThanOrEqual(xs.length);
        expect(m).toBeGreaterThanOrEqual(Math.min(...xs));
        expect(m).toBeLessThanOrEqual(Math.max(...xs));
      }),
    );
  });
});

describe("days between UTC dates", () => {
  it("agrees with the Julian Day Number difference (Fliegel & Van Flandern 1968) for any two dates", () => {
    // JDN of 2000-01-01 is 2451545 (the J2000.0 epoch falls at its noon): checks the helper itself.
    expect(julianDayNumber(2000, 1, 1)).toBe(2451545);
    const date = fc.record({ y: fc.integer({ min: 1900, max: 2200 }), m: fc.integer({ min: 1, max: 12 }), d: fc.integer({ min: 1, max: 28 }) });
    fc.assert(
      fc.property(date, date, (a, b) => {
        expect(daysBetween(iso(a.y, a.m, a.d), iso(b.y, b.m, b.d))).toBe(julianDayNumber(b.y, b.m, b.d) - julianDayNumber(a.y, a.m, a.d));
      }),
    );
  });

  // Gregorian calendar rules: every 4th year is a leap year, except centuries not divisible by 400.
  it("follows the Gregorian leap-year rule", () => {
    expect(daysBetween("2024-02-28", "2024-03-01")).toBe(2);
    expect(daysBetween("2023-02-28", "2023-03-01")).toBe(1);
    expect(daysBetween("2000-02-28", "2000-03-01")).toBe(2);
    expect(daysBetween("2100-02-28", "2100-03-01")).toBe(1);
    expect(daysBetween("2024-01-01", "2025-01-01")).toBe(366);
    expect(daysBetween("2027-01-01", "2028-01-01")).toBe(365);
  });

  it("counts calendar days in UTC, not 24-hour spans, and is negative backwards", () => {
    expect(daysBetween(new Date("2027-05-03T23:50:00Z"), new Date("2027-05-04T00:10:00Z"))).toBe(1);
    expect(daysBetween(new Date("2027-05-03T00:10:00Z"), new Date("2027-05-03T23:50:00Z"))).toBe(0);
    expect(daysBetween("2027-05-10", "2027-05-03")).toBe(-7);
    // An offset is converted to UTC first (ISO 8601): 00:30 at +02:00 is 22:30 the day before.
    expect(utcDate("2027-05-04T00:30:00+02:00")).toBe("2027-05-03");
  });

  it("is not moved by a daylight-saving change (UTC has none)", () => {
    // Central Europe moves its clocks on 2027-03-28 (last Sunday in March, EU Directive 2000/84/EC).
    expect(daysBetween(new Date("2027-03-27T12:00:00Z"), new Date("2027-03-29T12:00:00Z"))).toBe(2);
    expect(daysBetween(new Date("2027-03-27T12:00:00+01:00"), new Date("2027-03-29T12:00:00+02:00"))).toBe(2);
  });

  it("adds days as the inverse of the count", () => {
    expect(addDays("2024-02-28", 1)).toBe("2024-02-29");
    expect(addDays("2027-12-31", 1)).toBe("2028-01-01");
    fc.assert(
      fc.property(fc.integer({ min: -5000, max: 5000 }), (n) => {
        expect(daysBetween("2027-06-15", addDays("2027-06-15", n))).toBe(n);
      }),
    );
  });

  it("refuses something that is not a date", () => {
    expect(() => utcDate("not a date")).toThrow(RangeError);
  });
});

describe("share", () => {
  it("is part ÷ whole, and nothing for an empty whole", () => {
    expect(share(1, 4)).toBe(0.25);
    expect(share(0, 3)).toBe(0);
    expect(share(0, 0)).toBeNull();
  });
});
