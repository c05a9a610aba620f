// Material constants and the music-wire strength table (SOURCES §2.7 and §3).
// Every constant can be overridden per spec; the result records the value actually used.

import { ksiToPa } from "./units";

/** [handbook] carbon / music-wire steel: 7850 kg/m³ (spring-design tables, SOURCES §3). */
export const STEEL_DENSITY_KG_M3 = 7850;
/** [handbook] music-wire steel Young's modulus, round value 200 GPa (196–210 GPa range; round value from memory), SOURCES §3. */
export const STEEL_YOUNG_MODULUS_PA = 200e9;

/** Wrap materials of round-wound strings. The core is always steel music wire. */
export type WrapMaterial = "nickel-plated-steel" | "pure-nickel" | "stainless-steel" | "phosphor-bronze" | "bronze-80-20";

export interface MaterialInfo {
  label: string;
  densityKgM3: number;
  source: string;
}

/** Wrap densities, SOURCES §3. Nickel-plated steel counts as steel: the plating's mass is negligible. */
export const WRAP_MATERIALS: Record<WrapMaterial, MaterialInfo> = {
  "nickel-plated-steel": {
    label: "nickel-plated steel",
    densityKgM3: STEEL_DENSITY_KG_M3,
    source: "[derived here] plating mass negligible, so steel's 7850 kg/m³ (SOURCES §2.5, §3)",
  },
  "pure-nickel": { label: "pure nickel", densityKgM3: 8908, source: "[handbook] CRC, 8.90–8.908 g/cm³ (SOURCES §3)" },
  "stainless-steel": {
    label: "stainless steel (302/304)",
    densityKgM3: 7950,
    source: "[handbook] [from memory] middle of 7900–8000 kg/m³ (SOURCES §3)",
  },
  "phosphor-bronze": {
    label: "phosphor bronze",
    densityKgM3: 8800,
    source: "[handbook] spring tables, 8.8·10³ kg/m³ for drawn tin bronze (SOURCES §3)",
  },
  "bronze-80-20": {
    label: "80/20 bronze (a brass, ~CuZn20)",
    densityKgM3: 8590,
    source: "[handbook] [from memory] middle of 8530–8650 kg/m³ (SOURCES §3)",
  },
};

/**
 * [standard] ASTM A228/A228M, Table 1: minimum and maximum tensile strength of music wire by
 * diameter, in ksi (SOURCES §2.7; values as reproduced there). Minimum for bare wire, not a string rating.
 */
export const ASTM_A228_TABLE: ReadonlyArray<{ diameterIn: number; minKsi: number; maxKsi: number }> = [
  { diameterIn: 0.008, minKsi: 399, maxKsi: 441 },
  { diameterIn: 0.009, minKsi: 393, maxKsi: 434 },
  { diameterIn: 0.01, minKsi: 387, maxKsi: 428 },
  { diameterIn: 0.011, minKsi: 382, maxKsi: 422 },
  { diameterIn: 0.012, minKsi: 377, maxKsi: 417 },
  { diameterIn: 0.013, minKsi: 373, maxKsi: 412 },
  { diameterIn: 0.014, minKsi: 369, maxKsi: 408 },
  { diameterIn: 0.015, minKsi: 365, maxKsi: 404 },
  { diameterIn: 0.016, minKsi: 362, maxKsi: 400 },
  { diameterIn: 0.018, minKsi: 356, maxKsi: 393 },
  { diameterIn: 0.02, minKsi: 350, maxKsi: 387 },
  { diameterIn: 0.022, minKsi: 345, maxKsi: 382 },
  { diameterIn: 0.024, minKsi: 341, maxKsi: 377 },
  { diameterIn: 0.026, minKsi: 337, maxKsi: 373 },
];

/** How a strength value was read from the table. */
export type StrengthBasis = "tabulated" | "next-larger-diameter" | "below-table" | "above-table";

export interface WireStrength {
  minKsi: number;
  minPa: number;
  /** The tabulated diameter whose value was used. */
  tableDiameterIn: number;
  basis: StrengthBasis;
}

const FIRST = ASTM_A228_TABLE[0]!;
const LAST = ASTM_A228_TABLE[ASTM_A228_TABLE.length - 1]!;

/**
 * Minimum tensile strength of music wire of diameter d (in). Between tabulated diameters it uses
 * the next larger one, the conservative choice SOURCES §2.7 offers (strength falls as d grows).
 * Below 0.008 in it uses 0.008 in (conservative: thinner wire is stronger). Above 0.026 in it uses
 * 0.026 in, which overstates the strength of thicker wire: the result says so ("above-table").
 */
export function musicWireMinStrength(diameterIn: number): WireStrength {
  const tol = 1e-9;
  if (diameterIn <= FIRST.diameterIn + tol) {
    const basis = Math.abs(diameterIn - FIRST.diameterIn) <= tol ? "tabulated" : "below-table";
    return { minKsi: FIRST.minKsi, minPa: ksiToPa(FIRST.minKsi), tableDiameterIn: FIRST.diameterIn, basis };
  }
  for (const row of ASTM_A228_TABLE) {
    if (diameterIn <= row.diameterIn + tol) {
      const basis = Math.abs(diameterIn - row.diameterIn) <= tol ? "tabulated" : "next-larger-diameter";
      return { minKsi: row.minKsi, minPa: ksiToPa(row.minKsi), tableDiameterIn: row.diameterIn, basis };
    }
  }
  return { minKsi: LAST.minKsi, minPa: ksiToPa(LAST.minKsi), tableDiameterIn: LAST.diameterIn, basis: "above-table" };
}
