// computeSpec: the whole result for a spec, its issues, and the promise that nothing the schema accepts throws.
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { rel } from "./close";
import { computeSpec } from "@/lib/lutherie/compute-spec";
import { midiToFrequency } from "@/lib/lutherie/pitch";
import { presetById, PRESETS } from "@/lib/lutherie/presets";
import { convertSpecUnits } from "@/lib/lutherie/spec-units";
import { instrumentSpecSchema, type InstrumentSpec } from "@/lib/schemas/instrument-spec";
import { specArbitrary } from "./spec-arbitrary";

const parse = (s: unknown) => instrumentSpecSchema.parse(s);
const six = (): InstrumentSpec => structuredClone(presetById("six").spec);

describe("presets", () => {
  it.each(PRESETS.map((p) => [p.id, p] as const))("%s passes the schema and computes without errors", (_id, p) => {
    const r = computeSpec(parse(p.spec));
    expect(r.issues.filter((i) => i.level === "error")).toEqual([]);
    expect(r.frets).toHaveLength(p.spec.frets + 1);
    expect(r.strings).toHaveLength(p.spec.strings.length);
    expect(r.totals.tensionN).toBeCloseTo(r.strings.reduce((s, x) => s + x.tensionN, 0), 9);
  });

  it("are our own even-tension sets: every string within 10 % of the set's mean (invented, see presets.ts)", () => {
    for (const p of PRESETS) {
      const r = computeSpec(parse(p.spec));
      const mean = r.totals.tensionN / r.strings.length;
      for (const s of r.strings) expect(Math.abs(s.tensionN - mean) / mean, `${p.id} ${s.note}`).toBeLessThan(0.1);
    }
  });
});

describe("a single-scale 6-string", () => {
  const r = computeSpec(parse(six()));

  it("has the nut as frets[0] and fret 12 at L/2 on both edges (12-TET identity)", () => {
    expect(r.frets[0]!.fromNut).toEqual({ bass: 0, treble: 0 });
    expect(r.frets[12]!.fromNut.bass).toBeCloseTo(324, 12);
    expect(r.frets[12]!.toSaddle.treble).toBeCloseTo(324, 12);
    expect(r.scale.multiScale).toBe(false);
    expect(r.frets.every((f) => f.offset === 0 && f.angleDeg === 0)).toBe(true);
  });

  it("recomputes string 1 (0.010 in plain E4, 648 mm) by hand: T = ρ·π/4·d²·(2Lf)²", () => {
    const d = 0.01 * 0.0254;
    const T = ((7850 * Math.PI * d * d) / 4) * (2 * 0.648 * midiToFrequency(64)) ** 2;
    expect(rel(r.strings[0]!.tensionN, T)).toBeLessThan(1e-12);
    expect(r.strings[0]!.tensionLbf).toBeCloseTo(T / 4.4482216152605, 9);
    expect(r.strings[0]!.unitWeightSource).toBe("model");
  });

  it("states its models and records the constants it used (SOURCES §3: store the constant used)", () => {
    expect(r.constants.steelDensityKgM3).toBe(7850);
    expect(r.constants.stressErrorPercent).toBe(80);
    expect(r.model.inharmonicity).toMatch(/clamped-end factor is not applied/);
    expect(r.model.saddleMove).toMatch(/Model B/);
  });

  it("gives the same physics in inches, with lengths in inches", () => {
    const inches = computeSpec(parse(convertSpecUnits(six(), "in")));
    expect(inches.units).toBe("in");
    expect(inches.frets[12]!.fromNut.bass).toBeCloseTo(324 / 25.4, 3);
    inches.strings.forEach((s, i) => expect(rel(s.tensionN, r.strings[i]!.tensionN)).toBeLessThan(1e-4));
  });
});

describe("a fanned 8-string", () => {
  const spec = parse(presetById("fanned-eight").spec);
  const r = computeSpec(spec);

  it("gives each string its own length, interpolated from treble (string 1) to bass", () => {
    expect(r.strings[0]!.scaleLength).toBeCloseTo(647.7, 9);
    expect(r.strings[7]!.scaleLength).toBeCloseTo(711.2, 9);
    expect(r.pickups[0]!.perString[7]!.vibratingLength).toBeCloseTo(711.2, 9);
  });

  it("squares the perpendicular fret and slants the nut toward the head on the bass side", () => {
    expect(r.frets[8]!.angleDeg).toBeCloseTo(0, 9);
    expect(r.frets[0]!.angleDeg!).toBeLessThan(0);
    expect(r.frets[27]!.angleDeg!).toBeGreaterThan(0);
    expect(r.frets[12]!.fromNut.bass).toBeCloseTo(355.6, 9);
    expect(r.frets[12]!.fromNut.treble).toBeCloseTo(323.85, 9);
  });
});

