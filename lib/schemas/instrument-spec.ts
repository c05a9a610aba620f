// THE instrument spec: the body of POST /api/compute, the calculator form's value and (later) the
// object stored in a commission's spec versions. Lengths are in `units`; gauges are always inches,
// as the trade gives them. Strings run from string 1 (highest pitch) down. `scale.bass ==
// scale.treble` is a single-scale neck. The schema checks shape and ranges (→ 422 with paths);
// what only the computation can judge (stress, fit, harmonics) comes back as `issues`.
import { z } from "zod";
import { parseNote, REFERENCE_PITCH_RANGE_HZ } from "@/lib/lutherie/pitch";
import { MAX_FRETS, MIN_FRETS } from "@/lib/lutherie/frets";
import { toMm, type LengthUnit } from "@/lib/lutherie/units";
import { CONSTRUCTIONS, CORE_SHAPES, FAMILIES, LENGTH_UNITS, type Construction } from "./instrument-spec-values";

export { CONSTRUCTION_LABELS, CONSTRUCTIONS, CORE_SHAPES, FAMILIES, LENGTH_UNITS, type Construction } from "./instrument-spec-values";

/** Limits, in millimetres where they are lengths (checked after converting from `units`). */
export const SPEC_LIMITS = {
  scaleMm: { min: 200, max: 1300 },
  widthMm: { min: 10, max: 200 },
  pickupMm: { min: 1, max: 1300 },
  gaugeIn: { min: 0.004, max: 0.25 },
  unitWeightKgPerM: { min: 1e-5, max: 0.2 },
  strings: { min: 1, max: 12 },
  pickups: { max: 6 },
  frets: { min: MIN_FRETS, max: MAX_FRETS },
  referencePitchHz: REFERENCE_PITCH_RANGE_HZ,
} as const;

const num = (what: string) => z.number({ error: `${what} must be a number` });
const range = (what: string, min: number, max: number, unit = "") =>
  num(what)
    .min(min, `${what} must be at least ${min}${unit}`)
    .max(max, `${what} must be at most ${max}${unit}`);

export const stringSpecSchema = z
  .object({
    note: z
      .string({ error: "Note must be text such as E4, F#1 or Bb2" })
      .trim()
      .refine((s) => parseNote(s) !== null, "Note must be a pitch such as E4, F#1 or Bb2 (octaves −1 to 9)"),
    gaugeIn: range("Gauge", SPEC_LIMITS.gaugeIn.min, SPEC_LIMITS.gaugeIn.max, " in"),
    construction: z.enum(CONSTRUCTIONS, { error: `Construction must be one of ${CONSTRUCTIONS.join(", ")}` }),
    /** Round-wound only: core diameter (round) or across-corners width (hex), inches. Ignored for plain steel. */
    coreIn: range("Core", 0.002, 0.2, " in").optional(),
    coreShape: z.enum(CORE_SHAPES, { error: "Core shape must be hex or round" }).optional(),
    /** A measured unit weight; when given it overrides the model. */
    unitWeightKgPerM: range("Unit weight", SPEC_LIMITS.unitWeightKgPerM.min, SPEC_LIMITS.unitWeightKgPerM.max, " kg/m").optional(),
  })
  .superRefine((s, ctx) => {
    if (s.construction !== "plain-steel" && s.coreIn !== undefined && s.coreIn >= s.gaugeIn) {
      ctx.addIssue({ code: "custom", path: ["coreIn"], message: "Core must be thinner than the string's gauge" });
    }
  });

export const pickupSpecSchema = z.object({
  label: z.string({ error: "Label must be text" }).trim().min(1, "Give the pickup a label").max(40, "Label: 40 characters at most"),
  /** Distance from the saddle along each string; the bass-edge string's when fromBridgeTreble is given. */
  fromBridge: num("Distance from the bridge").positive("Distance from the bridge must be above 0"),
  /** For a slanted pickup: the treble-edge string's distance; strings between are interpolated. */
  fromBridgeTreble: num("Treble-side distance").positive("Treble-side distance must be above 0").optional(),
});

/** Overrides of constants and common-practice thresholds; the result records the values used. */
export const specConstantsSchema = z.object({
  steelDensityKgM3: range("Steel density", 1000, 20000, " kg/m³").optional(),
  wrapDensityKgM3: range("Wrap density", 1000, 25000, " kg/m³").optional(),
  steelYoungModulusGPa: range("Young's modulus", 50, 400, " GPa").optional(),
  stressWarningPercent: range("Stress warning", 1, 100, " %").optional(),
  stressErrorPercent: range("Stress error", 1, 100, " %").optional(),
  tensionLowN: range("Low tension", 1, 2000, " N").optional(),
  tensionHighN: range("High tension", 1, 2000, " N").optional(),
  tensionJumpPercent: range("Tension jump", 1, 500, " %").optional(),
  nearNullWeight: range("Near-null weight", 0.001, 0.5).optional(),
  fretCrownWidthMm: range("Fret crown width", 0.5, 6, " mm").optional(),
  defaultCoreFraction: range("Core fraction", 0.1, 0.9).optional(),
});

