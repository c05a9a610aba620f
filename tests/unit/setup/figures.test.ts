// What a setup sheet's measurements imply: the saddle move (model B) and the pull-test tension,
// worked by hand here; the summary lines; the unit round trip of a sheet.
// Sources: model B saddle move Δ = L(k − 1)/(2 − k), k = 2^(c/1200), SOURCES §2.10 [derived
// here]; pull test T = F/(2 sin θ), θ = atan(2δ/S), SOURCES §2.8 [textbook, statics of a point
// load]; 1 in = 25.4 mm and 1 lbf = 4.4482216152605 N [standard, SOURCES §1].
import { describe, expect, it } from "vitest";
import { saddleMoveForCents } from "@/lib/lutherie/setup";
import { setupSheetSchema, type SetupSheet } from "@/lib/schemas/setup-sheet";
import { checkSetupSheet } from "@/lib/setup/checks";
import { setupFigures, type SpecString } from "@/lib/setup/figures";
import { describeSaddleMove } from "@/lib/setup/format";
import { DEFAULT_SETUP_RANGES } from "@/lib/setup/ranges";
import { sheetFromDisplay, sheetToDisplay } from "@/lib/setup/sheet-units";
import { setupSummaryLines } from "@/lib/setup/summary";

const spec: SpecString[] = [
  { string: 1, note: "E4", scaleLengthMm: 648, tensionN: 72 },
  { string: 2, note: "B3", scaleLengthMm: 648, tensionN: 70 },
];

function sheet(over: Partial<SetupSheet> = {}): SetupSheet {
  return setupSheetSchema.parse({
    strings: [
      { string: 1, actionAt12Mm: 1.5, nutSlotAt1Mm: 0.08, intonationCents: 5, pullTest: { forceN: 2, deflectionMm: 4.5 } },
      { string: 2, actionAt12Mm: 1.9, nutSlotAt1Mm: 0.12, intonationCents: -3 },
    ],
    neck: { reliefMm: 0.22, reliefAtFret: 8 },
    pickups: [{ label: "Neck", bassSideMm: 2.4, trebleSideMm: 1.6 }],
    electronics: { checks: { jack_output: true, pots_sweep: true } },
    ...over,
  });
}

describe("saddle move, worked by hand (SOURCES §2.10, model B)", () => {
  it("moves the saddle 1.8796 mm back for +5 cents on a 648 mm string", () => {
    // k = 2^(5/1200) = e^(5·ln 2/1200) = e^0.00288811 = 1.0028923 (to 7 places)
    // Δ = 648 × (1.0028923 − 1) / (2 − 1.0028923) = 1.8742104 / 0.9971077 = 1.879647 mm
    const byHand = (648 * 0.0028923) / 0.9971077;
    expect(byHand).toBeCloseTo(1.879647, 5);
    // The rounding of k to 7 places bounds the hand result to about 1e-4 mm.
    expect(Math.abs(saddleMoveForCents(648, 5) - byHand)).toBeLessThan(1e-4);
    const [first] = setupFigures(sheet(), spec);
    expect(Math.abs(first!.saddleMoveMm! - byHand)).toBeLessThan(1e-4);
    expect(describeSaddleMove(first!.saddleMoveMm, "mm")).toBe("1.88 mm away from the nut");
    expect(describeSaddleMove(first!.saddleMoveMm, "in")).toBe("0.074 in away from the nut");
  });

  it("moves it forward for a flat note: −3 cents on 648 mm is 1.1200 mm toward the nut", () => {
    // k = 2^(−3/1200) = e^(−0.00173287) = 0.9982686; Δ = 648 × (−0.0017314)/(1.0017314) = −1.1200 mm
    const byHand = (648 * -0.0017314) / 1.0017314;
    const [, second] = setupFigures(sheet(), spec);
    expect(Math.abs(second!.saddleMoveMm! - byHand)).toBeLessThan(1e-3);
    expect(describeSaddleMove(second!.saddleMoveMm, "mm")).toBe("1.12 mm toward the nut");
  });
});

