// The fret template made from a build-math result, read back from the PDF with pdfjs-dist: on a
// 36-fret multi-scale neck every fret line's two ends sit where each edge's own fret rule puts them
// and as wide as the result says, within 0.05 mm, on the first page and on every later page when
// measured across the tape joints from the shared alignment rules.
// Sources: fret rule d_n = L·(1 − 2^(−n/12)) per edge, each edge its own single-scale string
// [textbook, 12-TET; SOURCES §2.2–2.3]; A4 = 210 × 297 mm [standard: ISO 216]; Letter =
// 215.9 × 279.4 mm [standard: ANSI/ASME Y14.1]; 1 in = 25.4 mm [standard: 1959 inch].
import { beforeAll, describe, expect, it } from "vitest";
import { computeSpec } from "@/lib/lutherie/compute-spec";
import { presetById } from "@/lib/lutherie/presets";
import { renderFretTemplatePdf } from "@/lib/printing/fret-template-pdf";
import { assumedWidthsMm, fretTemplateDrawing, templateCaption } from "@/lib/printing/template-drawing";
import type { ComputeResult, InstrumentSpec } from "@/lib/schemas/instrument-spec";
import { readPdfLines, type PdfPageLines, type PdfSegment } from "../../support/pdf-lines";

const TOL_MM = 0.05;
const LB = 711.2;
const LT = 647.7;
const FRETS = 36;
const dn = (L: number, n: number) => L * (1 - 2 ** (-n / 12));

function fannedSpec(): InstrumentSpec {
  const spec = structuredClone(presetById("fanned-eight").spec);
  return { ...spec, units: "mm", scale: { bass: LB, treble: LT, perpendicularFret: 8 }, frets: FRETS, nutWidth: 48, lastFretWidth: 72 };
}

const length = (s: PdfSegment) => Math.hypot(s.x2 - s.x1, s.y2 - s.y1);
const vertical = (s: PdfSegment) => Math.abs(s.x1 - s.x2) < 1e-6;
const horizontal = (s: PdfSegment) => Math.abs(s.y1 - s.y2) < 1e-6;
/** Slot hairlines (0.25 pt); ruler ticks share the width but are at most 3 mm long. */
const slotLines = (p: PdfPageLines) => p.segments.filter((s) => s.widthPt === 0.25 && !s.dashed && length(s) > 10);
const alignRules = (p: PdfPageLines) => p.segments.filter((s) => s.dashed && horizontal(s) && length(s) > 150).sort((a, b) => b.y1 - a.y1);
const centreX = (p: PdfPageLines) => p.segments.find((s) => s.dashed && vertical(s))!.x1;
/** A line's ends, bass (page-left) first. */
const ends = (s: PdfSegment) => (s.x1 < s.x2 ? [{ x: s.x1, y: s.y1 }, { x: s.x2, y: s.y2 }] : [{ x: s.x2, y: s.y2 }, { x: s.x1, y: s.y1 }]) as [{ x: number; y: number }, { x: number; y: number }];

/**
 * Where each page's top alignment rule sits along the board, mm from the bass nut end, as taping
 * the pages together carries it: page 1's rule measured from the nut, then each later page's
 * bottom rule measured from its top one.
 */
function topRuleAlong(pages: PdfPageLines[], nutBassY: number): number[] {
  const out = [Number.NaN];
  let mark = nutBassY - alignRules(pages[0]!)[0]!.y1;
  for (let i = 1; i < pages.length; i++) {
    out.push(mark);
    const rules = alignRules(pages[i]!);
    if (rules.length > 1) mark += rules[0]!.y1 - rules.at(-1)!.y1;
  }
  return out;
}

