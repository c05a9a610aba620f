// computeSpec: a validated instrument spec → every figure of the build math plus its issues.
// Pure: no I/O. Lengths are converted to mm on the way in and back to the spec's units on the way
// out; the physics runs in SI (metres, kilograms, newtons).
import type {
  ComputeResult,
  Construction,
  FretRow,
  InstrumentSpec,
  PickupRow,
  ResolvedConstants,
  SpecIssue,
  StringRow,
} from "@/lib/schemas/instrument-spec";
import { fretDistance, fretToSaddle, ruleOf18CentsError, ruleOf18Distance } from "./frets";
import { STEEL_DENSITY_KG_M3, STEEL_YOUNG_MODULUS_PA, WRAP_MATERIALS, type WrapMaterial } from "./materials";
import { fretGeometry, interpolatedScale, type EdgeScales } from "./multiscale";
import { harmonicWeightList, nearlyCancelled } from "./pickups";
import { midiToFrequency, noteToMidi } from "./pitch";
import {
  BASS_IF_STRING_ONE_BELOW_HZ,
  DEFAULT_CORE_FRACTION,
  DEFAULT_CORE_SHAPE,
  FRET_CROWN_WIDTH_MM,
  NEAR_NULL_WEIGHT,
  STRESS_ERROR_PERCENT,
  STRESS_WARNING_PERCENT,
  TENSION_JUMP_PERCENT,
  TENSION_RANGES_N,
  type InstrumentFamily,
} from "./practice";
import { inharmonicityCoefficient } from "./setup";
import { coreStress, equivalentRoundDiameter, gaugeToM, plainUnitWeight, roundWoundUnitWeight, tension } from "./strings";
import { forceUnitFor, formatForce, formatGaugeIn, formatLength, formatPercent, fromMm, kgPerMToLbPerIn, newtonsToLbf, toMm } from "./units";

/** Which wrap each wound construction uses (the core is always steel music wire). */
export const CONSTRUCTION_WRAP: Record<Exclude<Construction, "plain-steel">, WrapMaterial> = {
  "round-wound-nickel": "nickel-plated-steel",
  "round-wound-pure-nickel": "pure-nickel",
  "round-wound-stainless": "stainless-steel",
  "round-wound-phosphor-bronze": "phosphor-bronze",
  "round-wound-80-20-bronze": "bronze-80-20",
};

const WOUND = Object.entries(CONSTRUCTION_WRAP) as [keyof typeof CONSTRUCTION_WRAP, WrapMaterial][];

export const MODEL_NOTES: ComputeResult["model"] = {
  unitWeight:
    "Plain steel: solid round wire, μ = ρπd²/4. Round-wound: idealised steel core (hex by its across-corners width, or round) " +
    "plus one close-wound layer of round wrap wire on the core, μ_wrap = ρ_w(π²/4)·d_w·(D_c + d_w), helix angle neglected " +
    "(≈1 %); without a given core, a hex core of 45 % of the gauge (common practice, from memory). A measured unit weight overrides the model.",
  tension: "Ideal flexible string with fixed ends: T = μ(2Lf)² (Mersenne/Taylor); on a fanned neck each string's length is interpolated linearly between the edges.",
  stress: "Engineering stress on the core, T / core area, against the ASTM A228 Table 1 minimum for bare music wire of the core's diameter (next larger tabulated diameter between rows).",
  harmonics: "Raw mode-shape weights |sin(nπx/L)| of an ideal string at a point pickup x from the bridge; pluck position, aperture and electronics not applied.",
  inharmonicity: "Stiff string with pinned ends, B = π³Ed⁴/(64TL²), d the core (equal-area diameter for hex); the clamped-end factor is not applied.",
  saddleMove: "Model B: the saddle move lengthens both the open string and the fretted half and the open string is retuned, Δ = L(k − 1)/(2 − k), k = 2^(c/1200).",
};

