// Units: the one place that converts between what people type and what the math uses, and that
// rounds numbers for display. Internally lengths are millimetres, forces newtons, masses kilograms
// (SOURCES §1: "Work in SI internally. Convert only at input and output.").

export type LengthUnit = "mm" | "in";
export type ForceUnit = "N" | "lbf";

/** [standard] international inch, 1959: exactly 25.4 mm (SOURCES §1). */
export const MM_PER_IN = 25.4;
/** [standard] pound (mass), 1959 agreement: exactly 0.45359237 kg (SOURCES §1). */
export const KG_PER_LB = 0.45359237;
/** [standard] standard gravity, 3rd CGPM (1901): exactly 9.80665 m/s² (SOURCES §1). */
export const STANDARD_GRAVITY = 9.80665;
/** [standard] 1 lbf = 0.45359237 × 9.80665 N exactly (NIST SP 811; SOURCES §1). */
export const N_PER_LBF = KG_PER_LB * STANDARD_GRAVITY;
/** [derived here] 1 ksi = 1000 lbf/in² in pascals (SOURCES §1). */
export const PA_PER_KSI = (1000 * N_PER_LBF) / (MM_PER_IN / 1000) ** 2;
/** [derived here] lb/in → kg/m: × 0.45359237 / 0.0254 (SOURCES §1). */
export const KG_PER_M_PER_LB_PER_IN = KG_PER_LB / (MM_PER_IN / 1000);

/** A length in `unit` → millimetres. */
export function toMm(value: number, unit: LengthUnit): number {
  return unit === "in" ? value * MM_PER_IN : value;
}

/** Millimetres → a length in `unit`. */
export function fromMm(mm: number, unit: LengthUnit): number {
  return unit === "in" ? mm / MM_PER_IN : mm;
}

export const inToMm = (inches: number) => inches * MM_PER_IN;
export const mmToIn = (mm: number) => mm / MM_PER_IN;
export const mmToM = (mm: number) => mm / 1000;
export const newtonsToLbf = (n: number) => n / N_PER_LBF;
export const lbfToNewtons = (lbf: number) => lbf * N_PER_LBF;
export const kgPerMToLbPerIn = (kgm: number) => kgm / KG_PER_M_PER_LB_PER_IN;
export const lbPerInToKgPerM = (lbin: number) => lbin * KG_PER_M_PER_LB_PER_IN;
export const ksiToPa = (ksi: number) => ksi * PA_PER_KSI;
export const paToKsi = (pa: number) => pa / PA_PER_KSI;

// ---- Display rounding: every number the UI shows goes through one of these. ----

/** Decimals shown for a length: 0.01 mm, or 0.001 in (≈ 0.025 mm, finer than a saw kerf). */
export const LENGTH_DECIMALS: Record<LengthUnit, number> = { mm: 2, in: 3 };
/** Decimals kept when a typed length is converted to the other unit (keeps mm→in→mm within 0.002 mm). */
export const INPUT_DECIMALS: Record<LengthUnit, number> = { mm: 2, in: 4 };

function fixed(value: number, decimals: number): string {
  if (!Number.isFinite(value)) return "—";
  // Avoid "-0.00" for tiny negatives.
  const s = value.toFixed(decimals);
  return /^-0\.?0*$/.test(s) ? s.slice(1) : s;
}

/** Rounds a number to `decimals` places (half away from zero), for exports and converted inputs. */
export function roundTo(value: number, decimals: number): number {
  const f = 10 ** decimals;
  return Math.sign(value) * (Math.round(Math.abs(value) * f) / f);
}

/** A length held in mm, shown in `unit` at display precision, without the unit symbol. */
export function formatLength(mm: number, unit: LengthUnit): string {
  return fixed(fromMm(mm, unit), LENGTH_DECIMALS[unit]);
}

/** A length already in `unit` (as the API returns it), shown at display precision. */
export function formatLengthIn(value: number, unit: LengthUnit): string {
  return fixed(value, LENGTH_DECIMALS[unit]);
}

/** A typed length converted to another unit, rounded to input precision. */
export function convertLengthInput(value: number, from: LengthUnit, to: LengthUnit): number {
  if (from === to) return value;
  return roundTo(fromMm(toMm(value, from), to), INPUT_DECIMALS[to]);
}

/** Force from newtons in the chosen unit: one decimal. */
export function formatForce(newtons: number, unit: ForceUnit): string {
  return fixed(unit === "lbf" ? newtonsToLbf(newtons) : newtons, 1);
}

/** The force unit that goes with a length unit on screen: workshops in inches think in lbf. */
export function forceUnitFor(unit: LengthUnit): ForceUnit {
  return unit === "in" ? "lbf" : "N";
}

export const formatHz = (hz: number) => fixed(hz, hz < 100 ? 3 : 2);
export const formatPercent = (p: number) => fixed(p, 1);
export const formatGaugeIn = (inches: number) => fixed(inches, 4);
export const formatDegrees = (deg: number) => fixed(deg, 2);
export const formatWeight = (w: number) => fixed(w, 3);
export const formatUnitWeight = (kgPerM: number) => (Number.isFinite(kgPerM) ? kgPerM.toExponential(4) : "—");
export const formatCents = (c: number) => fixed(c, 1);