function checkLength(ctx: z.RefinementCtx, path: (string | number)[], value: number | undefined, units: LengthUnit, lim: { min: number; max: number }, what: string) {
  if (value === undefined) return;
  const mm = toMm(value, units);
  if (mm < lim.min || mm > lim.max) {
    const shown = units === "in" ? `${(lim.min / 25.4).toFixed(2)}–${(lim.max / 25.4).toFixed(1)} in` : `${lim.min}–${lim.max} mm`;
    ctx.addIssue({ code: "custom", path, message: `${what} must be between ${shown}` });
  }
}

export const instrumentSpecSchema = z
  .object({
    name: z.string().trim().max(120, "Name: 120 characters at most").optional(),
    units: z.enum(LENGTH_UNITS, { error: 'Units must be "mm" or "in"' }),
    family: z.enum(FAMILIES, { error: 'Family must be "guitar" or "bass"' }).optional(),
    scale: z.object(
      {
        bass: num("Bass scale").positive("Bass scale must be above 0"),
        treble: num("Treble scale").positive("Treble scale must be above 0"),
        perpendicularFret: range("Perpendicular fret", 0, MAX_FRETS),
      },
      { error: "Scale must be an object {bass, treble, perpendicularFret}" },
    ),
    frets: num("Frets").int("Frets must be a whole number").min(MIN_FRETS, `Frets must be at least ${MIN_FRETS}`).max(MAX_FRETS, `Frets must be at most ${MAX_FRETS}`),
    referencePitchHz: range("Reference pitch", REFERENCE_PITCH_RANGE_HZ.min, REFERENCE_PITCH_RANGE_HZ.max, " Hz"),
    nutWidth: num("Nut width").positive("Nut width must be above 0").optional(),
    lastFretWidth: num("Width at the last fret").positive("Width at the last fret must be above 0").optional(),
    strings: z
      .array(stringSpecSchema, { error: "Strings must be a list" })
      .min(SPEC_LIMITS.strings.min, "Add at least one string")
      .max(SPEC_LIMITS.strings.max, `At most ${SPEC_LIMITS.strings.max} strings`),
    pickups: z.array(pickupSpecSchema, { error: "Pickups must be a list" }).max(SPEC_LIMITS.pickups.max, `At most ${SPEC_LIMITS.pickups.max} pickups`),
    constants: specConstantsSchema.optional(),
  })
  .superRefine((s, ctx) => {
    checkLength(ctx, ["scale", "bass"], s.scale.bass, s.units, SPEC_LIMITS.scaleMm, "Bass scale");
    checkLength(ctx, ["scale", "treble"], s.scale.treble, s.units, SPEC_LIMITS.scaleMm, "Treble scale");
    checkLength(ctx, ["nutWidth"], s.nutWidth, s.units, SPEC_LIMITS.widthMm, "Nut width");
    checkLength(ctx, ["lastFretWidth"], s.lastFretWidth, s.units, SPEC_LIMITS.widthMm, "Width at the last fret");
    if ((s.nutWidth === undefined) !== (s.lastFretWidth === undefined)) {
      const path = s.nutWidth === undefined ? "nutWidth" : "lastFretWidth";
      ctx.addIssue({ code: "custom", path: [path], message: "Give both the nut width and the width at the last fret, or neither" });
    }
    if (s.scale.perpendicularFret > s.frets) {
      ctx.addIssue({ code: "custom", path: ["scale", "perpendicularFret"], message: `Perpendicular fret must be between 0 and the last fret (${s.frets})` });
    }
    s.pickups.forEach((p, j) => {
      checkLength(ctx, ["pickups", j, "fromBridge"], p.fromBridge, s.units, SPEC_LIMITS.pickupMm, "Distance from the bridge");
      checkLength(ctx, ["pickups", j, "fromBridgeTreble"], p.fromBridgeTreble, s.units, SPEC_LIMITS.pickupMm, "Treble-side distance");
    });
    const c = s.constants;
    if (c?.stressWarningPercent !== undefined && c.stressErrorPercent !== undefined && c.stressWarningPercent > c.stressErrorPercent) {
      ctx.addIssue({ code: "custom", path: ["constants", "stressWarningPercent"], message: "The stress warning must not be above the stress error" });
    }
    if (c?.tensionLowN !== undefined && c.tensionHighN !== undefined && c.tensionLowN >= c.tensionHighN) {
      ctx.addIssue({ code: "custom", path: ["constants", "tensionLowN"], message: "Low tension must be below high tension" });
    }
  });

