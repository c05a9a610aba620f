// fast-check generator of instrument specs: mostly inside the schema's limits, sometimes beyond
// (about one value in twenty), so properties see both accepted and rejected specs.
import fc from "fast-check";
import { CONSTRUCTIONS } from "@/lib/schemas/instrument-spec";

/** A double in [min, max] nineteen times in twenty, else anywhere in [outMin, outMax]. */
const mostly = (min: number, max: number, outMin: number, outMax: number) =>
  fc.oneof(
    { weight: 19, arbitrary: fc.double({ min, max, noNaN: true }) },
    { weight: 1, arbitrary: fc.double({ min: outMin, max: outMax, noNaN: true }) },
  );

const letters = ["C", "D", "E", "F", "G", "A", "B"];
const note = fc.oneof(
  { weight: 30, arbitrary: fc.tuple(fc.constantFrom(...letters), fc.constantFrom("", "#", "b"), fc.integer({ min: -1, max: 9 })).map(([l, a, o]) => `${l}${a}${o}`) },
  { weight: 1, arbitrary: fc.string({ maxLength: 4 }) },
);

const stringSpec = fc
  .record(
    {
      note,
      gaugeIn: mostly(0.004, 0.25, 0, 0.4),
      construction: fc.constantFrom(...CONSTRUCTIONS),
      coreFraction: mostly(0.1, 0.95, 0.01, 1.5),
      coreShape: fc.constantFrom("hex" as const, "round" as const),
      unitWeightKgPerM: mostly(1e-5, 0.2, 0, 0.5),
    },
    { requiredKeys: ["note", "gaugeIn", "construction"] },
  )
  .map(({ coreFraction, ...s }) => ({ ...s, coreIn: coreFraction === undefined ? undefined : Math.max(0.002, s.gaugeIn * coreFraction) }));

export const specArbitrary = fc
  .record({
    units: fc.constantFrom("mm" as const, "in" as const),
    family: fc.option(fc.constantFrom("guitar" as const, "bass" as const), { nil: undefined }),
    bass: mostly(200, 1300, 100, 1500),
    treble: mostly(200, 1300, 100, 1500),
    perpendicularShare: fc.double({ min: 0, max: 1.05, noNaN: true }),
    frets: fc.oneof({ weight: 19, arbitrary: fc.integer({ min: 1, max: 36 }) }, { weight: 1, arbitrary: fc.integer({ min: -1, max: 40 }) }),
    referencePitchHz: mostly(400, 480, 300, 600),
    widths: fc.option(fc.tuple(mostly(10, 200, 1, 300), mostly(10, 200, 1, 300)), { nil: undefined }),
    strings: fc.array(stringSpec, { minLength: 1, maxLength: 12 }),
    pickups: fc.array(
      fc.record({
        label: fc.oneof({ weight: 19, arbitrary: fc.string({ minLength: 1, maxLength: 8 }).filter((s) => s.trim().length > 0) }, { weight: 1, arbitrary: fc.constant("") }),
        share: mostly(0.01, 0.99, 0.001, 1.2),
        trebleShare: fc.option(mostly(0.01, 0.99, 0.001, 1.2), { nil: undefined }),
      }),
      { maxLength: 6 },
    ),
    constants: fc.option(
      fc.record(
        {
          steelDensityKgM3: mostly(1000, 20000, 100, 30000),
          wrapDensityKgM3: mostly(1000, 25000, 100, 30000),
          stressErrorPercent: mostly(1, 100, 0, 150),
          tensionHighN: mostly(1, 2000, 0, 3000),
          nearNullWeight: mostly(0.001, 0.5, 0, 1),
          defaultCoreFraction: mostly(0.1, 0.9, 0, 1),
          fretCrownWidthMm: mostly(0.5, 6, 0, 10),
        },
        { requiredKeys: [] },
      ),
      { nil: undefined },
    ),
  })
  .map((r) => {
    const k = r.units === "in" ? 1 / 25.4 : 1;
    const bass = r.bass * k;
    const treble = r.treble * k;
    return {
      units: r.units,
      family: r.family,
      scale: { bass, treble, perpendicularFret: Math.round(r.perpendicularShare * r.frets * 2) / 2 },
      frets: r.frets,
      referencePitchHz: r.referencePitchHz,
      nutWidth: r.widths ? r.widths[0] * k : undefined,
      lastFretWidth: r.widths ? r.widths[1] * k : undefined,
      strings: r.strings,
      pickups: r.pickups.map((p) => ({
        label: p.label,
        fromBridge: p.share * Math.min(bass, treble) * 0.3,
        fromBridgeTreble: p.trebleShare === undefined ? undefined : p.trebleShare * Math.min(bass, treble) * 0.3,
      })),
      constants: r.constants,
    };
  });
