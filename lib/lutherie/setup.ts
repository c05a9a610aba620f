// Setup helpers: pull-test tension, saddle move from a 12th-fret cents error, stiff-string inharmonicity.

import { centsBetween } from "./pitch";

export interface PullTest {
  /** Angle of each half of the string to its rest line, radians: θ = atan(2δ/S). */
  angleRad: number;
  /** T = F / (2 sin θ) [textbook] statics of a point load on a taut string, SOURCES §2.8. */
  tensionN: number;
  /** Small-angle form T ≈ F·S/(4δ) [derived here], SOURCES §2.8. */
  smallAngleTensionN: number;
}

/**
 * Tension from a sideways pull at mid-span: force F (N) deflects the midpoint by δ over the span S
 * (δ and S in the same unit). The result is the tension of the deflected string, which pulling
 * raises slightly: keep δ small (SOURCES §2.8).
 */
export function pullTestTension(forceN: number, deflection: number, span: number): PullTest {
  const angleRad = Math.atan((2 * deflection) / span);
  return {
    angleRad,
    tensionN: forceN / (2 * Math.sin(angleRad)),
    smallAngleTensionN: (forceN * span) / (4 * deflection),
  };
}

/** The 12th-fret intonation error: c = 1200·log2(f_fretted12 / (2·f_open)), SOURCES §2.10. */
export function octaveErrorCents(openHz: number, fretted12Hz: number): number {
  return centsBetween(2 * openHz, fretted12Hz);
}

/**
 * Saddle move Δ for a measured 12th-fret error of c cents, model B of SOURCES §2.10 [derived here]:
 * the move lengthens both the open string (L + Δ) and the fretted half (L/2 + Δ) and the open
 * string is retuned, so k(L + Δ)/(L/2 + Δ) = 2 with k = 2^(c/1200), giving Δ = L(k − 1)/(2 − k).
 * Positive Δ: the note is sharp, move the saddle away from the nut; negative: toward it.
 * Same unit as L.
 */
export function saddleMoveForCents(scaleLength: number, cents: number): number {
  const k = 2 ** (cents / 1200);
  return (scaleLength * (k - 1)) / (2 - k);
}

/**
 * Inharmonicity coefficient of a stiff string with pinned ends, B = π³ E d⁴ / (64 T L²)
 * [textbook] Fletcher & Rossing ch. 2, SOURCES §2.11. SI units: E in Pa, d and L in m, T in N.
 * For wound strings pass the core's diameter: the wrap adds mass but little stiffness.
 */
export function inharmonicityCoefficient(youngModulusPa: number, diameterM: number, tensionN: number, lengthM: number): number {
  return (Math.PI ** 3 * youngModulusPa * diameterM ** 4) / (64 * tensionN * lengthM ** 2);
}

/** f_n = n f0 sqrt(1 + B n²) for pinned ends (SOURCES §2.11). */
export function partialFrequency(f0: number, b: number, n: number): number {
  return n * f0 * Math.sqrt(1 + b * n * n);
}

/**
 * The clamped-end factor [1 + 2√B/π + 4B/π²] (SOURCES §2.11, from memory). Offered as a separate
 * readout: Scalewright's B and partials are the pinned-end values and do NOT include it.
 */
export function clampedEndFactor(b: number): number {
  return 1 + (2 * Math.sqrt(b)) / Math.PI + (4 * b) / Math.PI ** 2;
}

/** How sharp partial n is against n·f0, in cents, for pinned ends. */
export function partialSharpnessCents(b: number, n: number): number {
  return 1200 * Math.log2(Math.sqrt(1 + b * n * n));
}