function resolveConstants(spec: InstrumentSpec, family: InstrumentFamily): ResolvedConstants {
  const c = spec.constants ?? {};
  const ranges = TENSION_RANGES_N[family];
  const wrap = {} as ResolvedConstants["wrapDensityKgM3"];
  for (const [construction, material] of WOUND) wrap[construction] = c.wrapDensityKgM3 ?? WRAP_MATERIALS[material].densityKgM3;
  const steel = c.steelDensityKgM3 ?? STEEL_DENSITY_KG_M3;
  // Nickel-plated steel wrap follows the steel density unless the wrap is overridden.
  if (c.wrapDensityKgM3 === undefined) wrap["round-wound-nickel"] = steel;
  return {
    steelDensityKgM3: steel,
    wrapDensityKgM3: wrap,
    steelYoungModulusGPa: c.steelYoungModulusGPa ?? STEEL_YOUNG_MODULUS_PA / 1e9,
    stressWarningPercent: c.stressWarningPercent ?? Math.min(STRESS_WARNING_PERCENT, c.stressErrorPercent ?? STRESS_WARNING_PERCENT),
    stressErrorPercent: c.stressErrorPercent ?? Math.max(STRESS_ERROR_PERCENT, c.stressWarningPercent ?? STRESS_ERROR_PERCENT),
    tensionLowN: c.tensionLowN ?? ranges.slackBelow,
    tensionHighN: c.tensionHighN ?? ranges.highAbove,
    tensionJumpPercent: c.tensionJumpPercent ?? TENSION_JUMP_PERCENT,
    nearNullWeight: c.nearNullWeight ?? NEAR_NULL_WEIGHT,
    fretCrownWidthMm: c.fretCrownWidthMm ?? FRET_CROWN_WIDTH_MM,
    defaultCoreFraction: c.defaultCoreFraction ?? DEFAULT_CORE_FRACTION,
  };
}

/** guitar or bass: as given, else from string 1's pitch (see BASS_IF_STRING_ONE_BELOW_HZ). */
export function inferFamily(spec: InstrumentSpec): InstrumentFamily {
  if (spec.family) return spec.family;
  const midi = noteToMidi(spec.strings[0]?.note ?? "E4") ?? 64;
  return midiToFrequency(midi, spec.referencePitchHz) < BASS_IF_STRING_ONE_BELOW_HZ ? "bass" : "guitar";
}

/** Computes frets, strings, totals and pickups for a spec that passed instrumentSpecSchema. */
export function computeSpec(spec: InstrumentSpec): ComputeResult {
  const u = spec.units;
  // mm → output unit as one factor: a closure per call costs more than the arithmetic here.
  const out = fromMm(1, u);
  const issues: SpecIssue[] = [];
  const family = inferFamily(spec);
  const constants = resolveConstants(spec, family);
  const scales: EdgeScales = {
    bass: toMm(spec.scale.bass, u),
    treble: toMm(spec.scale.treble, u),
    perpendicularFret: spec.scale.perpendicularFret,
  };
  const multiScale = scales.bass !== scales.treble;
  const N = spec.frets;

  const frets = computeFrets(scales, spec, out, constants, issues);
  const strings = computeStrings(spec, scales, constants, issues);
  let totalN = 0;
  for (const s of strings) totalN += s.tensionN;
  const pickups = computePickups(spec, scales, N, constants, issues, out);

  return {
    units: u,
    family,
    referencePitchHz: spec.referencePitchHz,
    scale: { bass: spec.scale.bass, treble: spec.scale.treble, perpendicularFret: spec.scale.perpendicularFret, multiScale },
    frets,
    strings,
    totals: { tensionN: totalN, tensionLbf: newtonsToLbf(totalN) },
    pickups,
    constants,
    model: MODEL_NOTES,
    issues,
  };
}

