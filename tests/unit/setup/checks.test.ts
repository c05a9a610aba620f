// Setup-sheet checks. The ranges are [common practice, no source] [from memory] defaults; what is
// tested is that the checks apply them and the impossible-value limits the way they say.
import { describe, expect, it } from "vitest";
import { setupSheetSchema, type SetupSheet } from "@/lib/schemas/setup-sheet";
import { checkSetupSheet } from "@/lib/setup/checks";
import { DEFAULT_SETUP_RANGES, effectiveRanges } from "@/lib/setup/ranges";

const good: SetupSheet = setupSheetSchema.parse({
  strings: [1, 2, 3, 4, 5, 6].map((n) => ({ string: n, actionAt12Mm: n > 3 ? 2.0 : 1.6, nutSlotAt1Mm: 0.1, intonationCents: 0.5 })),
  neck: { reliefMm: 0.2, reliefAtFret: 8 },
  pickups: [{ label: "Bridge", bassSideMm: 2.4, trebleSideMm: 1.6 }],
  electronics: { checks: { jack_output: true } },
});
const guitar = DEFAULT_SETUP_RANGES.guitar;

describe("setup sheet checks", () => {
  it("passes a sheet inside the common-practice ranges", () => {
    expect(checkSetupSheet(good, guitar, { stringCount: 6 })).toEqual([]);
  });

  it("warns, labelled as common practice, outside the ranges", () => {
    const sheet = structuredClone(good);
    sheet.strings[5]!.actionAt12Mm = 3.1; // bass side, above 2.4
    sheet.strings[0]!.intonationCents = -4;
    sheet.neck.reliefMm = -0.1;
    sheet.pickups[0]!.trebleSideMm = 0.9;
    const issues = checkSetupSheet(sheet, guitar, { stringCount: 6 });
    expect(issues.map((i) => [i.level, i.path])).toEqual(
      expect.arrayContaining([
        ["warning", "strings.0.intonationCents"],
        ["warning", "strings.5.actionAt12Mm"],
        ["warning", "neck.reliefMm"],
        ["warning", "pickups.0.trebleSideMm"],
      ]),
    );
    expect(issues).toHaveLength(4);
    for (const i of issues) expect(i.message).toMatch(/common practice/);
    expect(issues.find((i) => i.path === "neck.reliefMm")!.message).toMatch(/back-bowed/);
    expect(issues.find((i) => i.path === "strings.0.intonationCents")!.message).toMatch(/flat by 4 cents/);
  });

  it("refuses impossible values and strings the spec does not have", () => {
    const sheet = structuredClone(good);
    sheet.strings[0]!.actionAt12Mm = 25; // inches typed as mm, or a slip
    sheet.strings[1]!.string = 7;
    sheet.strings[2]!.string = 4; // twice
    sheet.neck.reliefMm = 3;
    const issues = checkSetupSheet(sheet, guitar, { stringCount: 6 }).filter((i) => i.level === "error");
    expect(issues.map((i) => i.path).sort()).toEqual(["neck.reliefMm", "strings.0.actionAt12Mm", "strings.1.string", "strings.3.string"]);
  });

  it("uses the bass ranges for a bass and the workshop's overrides", () => {
    const bassSheet = structuredClone(good);
    bassSheet.strings = bassSheet.strings.slice(0, 4).map((s) => ({ ...s, actionAt12Mm: 2.6 }));
    bassSheet.neck.reliefMm = 0.4;
    const issues = checkSetupSheet(bassSheet, DEFAULT_SETUP_RANGES.bass, { stringCount: 4 });
    expect(issues.map((i) => i.path)).toEqual(["strings.0.actionAt12Mm", "strings.1.actionAt12Mm"]); // treble side above 2.4
    const lenient = effectiveRanges("bass", { bass: { actionTrebleSideMm: { min: 1.6, max: 2.8 } } });
    expect(checkSetupSheet(bassSheet, lenient, { stringCount: 4 })).toEqual([]);
  });

  it("rejects a malformed sheet with field paths", () => {
    const r = setupSheetSchema.safeParse({ strings: [{ string: 1, actionAt12Mm: "low" }], neck: { reliefMm: 0.2, reliefAtFret: 5 }, pickups: [], electronics: { checks: {} } });
    expect(r.success).toBe(false);
    const paths = r.error!.issues.map((i) => i.path.join("."));
    expect(paths).toEqual(expect.arrayContaining(["strings.0.actionAt12Mm", "strings.0.nutSlotAt1Mm", "neck.reliefAtFret"]));
  });
});
