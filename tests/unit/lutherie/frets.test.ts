// Fret positions: 12-TET textbook identities, the rule-of-18 comparison and fast-check properties.
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { fretDistance, fretDistances, fretSpacing, fretToSaddle, MAX_FRETS, ruleOf18CentsError, ruleOf18Distance, TWELVE_TET_DIVISOR } from "@/lib/lutherie/frets";

const scales = [300, 628.65, 647.7, 648, 863.6, 25.5, 34];

describe("12-TET fret rule d_n = L(1 − 2^(−n/12)) (SOURCES §2.2)", () => {
  it("puts fret 12 at L/2 and fret 24 at 3L/4, in any unit (textbook identity, SOURCES §5.2)", () => {
    for (const L of scales) {
      expect(fretDistance(L, 12)).toBeCloseTo(L / 2, 12);
      expect(fretDistance(L, 24)).toBeCloseTo((3 * L) / 4, 12);
      expect(fretDistance(L, 0)).toBe(0);
    }
  });

  it("shrinks the remaining length by 2^(1/12) per fret (textbook identity, SOURCES §5.2)", () => {
    for (const L of scales) {
      for (let n = 0; n < MAX_FRETS; n++) {
        expect((L - fretDistance(L, n)) / (L - fretDistance(L, n + 1))).toBeCloseTo(2 ** (1 / 12), 12);
      }
    }
  });

  it("puts fret 1 at L/K with K = 1/(1 − 2^(−1/12)) ≈ 17.817 (derived, SOURCES §2.2)", () => {
    expect(TWELVE_TET_DIVISOR).toBeCloseTo(17.817, 3);
    for (const L of scales) expect(fretDistance(L, 1)).toBeCloseTo(L / TWELVE_TET_DIVISOR, 12);
  });

  it("gives fractional frets (a perpendicular fret of 7.5) by the same rule", () => {
    expect(fretDistance(648, 7.5)).toBeCloseTo(648 * (1 - 2 ** (-7.5 / 12)), 12);
    expect(fretToSaddle(648, 7.5) + fretDistance(648, 7.5)).toBeCloseTo(648, 12);
  });
});

describe("the historical rule of 18 (Mottola, American Lutherie #130; SOURCES §2.2)", () => {
  it("places every fret short of the 12-TET position, so every fretted note is flat", () => {
    const L = 648;
    for (let n = 1; n <= MAX_FRETS; n++) expect(ruleOf18Distance(L, n)).toBeLessThan(fretDistance(L, n));
    // Each fret at 1/18 of the remaining length: d_1 = L/18.
    expect(ruleOf18Distance(L, 1)).toBeCloseTo(L / 18, 12);
  });

  it("has a pitch error that grows with the fret number, about 1.05 cents flat per fret [derived here]", () => {
    const L = 648;
    let last = 0;
    for (let n = 1; n <= MAX_FRETS; n++) {
      // The pitch of the rule-of-18 fret against the 12-TET fret, from the remaining lengths (Mersenne: f ∝ 1/L).
      const cents = 1200 * Math.log2(fretToSaddle(L, n) / (L - ruleOf18Distance(L, n)));
      expect(cents).toBeCloseTo(ruleOf18CentsError(n), 9);
      expect(Math.abs(cents)).toBeGreaterThan(last);
      last = Math.abs(cents);
    }
    expect(ruleOf18CentsError(12)).toBeCloseTo(-12.545, 3);
  });
});

describe("properties (fast-check)", () => {
  const scale = fc.double({ min: 100, max: 1500, noNaN: true });
  const count = fc.integer({ min: 1, max: MAX_FRETS });

  it("frets strictly increase and stay below L", () => {
    fc.assert(
      fc.property(scale, count, (L, N) => {
        const d = fretDistances(L, N);
        for (let i = 0; i < d.length; i++) {
          expect(d[i]!).toBeLessThan(L);
          if (i > 0) expect(d[i]!).toBeGreaterThan(d[i - 1]!);
        }
      }),
    );
  });

  it("spacings shrink toward the bridge and add up to the position", () => {
    fc.assert(
      fc.property(scale, count, (L, N) => {
        let sum = 0;
        for (let n = 1; n <= N; n++) {
          sum += fretSpacing(L, n);
          if (n > 1) expect(fretSpacing(L, n)).toBeLessThan(fretSpacing(L, n - 1));
        }
        expect(sum).toBeCloseTo(fretDistance(L, N), 9);
      }),
    );
  });
});