describe.each(["a4", "letter"] as const)("36-fret multi-scale template on %s", (paper) => {
  let result: ComputeResult;
  let pages: PdfPageLines[];
  beforeAll(async () => {
    result = computeSpec(fannedSpec());
    const drawing = fretTemplateDrawing({ result, unit: "mm", title: "Fanned test", subtitle: "x" });
    pages = await readPdfLines(await renderFretTemplatePdf(drawing, paper));
  });

  it("has exact page sizes, a 100 mm and a 4 in ruler and the print-at-100% line on every page", () => {
    const [w, h] = paper === "a4" ? [210, 297] : [215.9, 279.4];
    expect(pages.length).toBeGreaterThan(2);
    for (const [i, p] of pages.entries()) {
      expect(p.widthMm).toBeCloseTo(w, 6);
      expect(p.heightMm).toBeCloseTo(h, 6);
      // Exact up to pdf.js's 32-bit floats (a few nanometres).
      const baselines = p.segments.filter((s) => s.widthPt === 0.4 && horizontal(s)).map(length);
      expect(baselines.some((l) => Math.abs(l - 100) < 1e-4)).toBe(true);
      expect(baselines.some((l) => Math.abs(l - 4 * 25.4) < 1e-4)).toBe(true);
      expect(p.text).toContain(`Page ${i + 1} of ${pages.length}`);
      expect(p.text).toMatch(/Print at 100% \(actual size\)/);
      expect(p.text).toMatch(/eye protection/);
      expect(p.text).toMatch(/local electrical codes and licensed practice/);
    }
  });

  it("places every fret end by each edge's fret rule and the result's widths, across every tape joint", () => {
    const first = pages[0]!;
    const nut = first.segments.find((s) => s.widthPt === 0.6)!;
    const [nutBass, nutTreble] = ends(nut);
    // The nut's two ends are the result's nut offset apart along the board (bass minus treble).
    expect(Math.abs(nutTreble.y - nutBass.y - result.frets[0]!.offset)).toBeLessThan(TOL_MM);
    // Along-board positions are kept from the bass nut end; the treble nut end sits at the offset.
    const trebleNutAlong = nutBass.y - nutTreble.y;
    const marks = topRuleAlong(pages, nutBass.y);
    const whole = new Map<number, number>();
    for (const [i, page] of pages.entries()) {
      const cx = centreX(page);
      const along = (y: number) => (i === 0 ? nutBass.y - y : marks[i]! + (alignRules(page)[0]!.y1 - y));
      for (const seg of slotLines(page)) {
        const [b, t] = ends(seg);
        const ab = along(b.y);
        const at = along(t.y) - trebleNutAlong;
        const n = Math.round(12 * -Math.log2(1 - ab / LB));
        const row = result.frets[n];
        const isWhole = !!row && Math.abs(ab - dn(LB, n)) < TOL_MM && Math.abs(at - dn(LT, n)) < TOL_MM;
        if (isWhole) {
          // Across the board: the result's end points (x toward the bass edge from the centre line).
          expect(Math.abs(b.x - cx + row.ends!.bass.x), `page ${i + 1} fret ${n} bass x`).toBeLessThan(TOL_MM);
          expect(Math.abs(t.x - cx + row.ends!.treble.x), `page ${i + 1} fret ${n} treble x`).toBeLessThan(TOL_MM);
          whole.set(n, (whole.get(n) ?? 0) + 1);
        } else {
          // A piece cut at the page edge: both its ends lie on that fret's full line.
          const onLine = result.frets.slice(1).some((r, k) => {
            const p1 = { x: -r.ends!.bass.x, y: dn(LB, k + 1) };
            const p2 = { x: -r.ends!.treble.x, y: dn(LT, k + 1) + trebleNutAlong };
            const dist = (q: { x: number; y: number }) => Math.abs((p2.x - p1.x) * (p1.y - q.y) - (p1.x - q.x) * (p2.y - p1.y)) / Math.hypot(p2.x - p1.x, p2.y - p1.y);
            return dist({ x: b.x - cx, y: ab }) < TOL_MM && dist({ x: t.x - cx, y: at + trebleNutAlong }) < TOL_MM;
          });
          expect(onLine, `page ${i + 1}: a slot line that is no fret's`).toBe(true);
        }
      }
    }
    // Every fret is whole on at least one page; those in an overlap appear on both.
    for (let n = 1; n <= FRETS; n++) expect(whole.get(n), `fret ${n}`).toBeGreaterThanOrEqual(1);
    expect(whole.size).toBe(FRETS);
  });

  it("draws the saddle line at each edge's full scale from its nut end", () => {
    const last = pages.at(-1)!;
    const saddle = last.segments.filter((s) => s.widthPt === 0.6).at(-1)!;
    const [b, t] = ends(saddle);
    const [nutBass] = ends(pages[0]!.segments.find((s) => s.widthPt === 0.6)!);
    const markAlong = topRuleAlong(pages, nutBass.y).at(-1)!;
    const top = alignRules(last)[0]!.y1;
    const offset0 = result.frets[0]!.offset;
    expect(Math.abs(markAlong + (top - b.y) - LB)).toBeLessThan(TOL_MM);
    expect(Math.abs(markAlong + (top - t.y) - (LT - offset0))).toBeLessThan(TOL_MM);
  });
});

describe("template drawing", () => {
  it("labels distances from the nut in the workshop's unit and names the approved spec", () => {
    const spec = structuredClone(presetById("six").spec);
    const result = computeSpec(spec);
    const d = fretTemplateDrawing({ result, unit: "in", title: "t", subtitle: templateCaption(result, "in", { version: 3, approvedAt: "2026-12-01T10:00:00.000Z" }) });
    // Fret 12 at exactly half the scale [textbook, 12-TET identity d_12 = L/2]: 648 mm / 2 / 25.4.
    const f12 = d.frets.find((f) => f.n === 12)!;
    expect(f12.label).toBe(`${(324 / 25.4).toFixed(3)} in`);
    expect(d.subtitle).toMatch(/^Approved spec v3 \(2026-12-01\): scale 25\.512 in, 22 frets/);
  });

  it("draws an assumed outline, and says so, when the spec has no board widths", () => {
    const spec = structuredClone(presetById("six").spec);
    delete spec.nutWidth;
    delete spec.lastFretWidth;
    const d = fretTemplateDrawing({ result: computeSpec(spec), unit: "mm", title: "t", subtitle: "s" });
    expect(d.widthsAssumed).toBe(true);
    expect(d.subtitle).toMatch(/assumed/);
    const w = assumedWidthsMm("guitar", 6);
    expect(d.nut.b.y - d.nut.a.y).toBeCloseTo(w.nut, 9);
  });
});
