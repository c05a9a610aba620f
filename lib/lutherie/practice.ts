// Common-practice values: starting points, not specifications. Every value here is
// [common practice, no source] and most are [from memory] (SOURCES §4); none comes from a string
// maker's chart. The UI labels them "common practice" and every one can be overridden per spec.

export type InstrumentFamily = "guitar" | "bass";

/** Per-string tension as players perceive it, SOURCES §4.1 (newtons). */
export const TENSION_RANGES_N: Record<InstrumentFamily, { slackBelow: number; typicalLow: number; typicalHigh: number; highAbove: number }> = {
  guitar: { slackBelow: 55, typicalLow: 60, typicalHigh: 90, highAbove: 100 },
  bass: { slackBelow: 130, typicalLow: 150, typicalHigh: 220, highAbove: 240 },
};

/**
 * When no family is given: a bass's string 1 sits near G2–C3 (98–131 Hz), a guitar's near E4
 * (330 Hz), B3 on a baritone (247 Hz); 180 Hz separates them [common practice, no source].
 */
export const BASS_IF_STRING_ONE_BELOW_HZ = 180;

/**
 * Core stress as a share of the ASTM A228 minimum: a warning from 70 %, an error from 80 %
 * (SOURCES §2.7 "suggested UI warning: about 70–80 %", the author's margin, not a standard).
 */
export const STRESS_WARNING_PERCENT = 70;
export const STRESS_ERROR_PERCENT = 80;

/** Neighbouring strings whose tensions differ by more than this share of the lower one get a warning. */
export const TENSION_JUMP_PERCENT = 30;

/** A pickup "nearly cancels" harmonic n when |sin(nπx/L)| is below this. */
export const NEAR_NULL_WEIGHT = 0.1;

/** Harmonics computed at each pickup (n = 1…16). */
export const HARMONIC_COUNT = 16;

/** Crown width of common medium fret wire; neighbouring frets closer than this do not fit. */
export const FRET_CROWN_WIDTH_MM = 2.5;

/**
 * Core of a round-wound string when the builder gives none: a hexagonal core whose across-corners
 * width is 45 % of the outer gauge [common practice, no source] [from memory]. Enter the real core
 * (or a measured unit weight) for real-world accuracy (SOURCES §2.5).
 */
export const DEFAULT_CORE_FRACTION = 0.45;
export type CoreShape = "hex" | "round";
export const DEFAULT_CORE_SHAPE: CoreShape = "hex";
