// Fret positions on one string in 12-tone equal temperament (SOURCES §2.2).
//   d_n = L · (1 − 2^(−n/12))   [textbook/derived here] from Mersenne's law f ∝ 1/L and the ratio 2^(1/12)
// Lengths are in whatever unit L is given in; the functions only scale.

export const MIN_FRETS = 1;
export const MAX_FRETS = 36;

/** The exact 12-TET divisor K = 1/(1 − 2^(−1/12)) ≈ 17.817 [derived here], SOURCES §2.2. */
export const TWELVE_TET_DIVISOR = 1 / (1 - 2 ** (-1 / 12));
/** The historical "rule of 18" divisor, kept only to show how far it is off. Never used to place frets. */
export const RULE_OF_18_DIVISOR = 18;

// 2^(−n/12) and (17/18)^n for whole frets, computed once: Math.pow dominates a fret table otherwise.
const REMAINING = Array.from({ length: MAX_FRETS + 1 }, (_, n) => 2 ** (-n / 12));
const REMAINING_18 = Array.from({ length: MAX_FRETS + 1 }, (_, n) => ((RULE_OF_18_DIVISOR - 1) / RULE_OF_18_DIVISOR) ** n);

/** 2^(−n/12): the share of the scale left between fret n and the saddle. */
export function remainingShare(n: number): number {
  return (Number.isInteger(n) ? REMAINING[n] : undefined) ?? 2 ** (-n / 12);
}

/** Distance from the nut to fret n on a string of scale length L (n may be fractional; 0 is the nut). */
export function fretDistance(scaleLength: number, n: number): number {
  return scaleLength * (1 - remainingShare(n));
}

/** Distance from fret n to the saddle (the remaining vibrating length). */
export function fretToSaddle(scaleLength: number, n: number): number {
  return scaleLength * remainingShare(n);
}

/** Distance between fret n−1 and fret n. */
export function fretSpacing(scaleLength: number, n: number): number {
  return fretDistance(scaleLength, n) - fretDistance(scaleLength, n - 1);
}

/**
 * Where the rule of 18 would put fret n: each fret at 1/18 of the remaining length,
 * d_n = L · (1 − (17/18)^n). Shown beside the exact value for comparison only.
 */
export function ruleOf18Distance(scaleLength: number, n: number): number {
  const share = (Number.isInteger(n) ? REMAINING_18[n] : undefined) ?? ((RULE_OF_18_DIVISOR - 1) / RULE_OF_18_DIVISOR) ** n;
  return scaleLength * (1 - share);
}

/**
 * How far the rule-of-18 fret n is from 12-TET pitch, in cents (negative = flat). Its remaining
 * length is L·(17/18)^n instead of L·2^(−n/12), so the error is n · 1200·log2(2^(−1/12)·18/17):
 * about −1.05 cents per fret, growing with the fret number [derived here].
 */
export function ruleOf18CentsError(n: number): number {
  return n * 1200 * Math.log2(2 ** (-1 / 12) * (RULE_OF_18_DIVISOR / (RULE_OF_18_DIVISOR - 1)));
}

/** Distances from the nut of frets 1…count (index 0 is fret 1). */
export function fretDistances(scaleLength: number, count: number): number[] {
  const out = new Array<number>(count);
  for (let n = 1; n <= count; n++) out[n - 1] = fretDistance(scaleLength, n);
  return out;
}
