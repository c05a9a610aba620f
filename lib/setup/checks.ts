// Checks a setup sheet against the workshop's common-practice ranges (warnings) and against what
// can physically be measured (errors). Pure.
import { formatForce, formatLength, type LengthUnit } from "../lutherie/units";
import type { SetupSheet } from "../schemas/setup-sheet";
import { setupFigures, type SpecString } from "./figures";
import { IMPOSSIBLE, PULL_TEST_TOLERANCE_PERCENT, type Range, type SetupRanges } from "./ranges";

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
 * Issues for a sheet. `stringCount` is the spec's; the lower-pitched half of the strings counts as
 * the bass side for the action ranges. With the spec's `strings` (scale lengths, tensions) the pull
 * tests are checked too: deflection small against the span, tension near the spec's. Messages
 * give lengths in `unit` (default mm); values and ranges are always millimetres.
 */
export function checkSetupSheet(
  sheet: SetupSheet,
  ranges: SetupRanges,
  spec: { stringCount: number; strings?: readonly SpecString[]; unit?: LengthUnit },
): SetupIssue[] {
  const unit = spec.unit ?? "mm";
  const len = (mm: number) => (unit === "mm" ? `${fmt(mm)} mm` : `${formatLength(mm, unit)} in`);
  const between = (r: Range) => (unit === "mm" ? `${r.min}–${r.max} mm` : `${formatLength(r.min, unit)}–${formatLength(r.max, unit)} in`);
  const cents = (c: number) => `${fmt(c)} cents`;
  const force = (n: number) => (unit === "mm" ? `${fmt(n)} N` : `${formatForce(n, "lbf")} lbf`);
  const issues: SetupIssue[] = [];
  const err = (path: string, message: string) => issues.push({ level: "error", path, message });
  const warn = (path: string, message: string) => issues.push({ level: "warning", path, message: `${message} (common practice: a starting point, not a rule)` });
  const impossible = (path: string, value: number, r: Range, what: string, show = len) => {
    if (!inRange(value, r)) {
      err(path, `${what} of ${show(value)} cannot be right: it must be between ${show(r.min)} and ${show(r.max)}. Check the unit and re-measure.`);
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
    if (!impossible(`${base}.actionAt12Mm`, s.actionAt12Mm, IMPOSSIBLE.actionMm, "An action") && !inRange(s.actionAt12Mm, actionRange)) {
      warn(`${base}.actionAt12Mm`, `Action ${len(s.actionAt12Mm)} is outside ${between(actionRange)} for the ${bassSide ? "bass" : "treble"} side`);
    }
    if (!impossible(`${base}.nutSlotAt1Mm`, s.nutSlotAt1Mm, IMPOSSIBLE.nutSlotMm, "A nut slot height") && !inRange(s.nutSlotAt1Mm, ranges.nutSlotMm)) {
      warn(`${base}.nutSlotAt1Mm`, `Nut slot ${len(s.nutSlotAt1Mm)} is outside ${between(ranges.nutSlotMm)}`);
    }
    if (!impossible(`${base}.intonationCents`, s.intonationCents, IMPOSSIBLE.intonationCents, "An intonation error", cents) && Math.abs(s.intonationCents) > ranges.intonationToleranceCents) {
      warn(`${base}.intonationCents`, `Intonation is ${s.intonationCents > 0 ? "sharp" : "flat"} by ${fmt(Math.abs(s.intonationCents))} cents, more than ±${ranges.intonationToleranceCents}: move the saddle and re-measure`);
    }
  });

  const relief = sheet.neck.reliefMm;
  if (!impossible("neck.reliefMm", relief, IMPOSSIBLE.reliefMm, "A relief")) {
    if (relief < 0) warn("neck.reliefMm", `The neck is back-bowed by ${len(-relief)}`);
    else if (!inRange(relief, ranges.reliefMm)) warn("neck.reliefMm", `Relief ${len(relief)} is outside ${between(ranges.reliefMm)}`);
  }

  sheet.pickups.forEach((p, i) => {
    for (const [side, value, r] of [
      ["bassSideMm", p.bassSideMm, ranges.pickupBassSideMm],
      ["trebleSideMm", p.trebleSideMm, ranges.pickupTrebleSideMm],
    ] as const) {
      const path = `pickups.${i}.${side}`;
      if (!impossible(path, value, IMPOSSIBLE.pickupMm, "A pickup height") && !inRange(value, r)) {
        warn(path, `${p.label}: ${len(value)} is outside ${between(r)}${value < r.min ? "; too close, the magnets can pull on the string" : ""}`);
      }
    }
  });

  const figures = spec.strings ? setupFigures(sheet, spec.strings) : [];
  sheet.strings.forEach((s, i) => {
    const pt = s.pullTest;
    if (!pt) return;
    const span = pt.spanMm ?? spec.strings?.find((x) => x.string === s.string)?.scaleLengthMm;
    if (span !== undefined && pt.deflectionMm >= span / 4) {
      err(`strings.${i}.pullTest.deflectionMm`, "The deflection must be small against the span (under a quarter of it); re-measure with a smaller pull.");
      return;
    }
    const f = figures[i]?.pullTest;
    if (f && Math.abs(f.differencePercent) > PULL_TEST_TOLERANCE_PERCENT) {
      warn(
        `strings.${i}.pullTest.forceN`,
        `String ${s.string}: the pull test implies ${force(f.tensionN)} against ${force(f.specTensionN)} in the approved spec (${f.differencePercent > 0 ? "+" : ""}${fmt(f.differencePercent)} %, more than ±${PULL_TEST_TOLERANCE_PERCENT} %): check the gauge, the pitch and the force gauge`,
      );
    }
  });
  return issues;
}