describe("issues", () => {
  const codes = (s: InstrumentSpec) => computeSpec(parse(s)).issues.map((i) => `${i.level}:${i.code}:${i.path}`);

  it("flags a plain string tuned near its breaking stress as an error (ASTM A228; 80 % is a common-practice margin)", () => {
    const s = six();
    s.strings[0]!.note = "A4"; // a fourth above E4 on 648 mm: σ = ρ(2Lf)² ≈ 96 % of 387 ksi
    expect(codes(s)).toContain("error:stress_too_high:strings.0.gaugeIn");
    s.strings[0]!.note = "F#4"; // ≈ 68 %
    s.scale = { bass: 660, treble: 660, perpendicularFret: 0 }; // ≈ 70.6 %
    expect(codes(s)).toContain("warning:stress_high:strings.0.gaugeIn");
  });

  it("labels tension outside the usual range as common practice", () => {
    const s = six();
    s.strings[5]!.gaugeIn = 0.03; // much too light for E2
    const r = computeSpec(parse(s));
    const low = r.issues.find((i) => i.code === "tension_low");
    expect(low).toMatchObject({ level: "warning", path: "strings.5.gaugeIn" });
    expect(low!.message).toMatch(/common-practice/);
    expect(r.issues.some((i) => i.code === "tension_jump" && i.path === "strings.5.gaugeIn")).toBe(true);
  });

  it("warns about a pickup that nearly cancels the 2nd harmonic (|sin(2π·½)| = 0)", () => {
    const s = six();
    s.frets = 10;
    s.pickups = [{ label: "Middle of the string", fromBridge: 324 }];
    expect(codes(s)).toContain("warning:pickup_cancels_harmonic:pickups.0.fromBridge");
  });

  it("rejects a pickup under the frets and frets that do not fit", () => {
    const s = six();
    s.pickups = [{ label: "Too far", fromBridge: 200 }]; // fret 22 is 181.8 mm from the saddle
    expect(codes(s)).toContain("error:pickup_under_fretboard:pickups.0.fromBridge");
    const t = six();
    t.scale = { bass: 200, treble: 200, perpendicularFret: 0 };
    t.frets = 36; // the last gap is 1.49 mm, less than a 2.5 mm fret crown
    t.pickups = [];
    expect(codes(t)).toContain("error:frets_do_not_fit:frets");
  });

  it("lets a measured unit weight override the model, and a constant override change the figures", () => {
    const s = six();
    s.strings[0]!.unitWeightKgPerM = 4e-4;
    const r = computeSpec(parse(s));
    expect(r.strings[0]!.unitWeightSource).toBe("entered");
    expect(r.strings[0]!.unitWeightKgPerM).toBe(4e-4);
    const t = six();
    t.constants = { steelDensityKgM3: 7850 * 1.1 };
    expect(rel(computeSpec(parse(t)).strings[0]!.tensionN, computeSpec(parse(six())).strings[0]!.tensionN * 1.1)).toBeLessThan(1e-12);
  });

  it("notices strings out of order", () => {
    const s = six();
    s.strings.reverse();
    expect(codes(s).some((c) => c.startsWith("warning:pitch_order"))).toBe(true);
  });
});

describe("robustness (fast-check)", () => {
  function everyNumberFinite(value: unknown, path = "result"): void {
    if (typeof value === "number") expect(Number.isFinite(value), path).toBe(true);
    else if (Array.isArray(value)) value.forEach((v, i) => everyNumberFinite(v, `${path}.${i}`));
    else if (value && typeof value === "object") for (const [k, v] of Object.entries(value)) everyNumberFinite(v, `${path}.${k}`);
  }

  it("never throws for a spec the schema accepts, and every figure is a finite number", () => {
    let accepted = 0;
    fc.assert(
      fc.property(specArbitrary, (raw) => {
        const parsed = instrumentSpecSchema.safeParse(raw);
        if (!parsed.success) return;
        accepted++;
        const r = computeSpec(parsed.data);
        everyNumberFinite(r);
        for (const i of r.issues) expect(["error", "warning"]).toContain(i.level);
      }),
      { numRuns: 400 },
    );
    expect(accepted).toBeGreaterThan(40); // the property must see real specs, not only rejections
  });

  it("the schema itself never throws, whatever it is given", () => {
    fc.assert(
      fc.property(fc.anything(), (x) => {
        instrumentSpecSchema.safeParse(x);
      }),
    );
  });
});
