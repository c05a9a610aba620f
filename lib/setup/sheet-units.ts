// A setup sheet between the workshop's unit (what people type and read) and storage (mm, N).
// Workshops in inches enter forces in lbf, as on the calculator (forceUnitFor). Pure.
import { INPUT_DECIMALS, forceUnitFor, fromMm, lbfToNewtons, newtonsToLbf, roundTo, toMm, type LengthUnit } from "@/lib/lutherie/units";
import type { SetupSheet } from "@/lib/schemas/setup-sheet";

type Convert = (v: number) => number;

function mapSheet(sheet: SetupSheet, length: Convert, force: Convert): SetupSheet {
  return {
    ...sheet,
    strings: sheet.strings.map((s) => ({
      ...s,
      actionAt12Mm: length(s.actionAt12Mm),
      nutSlotAt1Mm: length(s.nutSlotAt1Mm),
      pullTest: s.pullTest
        ? {
            forceN: force(s.pullTest.forceN),
            deflectionMm: length(s.pullTest.deflectionMm),
            ...(s.pullTest.spanMm !== undefined ? { spanMm: length(s.pullTest.spanMm) } : {}),
          }
        : null,
    })),
    neck: { ...sheet.neck, reliefMm: length(sheet.neck.reliefMm) },
    pickups: sheet.pickups.map((p) => ({ ...p, bassSideMm: length(p.bassSideMm), trebleSideMm: length(p.trebleSideMm) })),
  };
}

/** Stored sheet → the numbers a form in `unit` shows (rounded to input precision). */
export function sheetToDisplay(sheet: SetupSheet, unit: LengthUnit): SetupSheet {
  if (unit === "mm") return structuredClone(sheet);
  const d = INPUT_DECIMALS.in;
  return mapSheet(sheet, (mm) => roundTo(fromMm(mm, unit), d), (n) => roundTo(newtonsToLbf(n), 4));
}

/** A form's numbers in `unit` → the stored sheet (mm, N), exactly. */
export function sheetFromDisplay(sheet: SetupSheet, unit: LengthUnit): SetupSheet {
  if (unit === "mm") return structuredClone(sheet);
  return mapSheet(sheet, (v) => toMm(v, unit), lbfToNewtons);
}

/** The force unit a setup form uses for a length unit. */
export const setupForceUnit = forceUnitFor;
