// Setup helpers: pull test statics, model-B saddle move, stiff-string inharmonicity (SOURCES §2.8, §2.10, §2.11, §5.5, §5.7, §5.8).
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { rel } from "./close";
import { centsBetween } from "@/lib/lutherie/pitch";
import {
  clampedEndFactor,
  inharmonicityCoefficient,
  octaveErrorCents,
  partialFrequency,
  partialSharpnessCents,
  pullTestTension,
  saddleMoveForCents,
} from "@/lib/lutherie/setup";


describe("pull test: T = F/(2 sin θ), θ = atan(2δ/S) (statics of a point load, any mechanics text)", () => {
  it("recovers the force exactly: T(θ) · 2 sin θ = F", () => {
    fc.assert(
      fc.property(fc.double({ min: 0.5, max: 50, noNaN: true }), fc.double({ min: 0.1, max: 20, noNaN: true }), (F, delta) => {
        const p = pullTestTension(F, delta, 600);
        expect(rel(p.tensionN * 2 * Math.sin(p.angleRad), F)).toBeLessThan(1e-12);
      }),
    );
  });

  it("tends to the small-angle form F·S/(4δ) as δ → 0 [derived here]", () => {
    const big = pullTestTension(5, 10, 600);
    const small = pullTestTension(5, 0.01, 600);
    expect(rel(small.tensionN, small.smallAngleTensionN)).toBeLessThan(1e-6);
    expect(rel(big.tensionN, big.smallAngleTensionN)).toBeGreaterThan(rel(small.tensionN, small.smallAngleTensionN));
  });
});

describe("saddle move from a 12th-fret cents error, model B (SOURCES §2.10) [derived here]", () => {
  it("restores the octave exactly after the move: k(L + Δ)/(L/2 + Δ) = 2", () => {
    fc.assert(
      fc.property(fc.double({ min: 300, max: 900, noNaN: true }), fc.double({ min: -50, max: 50, noNaN: true }), (L, c) => {
        const d = saddleMoveForCents(L, c);
        const k = 2 ** (c / 1200);
        expect((k * (L + d)) / (L / 2 + d)).toBeCloseTo(2, 10);
      }),
    );
  });

  it("moves the saddle away from the nut for a sharp note and toward it for a flat one, about twice model A", () => {
    expect(saddleMoveForCents(648, 5)).toBeGreaterThan(0);
    expect(saddleMoveForCents(648, -5)).toBeLessThan(0);
    const modelA = (648 / 2) * (2 ** (5 / 1200) - 1); // SOURCES §2.10 model A, for comparison only
    expect(saddleMoveForCents(648, 5) / modelA).toBeCloseTo(2, 1);
    // Small-cents approximation Δ ≈ (c·ln2/1200)·L.
    expect(rel(saddleMoveForCents(648, 1), (Math.LN2 / 1200) * 648)).toBeLessThan(1e-3);
  });

  it("measures the error as 1200·log2(f_12 / 2f_open)", () => {
    expect(octaveErrorCents(110, 220)).toBeCloseTo(0, 12);
    expect(octaveErrorCents(110, 221)).toBeCloseTo(centsBetween(220, 221), 12);
  });
});

describe("inharmonicity of a stiff string, pinned ends: B = π³Ed⁴/(64TL²) (Fletcher & Rossing ch. 2)", () => {
  it("vanishes as E → 0 or d → 0 and scales as d⁴/(T L²) (SOURCES §5.8)", () => {
    const B = inharmonicityCoefficient(200e9, 2.54e-4, 72.5, 0.6477);
    expect(inharmonicityCoefficient(0, 2.54e-4, 72.5, 0.6477)).toBe(0);
    expect(inharmonicityCoefficient(200e9, 1e-9, 72.5, 0.6477)).toBeLessThan(1e-20);
    expect(rel(inharmonicityCoefficient(200e9, 5.08e-4, 72.5, 0.6477), 16 * B)).toBeLessThan(1e-12);
    expect(rel(inharmonicityCoefficient(200e9, 2.54e-4, 145, 0.6477), B / 2)).toBeLessThan(1e-12);
    expect(rel(inharmonicityCoefficient(200e9, 2.54e-4, 72.5, 1.2954), B / 4)).toBeLessThan(1e-12);
  });

  it("gives f_n/(n f0) = sqrt(1 + B n²), and a clamped-end factor above 1 kept separate", () => {
    const B = 1e-4;
    for (let n = 1; n <= 16; n++) expect(partialFrequency(100, B, n) / (n * 100)).toBeCloseTo(Math.sqrt(1 + B * n * n), 12);
    expect(partialSharpnessCents(B, 10)).toBeCloseTo(1200 * Math.log2(Math.sqrt(1.01)), 12);
    expect(clampedEndFactor(B)).toBeCloseTo(1 + (2 * 0.01) / Math.PI + (4 * B) / Math.PI ** 2, 12);
    expect(clampedEndFactor(0)).toBe(1);
  });
});
