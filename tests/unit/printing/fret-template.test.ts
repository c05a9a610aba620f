// The 1:1 fret-slot template read back with pdfjs-dist: every fret line where the fret rule puts
// it, on one page and across a tile boundary, page sizes and calibration rulers exact.
// Fret rule d_n = L·(1 − 2^(−n/12)) [textbook, 12-TET]. A4 = 210 × 297 mm [standard: ISO 216];
// Letter = 215.9 × 279.4 mm [standard: ANSI Y14.1]; 1 in = 25.4 mm [standard: 1959 inch].
import { beforeAll, describe, expect, it } from "vitest";
import { renderFretTemplatePdf, type FretTemplateDrawing } from "@/lib/printing/fret-template-pdf";
import { readPdfLines, type PdfPageLines, type PdfSegment } from "../../support/pdf-lines";

const TOL_MM = 0.05;
const L = 648;
const FRETS = 24;
const dn = (n: number) => L * (1 - 2 ** (-n / 12));

function singleScaleDrawing(): FretTemplateDrawing {
  const end = dn(FRETS) + 6;
  const half = (x: number) => (43 + (56 - 43) * (x / end)) / 2;
  return {
    title: "Test template",
    subtitle: "648 mm, 24 frets",
    nut: { a: { x: 0, y: -21.5 }, b: { x: 0, y: 21.5 } },
    bridge: { a: { x: L, y: -30 }, b: { x: L, y: 30 } },
    frets: Array.from({ length: FRETS }, (_, i) => {
      const x = dn(i + 1);
      return { n: i + 1, label: `${x.toFixed(2)} mm`, a: { x, y: -half(x) }, b: { x, y: half(x) } };
    }),
    outline: [
      { x: 0, y: -21.5 },
      { x: 0, y: 21.5 },
      { x: end, y: 28 },
      { x: end, y: -28 },
    ],
    centre: { a: { x: 0, y: 0 }, b: { x: L, y: 0 } },
  };
}

const horizontal = (s: PdfSegment) => Math.abs(s.y1 - s.y2) < 1e-6;
const length = (s: PdfSegment) => Math.hypot(s.x2 - s.x1, s.y2 - s.y1);
/** Fret slot lines: the hairlines across the board (board width 43–56 mm). */
const fretLines = (p: PdfPageLines) => p.segments.filter((s) => s.widthPt === 0.25 && horizontal(s) && length(s) > 40 && length(s) < 60);
/** The dashed alignment rule that crosses the page in an overlap. */
const alignRules = (p: PdfPageLines) => p.segments.filter((s) => s.dashed && horizontal(s) && length(s) > 150);

describe.each(["a4", "letter"] as const)("fret template on %s", (paper) => {
  let pages: PdfPageLines[];
  beforeAll(async () => {
    pages = await readPdfLines(await renderFretTemplatePdf(singleScaleDrawing(), paper));
  });

  it("has the exact page size", () => {
    const [w, h] = paper === "a4" ? [210, 297] : [215.9, 279.4];
    for (const p of pages) {
      expect(p.widthMm).toBeCloseTo(w, 3);
      expect(p.heightMm).toBeCloseTo(h, 3);
    }
  });

  it("tiles a 648 mm scale over several labelled pages", () => {
    expect(pages.length).toBeGreaterThanOrEqual(3);
    pages.forEach((p, i) => expect(p.text).toContain(`Page ${i + 1} of ${pages.length}`));
    for (const p of pages) expect(p.text).toMatch(/Print at 100% \(actual size\)/);
  });

  it("prints a 100 mm and a 4 in ruler on every page", () => {
    for (const p of pages) {
      const baselines = p.segments.filter((s) => s.widthPt === 0.4 && horizontal(s)).map(length);
      expect(baselines.some((l) => Math.abs(l - 100) < 1e-3)).toBe(true);
      expect(baselines.some((l) => Math.abs(l - 101.6) < 1e-3)).toBe(true);
    }
  });

  it("puts every fret of page 1 at d_n from the nut line", () => {
    const first = pages[0]!;
    const nut = first.segments.find((s) => s.widthPt === 0.6 && horizontal(s))!;
    const frets = fretLines(first);
    expect(frets.length).toBeGreaterThan(3);
    // Frets are numbered by their order down the page from the nut.
    const byDistance = frets.map((f) => nut.y1 - f.y1).sort((a, b) => a - b);
    byDistance.forEach((d, i) => expect(Math.abs(d - dn(i + 1))).toBeLessThan(TOL_MM));
  });

  it("continues exactly across each tile boundary, measured from the shared alignment rule", () => {
    const first = pages[0]!;
    const nut = first.segments.find((s) => s.widthPt === 0.6 && horizontal(s))!;
    // The mark's board position as page 1 shows it (distance from the nut), then every later page
    // measured from that same mark: what taping the pages together does.
    let markFromNut = nut.y1 - alignRules(first)[0]!.y1;
    let fretIndex = fretLines(first).length;
    expect(pages.length).toBeGreaterThan(1);
    for (let i = 1; i < pages.length; i++) {
      const page = pages[i]!;
      const rules = alignRules(page).sort((a, b) => b.y1 - a.y1); // top first
      const top = rules[0]!;
      const frets = fretLines(page)
        .map((f) => markFromNut + (top.y1 - f.y1))
        .sort((a, b) => a - b);
      if (frets.length > 0) {
        // Frets in the overlap appear on both pages; find where this page's list starts.
        const startN = Math.round(12 * -Math.log2(1 - frets[0]! / L));
        frets.forEach((d, k) => expect(Math.abs(d - dn(startN + k)), `page ${i + 1}, fret ${startN + k}`).toBeLessThan(TOL_MM));
        fretIndex = startN + frets.length - 1;
      }
      if (rules[1]) markFromNut += top.y1 - rules[1].y1;
    }
    expect(fretIndex).toBe(FRETS);
  });
});
