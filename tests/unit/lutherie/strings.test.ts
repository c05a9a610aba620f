// Strings: handbook constants, ASTM A228, Mersenne/Taylor physics facts and the round-wound model.
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { rel } from "./close";
import { ASTM_A228_TABLE, musicWireMinStrength, STEEL_DENSITY_KG_M3, STEEL_YOUNG_MODULUS_PA, WRAP_MATERIALS } from "@/lib/lutherie/materials";
import { midiToFrequency } from "@/lib/lutherie/pitch";
import {
  coreArea,
  coreStress,
  frequencyFromTension,
  gaugeToM,
  plainUnitWeight,
  roundWoundUnitWeight,
  tension,
  waveSpeed,
} from "@/lib/lutherie/strings";
import { ksiToPa, N_PER_LBF } from "@/lib/lutherie/units";


describe("handbook constants (SOURCES §3)", () => {
  it("steel is 7850 kg/m³ with E = 200 GPa (spring-design tables [handbook]; 200 GPa round value from memory)", () => {
    expect(STEEL_DENSITY_KG_M3).toBe(7850);
    expect(STEEL_YOUNG_MODULUS_PA).toBe(200e9);
    expect(WRAP_MATERIALS["pure-nickel"].densityKgM3).toBe(8908); // CRC handbook [from memory; confirmed 8.90–8.908 g/cm³]
    expect(WRAP_MATERIALS["nickel-plated-steel"].densityKgM3).toBe(7850); // plating negligible [derived here]
  });
});

describe("music wire tensile strength, ASTM A228/A228M Table 1 (SOURCES §2.7)", () => {
  it("holds the tabulated minimums (ksi) at the tabulated diameters", () => {
    const expected: [number, number][] = [
      [0.008, 399], [0.009, 393], [0.01, 387], [0.011, 382], [0.012, 377], [0.013, 373], [0.014, 369],
      [0.015, 365], [0.016, 362], [0.018, 356], [0.02, 350], [0.022, 345], [0.024, 341], [0.026, 337],
    ];
    for (const [d, ksi] of expected) {
      const s = musicWireMinStrength(d);
      expect(s.minKsi, `${d} in`).toBe(ksi);
      expect(s.basis).toBe("tabulated");
    }
    // 387 ksi × 6.894757293 MPa/ksi (SOURCES §1) ≈ 2668.27 MPa.
    expect(musicWireMinStrength(0.01).minPa / 1e6).toBeCloseTo(2668.27, 1);
  });

  it("falls monotonically as the diameter grows (SOURCES §5.9)", () => {
    for (let i = 1; i < ASTM_A228_TABLE.length; i++) {
      expect(ASTM_A228_TABLE[i]!.minKsi).toBeLessThan(ASTM_A228_TABLE[i - 1]!.minKsi);
      expect(ASTM_A228_TABLE[i]!.maxKsi).toBeLessThan(ASTM_A228_TABLE[i - 1]!.maxKsi);
      expect(ASTM_A228_TABLE[i]!.minKsi).toBeLessThan(ASTM_A228_TABLE[i]!.maxKsi);
    }
    fc.assert(
      fc.property(fc.double({ min: 0.004, max: 0.06, noNaN: true }), fc.double({ min: 0.004, max: 0.06, noNaN: true }), (a, b) => {
        const [thin, thick] = a < b ? [a, b] : [b, a];
        expect(musicWireMinStrength(thick).minKsi).toBeLessThanOrEqual(musicWireMinStrength(thin).minKsi);
      }),
    );
  });

  it("uses the next larger tabulated diameter between rows, the conservative choice SOURCES §2.7 offers", () => {
    expect(musicWireMinStrength(0.017)).toMatchObject({ minKsi: 356, tableDiameterIn: 0.018, basis: "next-larger-diameter" });
    expect(musicWireMinStrength(0.006)).toMatchObject({ minKsi: 399, basis: "below-table" });
    expect(musicWireMinStrength(0.04)).toMatchObject({ minKsi: 337, basis: "above-table" });
  });
});