describe("pull test beside the spec's tension (SOURCES §2.8)", () => {
  it("2 N deflecting 4.5 mm over 648 mm means 72.0 N", () => {
    // θ = atan(2 × 4.5 / 648) = atan(0.0138889) = 0.0138880 rad; sin θ = 0.0138875
    // T = 2 / (2 × 0.0138875) = 72.007 N (small-angle form F·S/(4δ) = 2 × 648 / 18 = 72 N)
    const [first] = setupFigures(sheet(), spec);
    expect(first!.pullTest!.tensionN).toBeCloseTo(72.007, 2);
    expect(first!.pullTest!.specTensionN).toBe(72);
    expect(first!.pullTest!.differenceN).toBeCloseTo(0.007, 2);
    expect(first!.pullTest!.spanMm).toBe(648);
  });

  it("warns, as common practice, when the measured tension strays far from the spec's", () => {
    const s = sheet();
    s.strings[0]!.pullTest = { forceN: 3, deflectionMm: 4.5 }; // 108 N against 72 N: +50 %
    const issues = checkSetupSheet(s, DEFAULT_SETUP_RANGES.guitar, { stringCount: 2, strings: spec });
    const w = issues.find((i) => i.path === "strings.0.pullTest.forceN")!;
    expect(w.level).toBe("warning");
    expect(w.message).toMatch(/common practice/);
    s.strings[0]!.pullTest = { forceN: 3, deflectionMm: 200 }; // over a quarter of the 648 mm span
    expect(checkSetupSheet(s, DEFAULT_SETUP_RANGES.guitar, { stringCount: 2, strings: spec }).find((i) => i.level === "error")?.path).toBe("strings.0.pullTest.deflectionMm");
  });
});

describe("setup sheet in the workshop's unit", () => {
  it("round-trips inches and lbf to the stored mm and N", () => {
    const mm = sheet();
    const shown = sheetToDisplay(mm, "in");
    expect(shown.strings[0]!.actionAt12Mm).toBe(0.0591); // 1.5 / 25.4 = 0.05906 → 4 places
    expect(shown.strings[0]!.pullTest!.forceN).toBe(0.4496); // 2 N / 4.4482216152605 = 0.44962 lbf → 4 places
    const back = sheetFromDisplay({ ...shown, strings: shown.strings.map((s) => ({ ...s, actionAt12Mm: 0.0625 })) }, "in");
    expect(back.strings[0]!.actionAt12Mm).toBeCloseTo(1.5875, 12); // 1/16 in exactly
    expect(back.strings[0]!.pullTest!.forceN).toBeCloseTo(2, 3);
  });

  it("writes the warnings in the workshop's unit", () => {
    const s = sheet();
    s.strings[1]!.actionAt12Mm = 3.175; // 1/8 in on the bass side
    const w = checkSetupSheet(s, DEFAULT_SETUP_RANGES.guitar, { stringCount: 2, unit: "in" }).find((i) => i.path === "strings.1.actionAt12Mm");
    expect(w!.message).toMatch(/^Action 0\.125 in is outside 0\.063–0\.094 in for the bass side/);
  });
});

describe("setup summary", () => {
  it("sums the sheet up in plain lines", () => {
    const lines = setupSummaryLines(sheet(), "mm", { revision: 2, builderName: "Ada Invented", ownerName: null, signedAt: "2026-12-01T10:00:00.000Z" });
    expect(lines).toEqual([
      "Action at the 12th fret: 1.50 mm (string 1) to 1.90 mm (string 2)",
      "Nut slot height over the 1st fret: 0.08-0.12 mm",
      "Intonation at the 12th fret: within 5.0 cents on every string",
      "Neck relief at the 8th fret: 0.22 mm",
      "Pickup height, bass/treble side: Neck 2.40/1.60 mm",
      "Electronics checks done: 2 of 8",
      "Signed off by Ada Invented on 2026-12-01 (revision 2)",
    ]);
  });
});
