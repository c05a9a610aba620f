// Checks a setup sheet against the workshop's common-practice ranges (warnings) and against what
// can physically be measured (errors). Pure.
import type { SetupSheet } from "../schemas/setup-sheet";
import { IMPOSSIBLE, type Range, type SetupRanges } from "./ranges";

export interface SetupIssue {
  level: "error" | "warning";
  path: string;
  message: string;
}

const fmt = (n: number) => (Math.round(n * 100) / 100).toString();

function inRange(value: number, r: Range): boolean {
  return value >= r.min && value <= r.max;
}

/**
 * Issues for a sheet. `stringCount` is the spec's; `bassStrings` how many of the lowest strings
 * count as the bass side (the rest as treble) for the action ranges.
 */
export function checkSetupSheet(sheet: SetupSheet, ranges: SetupRanges, spec: { stringCount: number }): SetupIssue[] {
  const issues: SetupIssue[] = [];
  const err = (path: string, message: string) => issues.push({ level: "error", path, message });
  const warn = (path: string, message: string) => issues.push({ level: "warning", path, message: `${message} (common practice: a starting point, not a rule)` });
  const impossible = (path: string, value: number, r: Range, what: string, unit: string) => {
    if (!inRange(value, r)) {
      err(path, `${what} of ${fmt(value)} ${unit} cannot be right: it must be between ${r.min} and ${r.max} ${unit}. Check the unit and re-measure.`);
      return true;
    }
    return false;
  };

  const seen = new Set<number>();
  sheet.strings.forEach((s, i) => {
    const base = `strings.${i}`;
    if (s.string > spec.stringCount) err(`${base}.string`, `The spec has ${spec.stringCount} strings; there is no string ${s.string}.`);
    if (seen.has(s.string)) err(`${base}.string`, `String ${s.string} is recorded twice.`);
    seen.add(s.string);
    // The lower-pitched half of the set is the bass side.
    const bassSide = s.string > spec.stringCount / 2;
    const actionRange = bassSide ? ranges.actionBassSideMm : ranges.actionTrebleSideMm;
    if (!impossible(`${base}.actionAt12Mm`, s.actionAt12Mm, IMPOSSIBLE.actionMm, "An action", "mm") && !inRange(s.actionAt12Mm, actionRange)) {
      warn(`${base}.actionAt12Mm`, `Action ${fmt(s.actionAt12Mm)} mm is outside ${actionRange.min}–${actionRange.max} mm for the ${bassSide ? "bass" : "treble"} side`);
    }
    if (!impossible(`${base}.nutSlotAt1Mm`, s.nutSlotAt1Mm, IMPOSSIBLE.nutSlotMm, "A nut slot height", "mm") && !inRange(s.nutSlotAt1Mm, ranges.nutSlotMm)) {
      warn(`${base}.nutSlotAt1Mm`, `Nut slot ${fmt(s.nutSlotAt1Mm)} mm is outside ${ranges.nutSlotMm.min}–${ranges.nutSlotMm.max} mm`);
    }
    if (!impossible(`${base}.intonationCents`, s.intonationCents, IMPOSSIBLE.intonationCents, "An intonation error", "cents") && Math.abs(s.intonationCents) > ranges.intonationToleranceCents) {
      warn(`${base}.intonationCents`, `Intonation is ${s.intonationCents > 0 ? "sharp" : "flat"} by ${fmt(Math.abs(s.intonationCents))} cents, more than ±${ranges.intonationToleranceCents}: move the saddle and re-measure`);
    }
  });

  const relief = sheet.neck.reliefMm;
  if (!impossible("neck.reliefMm", relief, IMPOSSIBLE.reliefMm, "A relief", "mm")) {
    if (relief < 0) warn("neck.reliefMm", `The neck is back-bowed by ${fmt(-relief)} mm`);
    else if (!inRange(relief, ranges.reliefMm)) warn("neck.reliefMm", `Relief ${fmt(relief)} mm is outside ${ranges.reliefMm.min}–${ranges.reliefMm.max} mm`);
  }

  sheet.pickups.forEach((p, i) => {
    for (const [side, value, r] of [
      ["bassSideMm", p.bassSideMm, ranges.pickupBassSideMm],
      ["trebleSideMm", p.trebleSideMm, ranges.pickupTrebleSideMm],
    ] as const) {
      const path = `pickups.${i}.${side}`;
      if (!impossible(path, value, IMPOSSIBLE.pickupMm, "A pickup height", "mm") && !inRange(value, r)) {
        warn(path, `${p.label}: ${fmt(value)} mm is outside ${r.min}–${r.max} mm${value < r.min ? "; too close, the magnets can pull on the string" : ""}`);
      }
    }
  });

  sheet.strings.forEach((s, i) => {
    const pt = s.pullTest;
    if (pt?.spanMm !== undefined && pt.deflectionMm >= pt.spanMm / 4) {
      err(`strings.${i}.pullTest.deflectionMm`, "The deflection must be small against the span (under a quarter of it); re-measure with a smaller pull.");
    }
  });
  return issues;
}