describe("plain steel tension recomputed by hand: 0.010 in E4 on a 25.5 in scale at A4 = 440 Hz", () => {
  // By hand, with SOURCES §1 exact factors:
  //   d = 0.010 × 0.0254 = 2.54e-4 m;  A = π/4 · d² = 5.0671e-8 m²;  μ = 7850 × A = 3.97765e-4 kg/m
  //   f(E4) = 440 · 2^(−5/12) = 329.628 Hz;  L = 25.5 × 0.0254 = 0.6477 m;  2Lf = 427.000 m/s
  //   T = μ (2Lf)² = 3.97765e-4 × 182 329 = 72.524 N = 72.524 / 4.44822 = 16.304 lbf
  //   σ = T / A = 1431.3 MPa = 207.59 ksi = 53.64 % of 387 ksi (A228, 0.010 in)
  const d = gaugeToM(0.01);
  const mu = plainUnitWeight(d, 7850);
  const f = midiToFrequency(64, 440);
  const T = tension(mu, 0.6477, f);

  it("matches the hand figures step by step", () => {
    expect(d).toBeCloseTo(2.54e-4, 12);
    expect(rel(Math.PI / 4 * d * d, 5.0671e-8)).toBeLessThan(1e-4);
    expect(rel(mu, 3.97765e-4)).toBeLessThan(1e-5);
    expect(f).toBeCloseTo(329.628, 3);
    expect(2 * 0.6477 * f).toBeCloseTo(427.0, 3);
    expect(T).toBeCloseTo(72.524, 3);
    expect(T / N_PER_LBF).toBeCloseTo(16.304, 3);
    const s = coreStress(T, d, "round", f);
    expect(s.stressPa / 1e6).toBeCloseTo(1431.3, 1);
    expect(s.percentOfMinimum).toBeCloseTo(53.64, 2);
  });

  it("has a stress ρ(2Lf)² independent of the diameter (SOURCES §2.7)", () => {
    for (const g of [0.008, 0.012, 0.017]) {
      const dd = gaugeToM(g);
      const s = coreStress(tension(plainUnitWeight(dd, 7850), 0.6477, f), dd, "round", f);
      expect(rel(s.stressPa, 7850 * (2 * 0.6477 * f) ** 2)).toBeLessThan(1e-12);
    }
  });

  it("puts the breaking pitch at (1/2L)·sqrt(σ_min/ρ) (SOURCES §2.7)", () => {
    const s = coreStress(T, d, "round", f);
    expect(rel(s.breakingFrequencyHz, Math.sqrt(ksiToPa(387) / 7850) / (2 * 0.6477))).toBeLessThan(1e-12);
  });
});

describe("physics facts of the trade (ideal string, Mersenne's laws; Fletcher & Rossing ch. 2)", () => {
  const mu = 6.6e-3;
  const L = 0.6477;
  const T = 75;
  const v = waveSpeed(T, mu);
  const f1 = frequencyFromTension(T, mu, L);

  it("v = sqrt(T/μ)", () => expect(v).toBe(Math.sqrt(T / mu)));

  it("the fundamental's wavelength is twice the vibrating length and the second harmonic's equals it", () => {
    expect(v / f1).toBeCloseTo(2 * L, 12);
    expect(v / (2 * f1)).toBeCloseTo(L, 12);
  });

  it("f = sqrt(T/(4·L·M)) with M = μL, the mass of the vibrating length, equals (1/2L)·sqrt(T/μ)", () => {
    const M = mu * L;
    expect(rel(Math.sqrt(T / (4 * L * M)), f1)).toBeLessThan(1e-12);
  });

  it("T = μ(2Lf)² inverts f = (1/2L)·sqrt(T/μ)", () => expect(rel(tension(mu, L, f1), T)).toBeLessThan(1e-12));
});