function computeFrets(
  scales: EdgeScales,
  spec: InstrumentSpec,
  out: number,
  constants: ResolvedConstants,
  issues: SpecIssue[],
): FretRow[] {
  const N = spec.frets;
  const u = spec.units;
  const widths =
    spec.nutWidth !== undefined && spec.lastFretWidth !== undefined
      ? { nut: toMm(spec.nutWidth, u), lastFret: toMm(spec.lastFretWidth, u), lastFretNumber: N }
      : null;
  const rows: FretRow[] = new Array(N + 1);
  let prevB = 0;
  let prevT = 0;
  let monotonic = true;
  for (let n = 0; n <= N; n++) {
    const b = fretDistance(scales.bass, n);
    const t = fretDistance(scales.treble, n);
    if (n > 0 && !(b > prevB && t > prevT && b < scales.bass && t < scales.treble)) monotonic = false;
    const g = fretGeometry(scales, n, widths);
    rows[n] = {
      n,
      fromNut: { bass: b * out, treble: t * out },
      fromPrevious: { bass: (b - prevB) * out, treble: (t - prevT) * out },
      toSaddle: { bass: (scales.bass - b) * out, treble: (scales.treble - t) * out },
      ruleOf18FromNut: { bass: ruleOf18Distance(scales.bass, n) * out, treble: ruleOf18Distance(scales.treble, n) * out },
      ruleOf18Cents: ruleOf18CentsError(n),
      offset: g.offset * out,
      width: g.width === null ? null : g.width * out,
      ends: g.ends && {
        bass: { x: g.ends.bass.x * out, y: g.ends.bass.y * out },
        treble: { x: g.ends.treble.x * out, y: g.ends.treble.y * out },
      },
      length: g.length === null ? null : g.length * out,
      angleDeg: g.angleDeg,
    };
    prevB = b;
    prevT = t;
  }
  if (!monotonic) {
    issues.push({ level: "error", path: "frets", code: "frets_not_monotonic", message: "Fret positions do not increase steadily toward the bridge: check the scale lengths." });
  }
  // The last two frets sit closest together, on the shorter edge.
  const shortest = Math.min(scales.bass, scales.treble);
  const lastGap = fretDistance(shortest, N) - fretDistance(shortest, N - 1);
  if (lastGap < constants.fretCrownWidthMm) {
    issues.push({
      level: "error",
      path: "frets",
      code: "frets_do_not_fit",
      message:
        `Frets ${N - 1} and ${N} are only ${formatLength(lastGap, u)} ${u} apart, less than the ${formatLength(constants.fretCrownWidthMm, u)} ${u} ` +
        "crown of common fret wire (common practice): use fewer frets or a longer scale.",
    });
  }
  return rows;
}

