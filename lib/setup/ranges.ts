// Common-practice setup ranges: starting points a workshop can edit, not specifications.
// Every value here is [common practice, no source] [from memory] (see the project's sources list,
// §4.2); none is taken from a maker's chart or a brand's setup sheet.

export type InstrumentFamily = "guitar" | "bass";

/** An inclusive typical range, millimetres unless the name says otherwise. */
export interface Range {
  min: number;
  max: number;
}

export interface SetupRanges {
  actionBassSideMm: Range;
  actionTrebleSideMm: Range;
  reliefMm: Range;
  nutSlotMm: Range;
  pickupBassSideMm: Range;
  pickupTrebleSideMm: Range;
  /** Largest intonation error at the 12th fret accepted at final setup, cents either way. */
  intonationToleranceCents: number;
}

export const DEFAULT_SETUP_RANGES: Record<InstrumentFamily, SetupRanges> = {
  guitar: {
    actionBassSideMm: { min: 1.6, max: 2.4 },
    actionTrebleSideMm: { min: 1.2, max: 2.0 },
    reliefMm: { min: 0.15, max: 0.3 },
    nutSlotMm: { min: 0.05, max: 0.15 },
    pickupBassSideMm: { min: 2.0, max: 3.2 },
    pickupTrebleSideMm: { min: 1.5, max: 2.4 },
    intonationToleranceCents: 2,
  },
  bass: {
    actionBassSideMm: { min: 2.0, max: 3.0 },
    actionTrebleSideMm: { min: 1.6, max: 2.4 },
    reliefMm: { min: 0.25, max: 0.5 },
    nutSlotMm: { min: 0.1, max: 0.2 },
    pickupBassSideMm: { min: 2.0, max: 3.5 },
    pickupTrebleSideMm: { min: 1.6, max: 3.0 },
    intonationToleranceCents: 2,
  },
};

/** How far a pull test's tension may stray from the spec's before the sheet warns, percent. */
export const PULL_TEST_TOLERANCE_PERCENT = 15;

/** Hard limits: values outside these cannot be a real measurement (a slip of the unit, a typo). */
export const IMPOSSIBLE = {
  actionMm: { min: 0, max: 8 },
  reliefMm: { min: -1, max: 2 },
  nutSlotMm: { min: 0, max: 1.5 },
  pickupMm: { min: 0.3, max: 12 },
  intonationCents: { min: -50, max: 50 },
} as const;

/** The workshop's ranges: its saved overrides laid over the defaults for the family. */
export function effectiveRanges(family: InstrumentFamily, overrides?: Partial<Record<InstrumentFamily, Partial<SetupRanges>>> | null): SetupRanges {
  return { ...DEFAULT_SETUP_RANGES[family], ...(overrides?.[family] ?? {}) };
}
