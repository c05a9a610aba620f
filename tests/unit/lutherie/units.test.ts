// Units: the exact factors of SOURCES §1 and round trips (SOURCES §5.10).
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import {
  convertLengthInput,
  formatLength,
  fromMm,
  kgPerMToLbPerIn,
  lbfToNewtons,
  lbPerInToKgPerM,
  MM_PER_IN,
  N_PER_LBF,
  newtonsToLbf,
  PA_PER_KSI,
  roundTo,
  toMm,
} from "@/lib/lutherie/units";

describe("exact conversion factors (SOURCES §1)", () => {
  it("1 in = 25.4 mm (international inch, 1959)", () => expect(MM_PER_IN).toBe(25.4));
  it("1 lbf = 0.45359237 kg × 9.80665 m/s² = 4.4482216152605 N (NIST SP 811)", () => expect(N_PER_LBF).toBeCloseTo(4.4482216152605, 13));
  it("1 ksi = 6.894757293 MPa and 1 lb/in = 17.857967 kg/m [derived here]", () => {
    expect(PA_PER_KSI / 1e6).toBeCloseTo(6.894757293, 8);
    expect(lbPerInToKgPerM(1)).toBeCloseTo(17.857967, 6);
  });
});

describe("round trips (fast-check)", () => {
  const v = fc.double({ min: 1e-6, max: 1e6, noNaN: true });
  // Relative checks: |back − x| / x within a few ulps.
  const same = (a: number, b: number) => Math.abs(a - b) / b < 1e-14;
  it("mm ↔ in", () => fc.assert(fc.property(v, (x) => same(fromMm(toMm(x, "in"), "in"), x) && same(toMm(fromMm(x, "in"), "in"), x))));
  it("N ↔ lbf", () => fc.assert(fc.property(v, (x) => same(lbfToNewtons(newtonsToLbf(x)), x))));
  it("kg/m ↔ lb/in", () => fc.assert(fc.property(v, (x) => same(lbPerInToKgPerM(kgPerMToLbPerIn(x)), x))));
  it("a typed length converted mm → in → mm moves by less than 0.002 mm", () => {
    fc.assert(
      fc.property(fc.double({ min: 1, max: 2000, noNaN: true }), (mm) => {
        const typed = roundTo(mm, 2);
        const back = convertLengthInput(convertLengthInput(typed, "mm", "in"), "in", "mm");
        expect(Math.abs(back - typed)).toBeLessThanOrEqual(0.002 + 1e-9);
      }),
    );
  });
});

describe("display rounding (one place)", () => {
  it("shows 0.01 mm or 0.001 in, without a negative zero", () => {
    expect(formatLength(324, "mm")).toBe("324.00");
    expect(formatLength(647.7, "in")).toBe("25.500");
    expect(formatLength(-0.0001, "mm")).toBe("0.00");
  });
});