describe("Mersenne scaling laws (SOURCES §2.4, §5.4), fast-check", () => {
  const mu = fc.double({ min: 1e-4, max: 0.05, noNaN: true });
  const L = fc.double({ min: 0.2, max: 1.3, noNaN: true });
  const f = fc.double({ min: 20, max: 1500, noNaN: true });

  it("tension scales with the square of frequency and of length", () => {
    fc.assert(
      fc.property(mu, L, f, fc.double({ min: 0.25, max: 4, noNaN: true }), (m, l, ff, k) => {
        expect(rel(tension(m, l, ff * k), k * k * tension(m, l, ff))).toBeLessThan(1e-12);
        expect(rel(tension(m, l * k, ff), k * k * tension(m, l, ff))).toBeLessThan(1e-12);
      }),
    );
  });

  it("doubling L, or going an octave up, gives 4T; drop D gives 2^(−4/12) of the tension", () => {
    const T = tension(4e-3, 0.648, 82.4);
    expect(rel(tension(4e-3, 1.296, 82.4), 4 * T)).toBeLessThan(1e-12);
    expect(rel(tension(4e-3, 0.648, 164.8), 4 * T)).toBeLessThan(1e-12);
    const e2 = midiToFrequency(40);
    const d2 = midiToFrequency(38);
    expect(rel(tension(4e-3, 0.648, d2) / tension(4e-3, 0.648, e2), 2 ** (-4 / 12))).toBeLessThan(1e-12);
  });

  it("for a plain string, doubling d gives 4T with the same stress", () => {
    const f0 = 196;
    const d = gaugeToM(0.009);
    const T1 = tension(plainUnitWeight(d, 7850), 0.648, f0);
    const T2 = tension(plainUnitWeight(2 * d, 7850), 0.648, f0);
    expect(rel(T2, 4 * T1)).toBeLessThan(1e-12);
    expect(rel(T2 / coreArea(2 * d, "round"), T1 / coreArea(d, "round"))).toBeLessThan(1e-12);
  });
});

describe("idealised round-wound model (SOURCES §2.5) [derived here]", () => {
  it("adds a round core ρπd_c²/4 and a wrap ρ_w(π²/4)·d_w·(D_c + d_w)", () => {
    const outer = gaugeToM(0.046);
    const core = gaugeToM(0.018);
    const dw = (outer - core) / 2;
    const mu = roundWoundUnitWeight({ outerM: outer, coreM: core, coreShape: "round" }, 7850, 8908);
    expect(rel(mu.core, (7850 * Math.PI * core * core) / 4)).toBeLessThan(1e-12);
    expect(rel(mu.wrap, 8908 * (Math.PI ** 2 / 4) * dw * (core + dw))).toBeLessThan(1e-12);
    expect(mu.total).toBe(mu.core + mu.wrap);
  });

  it("takes a hex core by its across-corners width: area (3√3/8)s²", () => {
    const s = gaugeToM(0.02);
    expect(rel(coreArea(s, "hex"), ((3 * Math.sqrt(3)) / 8) * s * s)).toBeLessThan(1e-12);
    expect(coreArea(s, "hex")).toBeLessThan(coreArea(s, "round"));
  });

  it("weighs more than the core alone and less than a solid steel rod of the outer gauge with a steel wrap", () => {
    fc.assert(
      fc.property(fc.double({ min: 0.02, max: 0.15, noNaN: true }), fc.double({ min: 0.3, max: 0.7, noNaN: true }), (g, frac) => {
        const outer = gaugeToM(g);
        const mu = roundWoundUnitWeight({ outerM: outer, coreM: outer * frac, coreShape: "round" }, 7850, 7850);
        expect(mu.total).toBeGreaterThan(mu.core);
        // Round turns on a round core leave gaps, so the string is lighter than solid steel of its outer diameter.
        expect(mu.total).toBeLessThan(plainUnitWeight(outer, 7850));
      }),
    );
  });
});