export type InstrumentSpec = z.infer<typeof instrumentSpecSchema>;
export type StringSpec = z.infer<typeof stringSpecSchema>;
export type PickupSpec = z.infer<typeof pickupSpecSchema>;
export type SpecConstants = z.infer<typeof specConstantsSchema>;
export type LengthUnits = InstrumentSpec["units"];
export type InstrumentFamilyName = (typeof FAMILIES)[number];

// ---- The result of computeSpec / POST /api/compute. Lengths in the spec's `units`. ----

export type IssueLevel = "error" | "warning";

/** Something the builder should know: errors are impossible or dangerous, warnings worth a look. */
export interface SpecIssue {
  level: IssueLevel;
  /** Where in the spec, dotted ("strings.0.gaugeIn"); "" for the spec as a whole. */
  path: string;
  /** Machine-readable kind, e.g. "stress_high", "tension_low", "pickup_cancels_harmonic". */
  code: string;
  message: string;
}

export interface BassTreble {
  bass: number;
  treble: number;
}

export interface FretRow {
  /** 0 is the nut. */
  n: number;
  fromNut: BassTreble;
  /** Distance from the previous fret (0 for the nut). */
  fromPrevious: BassTreble;
  toSaddle: BassTreble;
  /** Where the historical rule of 18 would put it, for comparison only. */
  ruleOf18FromNut: BassTreble;
  /** Pitch error of that rule-of-18 position, cents (negative = flat). */
  ruleOf18Cents: number;
  /** Bass-end y minus treble-end y along the centre line (0 on a single scale). */
  offset: number;
  /** Width between the edges at this fret; null without nutWidth/lastFretWidth. */
  width: number | null;
  /** End points: y toward the bridge from the perpendicular fret, x toward the bass edge from the centre line. */
  ends: { bass: { x: number; y: number }; treble: { x: number; y: number } } | null;
  length: number | null;
  /** Angle to the perpendicular, degrees; positive when the bass end lies toward the bridge. */
  angleDeg: number | null;
}

export interface StringRow {
  /** 1-based: string 1 is the highest. */
  string: number;
  note: string;
  midi: number;
  frequencyHz: number;
  /** This string's own vibrating length (interpolated on a fanned neck). */
  scaleLength: number;
  construction: Construction;
  gaugeIn: number;
  /** Core diameter or across-corners width used (in); equals the gauge for plain steel. */
  coreIn: number;
  coreShape: "hex" | "round";
  unitWeightKgPerM: number;
  unitWeightLbPerIn: number;
  unitWeightSource: "entered" | "model";
  tensionN: number;
  tensionLbf: number;
  stressMPa: number;
  /** ASTM A228 minimum for the core's diameter, MPa, and how it was read from the table. */
  coreMinStrengthMPa: number;
  strengthBasis: "tabulated" | "next-larger-diameter" | "below-table" | "above-table";
  stressPercentOfBreaking: number;
  /** Pitch at which the core reaches the A228 minimum: an upper bound, real strings fail lower. */
  breakingFrequencyHz: number;
  /** Stiff-string inharmonicity coefficient, pinned ends (clamped-end factor not applied). */
  inharmonicityB: number;
}

export interface HarmonicRow {
  n: number;
  weight: number;
}

export interface PickupStringRow {
  string: number;
  fromBridge: number;
  vibratingLength: number;
  /** x/L. */
  ratio: number;
  /** |sin(nπx/L)| for n = 1…16: weights[k] is harmonic n = k + 1. */
  weights: number[];
  nearlyCancelled: number[];
}

export interface PickupRow {
  label: string;
  /** At the centre line: mean of the edge distances over the mean scale (equals every string on a single scale with a straight pickup). */
  fromBridge: number;
  harmonics: HarmonicRow[];
  nearlyCancelled: number[];
  perString: PickupStringRow[];
}

export interface ResolvedConstants {
  steelDensityKgM3: number;
  /** Wrap densities by construction, after any override. */
  wrapDensityKgM3: Record<Exclude<Construction, "plain-steel">, number>;
  steelYoungModulusGPa: number;
  stressWarningPercent: number;
  stressErrorPercent: number;
  tensionLowN: number;
  tensionHighN: number;
  tensionJumpPercent: number;
  nearNullWeight: number;
  fretCrownWidthMm: number;
  defaultCoreFraction: number;
}

export interface ComputeResult {
  units: LengthUnits;
  family: InstrumentFamilyName;
  referencePitchHz: number;
  scale: { bass: number; treble: number; perpendicularFret: number; multiScale: boolean };
  /** frets[0] is the nut; frets[n] is fret n. */
  frets: FretRow[];
  strings: StringRow[];
  totals: { tensionN: number; tensionLbf: number };
  pickups: PickupRow[];
  constants: ResolvedConstants;
  /** The models behind the figures, in words, for anyone reading a stored result later. */
  model: { unitWeight: string; tension: string; stress: string; harmonics: string; inharmonicity: string; saddleMove: string };
  issues: SpecIssue[];
}
