// Pickup harmonics: mode shapes |sin(nπx/L)| of an ideal string (Fletcher & Rossing ch. 2; SOURCES §2.9, §5.6).
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { harmonicWeightList, harmonicWeights, nearlyCancelled } from "@/lib/lutherie/pickups";

describe("pickup harmonic weights", () => {
  it("a pickup at the midpoint of the string cancels the even harmonics (physics fact of the trade)", () => {
    const w = harmonicWeights(324, 648);
    for (const { n, weight } of w) {
      if (n % 2 === 0) expect(weight, `n=${n}`).toBeLessThan(1e-12);
      else expect(weight, `n=${n}`).toBeCloseTo(1, 12);
    }
    expect(nearlyCancelled(harmonicWeightList(324, 648))).toEqual([2, 4, 6, 8, 10, 12, 14, 16]);
  });

  it("has nodes at x/L = k/n (SOURCES §2.9)", () => {
    for (let n = 1; n <= 16; n++) {
      for (let k = 1; k < n; k++) expect(harmonicWeights((k / n) * 648, 648)[n - 1]!.weight).toBeLessThan(1e-12);
    }
  });

  it("matches |sin(nπx/L)| term by term, is symmetric w_n(x) = w_n(L − x), and stays in [0, 1] (SOURCES §5.6)", () => {
    fc.assert(
      fc.property(fc.double({ min: 200, max: 1300, noNaN: true }), fc.double({ min: 0.001, max: 0.999, noNaN: true }), (L, r) => {
        const x = r * L;
        const w = harmonicWeightList(x, L);
        const mirrored = harmonicWeightList(L - x, L);
        w.forEach((weight, k) => {
          expect(weight).toBeCloseTo(Math.abs(Math.sin(((k + 1) * Math.PI * x) / L)), 12);
          expect(weight).toBeCloseTo(mirrored[k]!, 12);
          expect(weight).toBeGreaterThanOrEqual(0);
          expect(weight).toBeLessThanOrEqual(1 + 1e-12);
        });
      }),
    );
  });
});
