// Strings: unit weight, tension and core stress. SI inside: metres, kilograms, newtons, pascals.
//   T = μ · (2 L f)²        [textbook] Fletcher & Rossing ch. 2; Mersenne (1636), Taylor (1713) — SOURCES §2.4
//   σ = T / A_core           engineering stress [derived here] — SOURCES §2.7
//
// Unit weight μ (SOURCES §2.5) [derived here]:
//   plain round wire:   μ = ρ · π d²/4
//   round-wound, idealised: a steel core (round, μ_c = ρ_c π d_c²/4; or a regular hexagon of
//   across-corners width s, μ_c = ρ_c (3√3/8) s²) with ONE layer of round wrap wire of diameter
//   d_w, close-wound (1/d_w turns per metre) on the core's outer diameter D_c, each turn π(D_c + d_w)
//   long with the helix angle neglected (≈ 1 %):  μ_w = ρ_w (π²/4) d_w (D_c + d_w);
//   outer diameter = D_c + 2 d_w;  μ = μ_c + μ_w.
// Real strings deviate (flattened wraps, gaps, several wraps): a measured μ always overrides.

import { musicWireMinStrength, type WireStrength } from "./materials";
import type { CoreShape } from "./practice";
import { inToMm, mmToM } from "./units";

const HEX_AREA_FACTOR = (3 * Math.sqrt(3)) / 8;

/** Cross-section area (m²) of a core: round of diameter D, or a regular hexagon D across corners. */
export function coreArea(diameterM: number, shape: CoreShape): number {
  return shape === "hex" ? HEX_AREA_FACTOR * diameterM ** 2 : (Math.PI * diameterM ** 2) / 4;
}

/** μ (kg/m) of a plain round wire of diameter d (m) and density ρ (kg/m³). */
export function plainUnitWeight(diameterM: number, densityKgM3: number): number {
  return (densityKgM3 * Math.PI * diameterM ** 2) / 4;
}

export interface WoundGeometry {
  /** Outer diameter (the gauge), m. */
  outerM: number;
  /** Core diameter D_c (round) or across-corners width s (hex), m. */
  coreM: number;
  coreShape: CoreShape;
}

/** Wrap wire diameter implied by the outer gauge and the core: d_w = (outer − D_c)/2. */
export function wrapDiameter(g: WoundGeometry): number {
  return (g.outerM - g.coreM) / 2;
}

/** μ (kg/m) of an idealised round-wound string (one close-wound layer), SOURCES §2.5. */
export function roundWoundUnitWeight(g: WoundGeometry, coreDensityKgM3: number, wrapDensityKgM3: number): {
  core: number;
  wrap: number;
  total: number;
} {
  const dw = wrapDiameter(g);
  const core = coreDensityKgM3 * coreArea(g.coreM, g.coreShape);
  const wrap = wrapDensityKgM3 * (Math.PI ** 2 / 4) * dw * (g.coreM + dw);
  return { core, wrap, total: core + wrap };
}

/** T = μ (2 L f)² in newtons, for μ in kg/m, L in m, f in Hz. */
export function tension(unitWeightKgM: number, lengthM: number, frequencyHz: number): number {
  return unitWeightKgM * (2 * lengthM * frequencyHz) ** 2;
}

/** The fundamental of a flexible string: f = (1/2L) · sqrt(T/μ). */
export function frequencyFromTension(tensionN: number, unitWeightKgM: number, lengthM: number): number {
  return Math.sqrt(tensionN / unitWeightKgM) / (2 * lengthM);
}

/** Transverse wave speed v = sqrt(T/μ). */
export function waveSpeed(tensionN: number, unitWeightKgM: number): number {
  return Math.sqrt(tensionN / unitWeightKgM);
}

export interface CoreStress {
  stressPa: number;
  strength: WireStrength;
  percentOfMinimum: number;
  /** Pitch at which the core would reach the A228 minimum: an upper bound (SOURCES §2.7). */
  breakingFrequencyHz: number;
}

/**
 * Stress on the core and its share of music wire's minimum tensile strength for the core's
 * diameter (a hex core is looked up by its across-corners width: the larger figure, conservative).
 */
export function coreStress(
  tensionN: number,
  coreDiameterM: number,
  shape: CoreShape,
  frequencyHz: number,
): CoreStress {
  const area = coreArea(coreDiameterM, shape);
  const stressPa = tensionN / area;
  const strength = musicWireMinStrength((coreDiameterM * 1000) / 25.4);
  // f_break = f · sqrt(T_break / T) with T_break = σ_min · A; for plain wire this is (1/2L)·sqrt(σ/ρ).
  const breakingFrequencyHz = frequencyHz * Math.sqrt((strength.minPa * area) / tensionN);
  return { stressPa, strength, percentOfMinimum: (100 * stressPa) / strength.minPa, breakingFrequencyHz };
}

/** A gauge given in inches (as the trade gives them) → metres. */
export function gaugeToM(gaugeIn: number): number {
  return mmToM(inToMm(gaugeIn));
}

/**
 * Diameter (m) of the round wire with the same area as a core: the stiffness diameter used for
 * inharmonicity (for a hex core, a round wire of equal area; the wrap adds little stiffness, SOURCES §2.11).
 */
export function equivalentRoundDiameter(coreM: number, shape: CoreShape): number {
  return shape === "round" ? coreM : Math.sqrt((4 * coreArea(coreM, shape)) / Math.PI);
}
