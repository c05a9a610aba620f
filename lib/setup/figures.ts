// What a setup sheet's measurements imply, per string, against the approved spec: the saddle move
// for the measured intonation error and the tension a pull test implies beside the spec's. Pure.
import { pullTestTension, saddleMoveForCents } from "@/lib/lutherie/setup";
import { toMm } from "@/lib/lutherie/units";
import type { ComputeResult } from "@/lib/schemas/instrument-spec";
import type { SetupSheet } from "@/lib/schemas/setup-sheet";

/** One string of the approved spec, as the setup sheet needs it (mm, N). */
export interface SpecString {
  string: number;
  note: string;
  scaleLengthMm: number;
  tensionN: number;
}

export interface StringFigures {
  string: number;
  /** Saddle move for the measured error, mm: positive away from the nut (sharp), negative toward it. */
  saddleMoveMm: number | null;
  pullTest: {
    spanMm: number;
    tensionN: number;
    specTensionN: number;
    /** Measured minus spec, N and percent of the spec's. */
    differenceN: number;
    differencePercent: number;
  } | null;
}

/** The strings of an approved spec's stored result, lengths in mm. */
export function specStrings(result: ComputeResult): SpecString[] {
  return result.strings.map((s) => ({ string: s.string, note: s.note, scaleLengthMm: toMm(s.scaleLength, result.units), tensionN: s.tensionN }));
}

/**
 * Figures for each recorded string. The saddle move is model B of SOURCES §2.10 over the string's
 * own scale length; the pull-test tension is T = F/(2 sin θ) (SOURCES §2.8) over the given span or,
 * without one, the string's scale length. Strings the spec does not have get nulls.
 */
export function setupFigures(sheet: Pick<SetupSheet, "strings">, spec: readonly SpecString[]): StringFigures[] {
  return sheet.strings.map((s) => {
    const ref = spec.find((x) => x.string === s.string);
    if (!ref) return { string: s.string, saddleMoveMm: null, pullTest: null };
    const saddleMoveMm = saddleMoveForCents(ref.scaleLengthMm, s.intonationCents);
    const pt = s.pullTest;
    if (!pt) return { string: s.string, saddleMoveMm, pullTest: null };
    const spanMm = pt.spanMm ?? ref.scaleLengthMm;
    const tensionN = pullTestTension(pt.forceN, pt.deflectionMm, spanMm).tensionN;
    const differenceN = tensionN - ref.tensionN;
    return {
      string: s.string,
      saddleMoveMm,
      pullTest: { spanMm, tensionN, specTensionN: ref.tensionN, differenceN, differencePercent: (100 * differenceN) / ref.tensionN },
    };
  });
}