function computeStrings(spec: InstrumentSpec, scales: EdgeScales, constants: ResolvedConstants, issues: SpecIssue[]): StringRow[] {
  const count = spec.strings.length;
  const rows: StringRow[] = new Array(count);
  const young = constants.steelYoungModulusGPa * 1e9;
  for (let i = 0; i < count; i++) {
    const s = spec.strings[i]!;
    const midi = noteToMidi(s.note) ?? 64; // the schema guarantees a note; the fallback only keeps types total
    const f = midiToFrequency(midi, spec.referencePitchHz);
    const lengthMm = interpolatedScale(scales, i, count);
    const lengthM = lengthMm / 1000;
    const construction = s.construction;
    const plain = construction === "plain-steel";
    const coreIn = plain ? s.gaugeIn : (s.coreIn ?? s.gaugeIn * constants.defaultCoreFraction);
    const coreShape = plain ? "round" : (s.coreShape ?? DEFAULT_CORE_SHAPE);
    const coreM = gaugeToM(coreIn);
    let modelWeight: number;
    if (construction === "plain-steel") modelWeight = plainUnitWeight(coreM, constants.steelDensityKgM3);
    else {
      const wrapDensity = constants.wrapDensityKgM3[construction];
      modelWeight = roundWoundUnitWeight({ outerM: gaugeToM(s.gaugeIn), coreM, coreShape }, constants.steelDensityKgM3, wrapDensity).total;
    }
    const mu = s.unitWeightKgPerM ?? modelWeight;
    const T = tension(mu, lengthM, f);
    const stress = coreStress(T, coreM, coreShape, f);
    rows[i] = {
      string: i + 1,
      note: s.note,
      midi,
      frequencyHz: f,
      scaleLength: lengthMm * fromMm(1, spec.units),
      construction: s.construction,
      gaugeIn: s.gaugeIn,
      coreIn,
      coreShape,
      unitWeightKgPerM: mu,
      unitWeightLbPerIn: kgPerMToLbPerIn(mu),
      unitWeightSource: s.unitWeightKgPerM === undefined ? "model" : "entered",
      tensionN: T,
      tensionLbf: newtonsToLbf(T),
      stressMPa: stress.stressPa / 1e6,
      coreMinStrengthMPa: stress.strength.minPa / 1e6,
      strengthBasis: stress.strength.basis,
      stressPercentOfBreaking: stress.percentOfMinimum,
      breakingFrequencyHz: stress.breakingFrequencyHz,
      inharmonicityB: inharmonicityCoefficient(young, equivalentRoundDiameter(coreM, coreShape), T, lengthM),
    };
    stringIssues(rows[i]!, i, constants, spec, issues);
  }
  neighbourIssues(rows, constants, spec, issues);
  return rows;
}

function label(r: StringRow): string {
  return `String ${r.string} (${r.note})`;
}

function stringIssues(r: StringRow, i: number, c: ResolvedConstants, spec: InstrumentSpec, issues: SpecIssue[]): void {
  const forceUnit = forceUnitFor(spec.units);
  if (r.stressPercentOfBreaking >= c.stressWarningPercent) stressIssue(r, i, c, issues);
  if (r.tensionN < c.tensionLowN) {
    issues.push({
      level: "warning",
      path: `strings.${i}.gaugeIn`,
      code: "tension_low",
      message: `${label(r)}: ${formatForce(r.tensionN, forceUnit)} ${forceUnit} is below the common-practice range for a ${inferFamily(spec)} string (from ${formatForce(c.tensionLowN, forceUnit)} ${forceUnit}); it may feel slack.`,
    });
  } else if (r.tensionN > c.tensionHighN) {
    issues.push({
      level: "warning",
      path: `strings.${i}.gaugeIn`,
      code: "tension_high",
      message: `${label(r)}: ${formatForce(r.tensionN, forceUnit)} ${forceUnit} is above the common-practice range for a ${inferFamily(spec)} string (up to ${formatForce(c.tensionHighN, forceUnit)} ${forceUnit}).`,
    });
  }
}

function stressIssue(r: StringRow, i: number, c: ResolvedConstants, issues: SpecIssue[]): void {
  const what = r.construction === "plain-steel" ? "stress" : "core stress";
  const head = `${label(r)}: ${what} is ${formatPercent(r.stressPercentOfBreaking)} % of the breaking strength (${formatGaugeIn(r.coreIn)} in music wire, ASTM A228 minimum)`;
  if (r.stressPercentOfBreaking >= c.stressErrorPercent) {
    issues.push({
      level: "error",
      path: `strings.${i}.gaugeIn`,
      code: "stress_too_high",
      message:
        `${head}, at or above the ${c.stressErrorPercent} % limit (common-practice margin). It may snap: lower the pitch or the scale` +
        (r.construction === "plain-steel" ? "." : ", or use a thicker core."),
    });
  } else {
    issues.push({ level: "warning", path: `strings.${i}.gaugeIn`, code: "stress_high", message: `${head}, above the ${c.stressWarningPercent} % common-practice margin.` });
  }
}

