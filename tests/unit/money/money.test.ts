// Money in minor units. Minor-unit exponents per ISO 4217 (the standard's currency table: EUR and
// USD 2 decimals, JPY 0) [standard]; rounding of percentages half away from zero is our choice.
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { add, formatMoney, minorUnitExponent, money, parseMajor, percentOf, subtract, sum, toMajorString } from "@/lib/money/money";

describe("money", () => {
  it("knows the ISO 4217 minor units of common currencies", () => {
    expect(minorUnitExponent("EUR")).toBe(2);
    expect(minorUnitExponent("usd")).toBe(2);
    expect(minorUnitExponent("JPY")).toBe(0);
  });

  it("refuses fractional minor units and mixed currencies", () => {
    expect(() => money(10.5, "EUR")).toThrow(RangeError);
    expect(() => add(money(1, "EUR"), money(1, "USD"))).toThrow(/EUR with USD/);
  });

  it("takes a deposit percentage exactly, rounding half away from zero", () => {
    expect(percentOf(money(420_000, "EUR"), 30)).toEqual(money(126_000, "EUR"));
    expect(percentOf(money(1_001, "EUR"), 50)).toEqual(money(501, "EUR")); // 500.5 → 501
    expect(percentOf(money(-1_001, "EUR"), 50)).toEqual(money(-501, "EUR"));
    expect(percentOf(money(99_999, "USD"), 33.5)).toEqual(money(33_500, "USD")); // 33499.665 → 33500
  });

  it("parses what people type and prints major units back", () => {
    expect(parseMajor("1,234.50", "EUR")).toEqual(money(123_450, "EUR"));
    expect(parseMajor("1234.5", "EUR")).toEqual(money(123_450, "EUR"));
    expect(parseMajor("12.345", "EUR")).toBeNull();
    expect(parseMajor("abc", "EUR")).toBeNull();
    expect(parseMajor("5000", "JPY")).toEqual(money(5000, "JPY"));
    expect(toMajorString(money(5, "EUR"))).toBe("0.05");
    expect(toMajorString(money(-123_450, "EUR"))).toBe("-1234.50");
    expect(formatMoney(money(123_450, "EUR"), "en-GB")).toBe("€1,234.50");
  });

  it("round-trips any amount through its major-unit string (property)", () => {
    fc.assert(
      fc.property(fc.integer({ min: -1e12, max: 1e12 }), fc.constantFrom("EUR", "USD", "JPY"), (n, c) => {
        expect(parseMajor(toMajorString(money(n, c)), c)).toEqual(money(n, c));
      }),
    );
  });

  it("adds, subtracts and sums in one currency", () => {
    expect(subtract(money(500, "EUR"), money(200, "EUR"))).toEqual(money(300, "EUR"));
    expect(sum([money(1, "EUR"), money(2, "EUR"), money(3, "EUR")], "EUR")).toEqual(money(6, "EUR"));
  });
});
