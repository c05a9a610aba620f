// The build sheet read back with pdfjs-dist: page size, the spec's tables in the workshop's unit,
// the stages, the setup sheet with its figures, the cautions, and the logo hook.
// Sources: A4 = 210 × 297 mm [standard: ISO 216]; Letter = 215.9 × 279.4 mm [standard: ANSI/ASME
// Y14.1]; d_12 = L/2 [textbook, 12-TET identity]; 1 in = 25.4 mm [standard: 1959 inch].
import sharp from "sharp";
import { describe, expect, it } from "vitest";
import { getDocument, OPS } from "pdfjs-dist/legacy/build/pdf.mjs";
import { computeSpec } from "@/lib/lutherie/compute-spec";
import { presetById } from "@/lib/lutherie/presets";
import { renderBuildSheetPdf, type BuildSheetData } from "@/lib/printing/build-sheet-pdf";
import { setupSheetSchema } from "@/lib/schemas/setup-sheet";
import { checkSetupSheet } from "@/lib/setup/checks";
import { setupFigures, specStrings } from "@/lib/setup/figures";
import { DEFAULT_SETUP_RANGES } from "@/lib/setup/ranges";
import { readPdfLines } from "../../support/pdf-lines";

function data(unit: "mm" | "in", withSetup = true): BuildSheetData {
  const spec = structuredClone(presetById("six").spec);
  const result = computeSpec(spec);
  const strings = specStrings(result);
  const values = setupSheetSchema.parse({
    strings: strings.map((s) => ({ string: s.string, actionAt12Mm: s.string > 3 ? 2.0 : 1.6, nutSlotAt1Mm: 0.1, intonationCents: s.string === 1 ? 5 : 0.5 })),
    neck: { reliefMm: 0.2, reliefAtFret: 8, trussRodNotes: "Quarter turn clockwise, settled overnight" },
    pickups: [{ label: "Bridge", bassSideMm: 2.4, trebleSideMm: 1.6 }],
    electronics: { checks: { jack_output: true, string_ground: true } },
  });
  const revision = {
    id: 1,
    revision: 2,
    status: "signed" as const,
    values,
    specVersion: 1,
    reopenNote: null,
    createdAt: "2026-12-01T09:00:00.000Z",
    updatedAt: "2026-12-01T09:00:00.000Z",
    updatedBy: { id: 2, name: "Ada Invented" },
    builderSignedAt: "2026-12-01T10:00:00.000Z",
    builderSignedBy: { id: 2, name: "Ada Invented" },
    ownerSignedAt: null,
    ownerSignedBy: null,
    signedAt: "2026-12-01T10:00:00.000Z",
  };
  return {
    workshopName: "Example Bench Works",
    logo: null,
    unit,
    generatedAt: "2026-12-02T08:00:00.000Z",
    commission: { number: "2026-007", title: "Test six-string", clientName: "Cal Client", builderName: "Ada Invented", stageLabel: "Final setup", targetDate: null },
    spec: { version: 1, approvedAt: "2026-11-01T12:00:00.000Z", spec, result },
    stages: [
      { at: "2026-11-01T12:00:00.000Z", fromLabel: "Spec", toLabel: "Deposit", actor: "Owen Owner", note: null },
      { at: "2026-11-20T12:00:00.000Z", fromLabel: "Assembly and electronics", toLabel: "Final setup", actor: "Ada Invented", note: "Strung up" },
    ],
    setup: withSetup
      ? { revision, figures: setupFigures(values, strings), issues: checkSetupSheet(values, DEFAULT_SETUP_RANGES.guitar, { stringCount: 6, strings, unit }) }
      : null,
  };
}

const allText = async (bytes: Uint8Array) => (await readPdfLines(bytes)).map((p) => p.text).join(" ");

describe("build sheet", () => {
  it.each([
    ["a4", 210, 297],
    ["letter", 215.9, 279.4],
  ] as const)("is laid out on %s at its exact size", async (paper, w, h) => {
    const pages = await readPdfLines(await renderBuildSheetPdf(data("mm"), paper));
    expect(pages.length).toBeGreaterThanOrEqual(2);
    for (const [i, p] of pages.entries()) {
      expect(p.widthMm).toBeCloseTo(w, 6);
      expect(p.heightMm).toBeCloseTo(h, 6);
      expect(p.text).toContain(`page ${i + 1} of ${pages.length}`);
    }
  });

  it("carries the workshop, the spec's tables, the stages, the setup sheet and the cautions", async () => {
    const text = await allText(await renderBuildSheetPdf(data("mm"), "a4"));
    for (const s of ["Example Bench Works", "Build sheet 2026-007: Test six-string", "Version 1, approved 2026-11-01", "Frets", "Strings and tensions", "Pickups", "Stages"]) {
      expect(text).toContain(s);
    }
    // Fret 12 at half of the 648 mm scale (d_12 = L/2).
    expect(text).toContain("324.00");
    expect(text).toMatch(/Assembly and electronics -> Final setup/);
    expect(text).toContain("Final setup (revision 2, signed 2026-12-01)");
    expect(text).toContain("Quarter turn clockwise, settled overnight");
    // String 1, +5 cents on 648 mm: model B moves the saddle 1.88 mm back (worked by hand in tests/unit/setup/figures.test.ts).
    expect(text).toContain("1.88 back");
    expect(text).toMatch(/\[x\] Output jack tight/);
    expect(text).toMatch(/Print at 100% \(actual size\)/);
    expect(text).toMatch(/eye protection/);
    expect(text).toMatch(/local electrical codes and licensed practice/);
    expect(text).toMatch(/Saws and power tools/);
  });

  it("shows lengths in inches for a workshop that works in inches", async () => {
    const text = await allText(await renderBuildSheetPdf(data("in"), "letter"));
    expect(text).toContain("Frets (distances in in)");
    expect(text).toContain((324 / 25.4).toFixed(3)); // fret 12
  });

  it("leaves the setup section out when there is no sheet", async () => {
    const text = await allText(await renderBuildSheetPdf(data("mm", false), "a4"));
    expect(text).not.toContain("Final setup (revision");
  });

  it("draws the workshop's logo when the hook supplies one", async () => {
    const png = await sharp({ create: { width: 40, height: 20, channels: 3, background: { r: 120, g: 40, b: 30 } } }).png().toBuffer();
    const bytes = await renderBuildSheetPdf({ ...data("mm"), logo: { bytes: new Uint8Array(png), format: "png" } }, "a4");
    const doc = await getDocument({ data: bytes.slice(), isEvalSupported: false }).promise;
    const ops = await (await doc.getPage(1)).getOperatorList();
    expect(ops.fnArray).toContain(OPS.paintImageXObject);
  });
});