function neighbourIssues(rows: StringRow[], c: ResolvedConstants, spec: InstrumentSpec, issues: SpecIssue[]): void {
  const forceUnit = forceUnitFor(spec.units);
  for (let i = 1; i < rows.length; i++) {
    const a = rows[i - 1]!;
    const b = rows[i]!;
    if (b.frequencyHz > a.frequencyHz) {
      issues.push({
        level: "warning",
        path: `strings.${i}.note`,
        code: "pitch_order",
        message: `${label(b)} is higher than ${label(a)}: strings run from string 1 (highest) down. Check the order.`,
      });
    }
    const jump = (100 * Math.abs(a.tensionN - b.tensionN)) / Math.min(a.tensionN, b.tensionN);
    if (jump > c.tensionJumpPercent) {
      issues.push({
        level: "warning",
        path: `strings.${i}.gaugeIn`,
        code: "tension_jump",
        message:
          `${label(a)} and ${label(b)} differ by ${formatPercent(jump)} % in tension (${formatForce(a.tensionN, forceUnit)} vs ` +
          `${formatForce(b.tensionN, forceUnit)} ${forceUnit}); common practice keeps neighbours within ${c.tensionJumpPercent} %.`,
      });
    }
  }
}

function computePickups(
  spec: InstrumentSpec,
  scales: EdgeScales,
  N: number,
  c: ResolvedConstants,
  issues: SpecIssue[],
  out: number,
): PickupRow[] {
  const u = spec.units;
  const count = spec.strings.length;
  return spec.pickups.map((p, j) => {
    const bassMm = toMm(p.fromBridge, u);
    const trebleMm = p.fromBridgeTreble === undefined ? bassMm : toMm(p.fromBridgeTreble, u);
    const perString: PickupRow["perString"] = new Array(count);
    let underBoard: { string: number; lastFretToSaddle: number } | null = null;
    const cancelling: number[] = [];
    for (let i = 0; i < count; i++) {
      const L = interpolatedScale(scales, i, count);
      const x = count <= 1 ? (bassMm + trebleMm) / 2 : trebleMm + ((bassMm - trebleMm) * i) / (count - 1);
      const weights = harmonicWeightList(x, L);
      const cancelled = nearlyCancelled(weights, c.nearNullWeight);
      perString[i] = { string: i + 1, fromBridge: x * out, vibratingLength: L * out, ratio: x / L, weights, nearlyCancelled: cancelled };
      const lastFretToSaddle = fretToSaddle(L, N);
      if (!underBoard && x >= lastFretToSaddle) underBoard = { string: i + 1, lastFretToSaddle };
      if (cancelled.includes(2) || cancelled.includes(3)) cancelling.push(i + 1);
    }
    if (underBoard) {
      issues.push({
        level: "error",
        path: `pickups.${j}.fromBridge`,
        code: "pickup_under_fretboard",
        message:
          `Pickup "${p.label}" sits under the frets on string ${underBoard.string}: fret ${N} is ${formatLength(underBoard.lastFretToSaddle, u)} ${u} ` +
          "from the saddle there. Move it toward the bridge or use fewer frets.",
      });
    }
    if (cancelling.length > 0) {
      issues.push({
        level: "warning",
        path: `pickups.${j}.fromBridge`,
        code: "pickup_cancels_harmonic",
        message: `Pickup "${p.label}" nearly cancels the 2nd or 3rd harmonic (weight below ${c.nearNullWeight}) on string${cancelling.length > 1 ? "s" : ""} ${cancelling.join(", ")}: it sits near a node (x/L ≈ 1/2, 1/3 or 2/3).`,
      });
    }
    const xC = (bassMm + trebleMm) / 2;
    const lC = (scales.bass + scales.treble) / 2;
    const weights = harmonicWeightList(xC, lC);
    const harmonics = weights.map((weight, k) => ({ n: k + 1, weight }));
    return { label: p.label, fromBridge: xC * out, harmonics, nearlyCancelled: nearlyCancelled(weights, c.nearNullWeight), perString };
  });
}
