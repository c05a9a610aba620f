// The 1:1 fret-slot template: every fret line at its exact position, the nut and saddle lines, the
// centre line and the fretboard outline, tiled across A4 or Letter pages with overlap, alignment
// marks, page labels and a calibration ruler on every page.
import { PDFDocument, StandardFonts, rgb, type PDFFont, type PDFPage } from "pdf-lib";
import { formatLength, type LengthUnit } from "@/lib/lutherie/units";
import { PAPER, mmToPt, type PaperSize } from "./paper";
import { pdfSafe } from "./pdf-text";
import { clipToWindow, planTiles, type Tile } from "./tiling";

/** A point on the board: x along the neck toward the bridge, y across (bass side negative), mm. */
export interface BoardPoint {
  x: number;
  y: number;
}

export interface TemplateLine {
  a: BoardPoint;
  b: BoardPoint;
}

export interface TemplateFret extends TemplateLine {
  n: number;
  /** Distance text printed beside the fret, already in the workshop's unit (e.g. "324.00 mm"). */
  label: string;
}

/** Everything the template shows, in board millimetres. */
export interface FretTemplateDrawing {
  title: string;
  subtitle: string;
  nut: TemplateLine;
  bridge: TemplateLine;
  frets: TemplateFret[];
  /** Fretboard outline, corners in order (nut bass, nut treble, end treble, end bass). */
  outline: BoardPoint[];
  /** Centre line from nut to bridge. */
  centre: TemplateLine;
  /** The unit of the page labels (the fret labels come already formatted); mm when left out. */
  unit?: LengthUnit;
}

export interface TemplateLayout {
  paper: PaperSize;
  marginMm: number;
  headerMm: number;
  footerMm: number;
  overlapMm: number;
  /** Where the board's centre line sits across the page, mm from the left edge. */
  centreXMm: number;
}

export const DEFAULT_LAYOUT: Omit<TemplateLayout, "paper"> = {
  marginMm: 10,
  headerMm: 24,
  footerMm: 40,
  overlapMm: 20,
  centreXMm: 80,
};

const INK = rgb(0, 0, 0);
const GREY = rgb(0.45, 0.45, 0.45);
const ACCENT = rgb(0.44, 0.18, 0.16);

export const CAUTIONS = [
  "PRINT AT 100% (ACTUAL SIZE) - NO 'FIT TO PAGE'. Measure both rulers before cutting: 100 mm and 4 in must measure exactly.",
  "Saws and power tools: follow their guards and instructions, clamp the work, wear eye and hearing protection, use dust extraction.",
  "Strings under tension can snap: wear eye protection when bringing strings to pitch. Mains-powered amplifiers and pickup wiring:",
  "follow local electrical codes and licensed practice. Figures are design estimates; check them against the approved spec.",
];

/** The page geometry in mm, and the board length one page shows. */
export function templatePageGeometry(layout: TemplateLayout) {
  const paper = PAPER[layout.paper];
  const windowMm = paper.heightMm - 2 * layout.marginMm - layout.headerMm - layout.footerMm;
  return { paper, windowMm, boardTopMm: layout.marginMm + layout.headerMm };
}

/** Tiles for a drawing: from a little before the nut to a little past the saddle line. */
export function templateTiles(drawing: FretTemplateDrawing, layout: TemplateLayout): Tile[] {
  const xs = [drawing.nut.a.x, drawing.nut.b.x, drawing.bridge.a.x, drawing.bridge.b.x, ...drawing.outline.map((p) => p.x)];
  const { windowMm } = templatePageGeometry(layout);
  return planTiles({ startMm: Math.min(...xs) - 8, endMm: Math.max(...xs) + 8, windowMm, overlapMm: layout.overlapMm });
}

/** Page coordinates (pt, origin bottom-left) of a board point on a given tile. */
export function boardToPage(p: BoardPoint, tile: Tile, layout: TemplateLayout): { x: number; y: number } {
  const { paper, boardTopMm } = templatePageGeometry(layout);
  const fromTopMm = boardTopMm + (p.x - tile.fromMm);
  return { x: mmToPt(layout.centreXMm + p.y), y: mmToPt(paper.heightMm - fromTopMm) };
}

/** Longest stretch of board one line covers (a slanted fret on a fanned neck), mm. */
function longestAxialExtent(d: FretTemplateDrawing): number {
  const lines = [d.nut, d.bridge, ...d.frets];
  return Math.max(...lines.map((l) => Math.abs(l.a.x - l.b.x)));
}

/**
 * The layout for a drawing on a paper size. The overlap grows with the fan so that every fret line
 * is whole on at least one page (and the tape joint crosses it on the other); the centre line moves
 * right for a wide board so the bass-side labels stay on the paper.
 */
export function layoutFor(drawing: FretTemplateDrawing, paper: PaperSize): TemplateLayout {
  const halfWidth = Math.max(...drawing.outline.map((p) => Math.abs(p.y)));
  return {
    paper,
    ...DEFAULT_LAYOUT,
    overlapMm: Math.max(DEFAULT_LAYOUT.overlapMm, Math.ceil(longestAxialExtent(drawing)) + 10),
    centreXMm: Math.max(DEFAULT_LAYOUT.centreXMm, DEFAULT_LAYOUT.marginMm + 16 + halfWidth),
  };
}

export async function renderFretTemplatePdf(drawing: FretTemplateDrawing, paperSize: PaperSize): Promise<Uint8Array> {
  const layout = layoutFor(drawing, paperSize);
  const { paper } = templatePageGeometry(layout);
  const doc = await PDFDocument.create();
  doc.setTitle(pdfSafe(`Fret template - ${drawing.title}`));
  doc.setCreator("Scalewright");
  const font = await doc.embedFont(StandardFonts.Helvetica);
  const bold = await doc.embedFont(StandardFonts.HelveticaBold);
  const tiles = templateTiles(drawing, layout);

  for (const tile of tiles) {
    const page = doc.addPage([mmToPt(paper.widthMm), mmToPt(paper.heightMm)]);
    drawHeader(page, drawing, tile, tiles.length, layout, font, bold);
    drawBoard(page, drawing, tile, layout, font);
    drawRulers(page, layout, font);
    drawCautions(page, layout, font);
  }
  return doc.save();
}

function line(page: PDFPage, a: { x: number; y: number }, b: { x: number; y: number }, thickness: number, color = INK, dash?: number[]) {
  page.drawLine({ start: a, end: b, thickness, color, dashArray: dash });
}

function drawBoard(page: PDFPage, d: FretTemplateDrawing, tile: Tile, layout: TemplateLayout, font: PDFFont) {
  const seg = (l: TemplateLine, thickness: number, color = INK, dash?: number[]) => {
    const c = clipToWindow({ x1: l.a.x, y1: l.a.y, x2: l.b.x, y2: l.b.y }, tile.fromMm, tile.toMm);
    if (!c) return;
    line(page, boardToPage({ x: c.x1, y: c.y1 }, tile, layout), boardToPage({ x: c.x2, y: c.y2 }, tile, layout), thickness, color, dash);
  };
  // Outline and centre line first, thin and grey, so fret lines print on top.
  for (let i = 0; i < d.outline.length; i++) {
    seg({ a: d.outline[i]!, b: d.outline[(i + 1) % d.outline.length]! }, 0.4, GREY);
  }
  seg(d.centre, 0.3, GREY, [4, 2, 1, 2]);
  // Slot lines are hairlines (0.25 pt ≈ 0.09 mm) so the saw can split them.
  seg(d.nut, 0.6, ACCENT);
  seg(d.bridge, 0.6, ACCENT);
  for (const f of d.frets) seg(f, 0.25);

  const text = (s: string, p: { x: number; y: number }, size = 6, color = INK) => page.drawText(pdfSafe(s), { x: p.x, y: p.y, size, font, color });
  const inside = (x: number) => x >= tile.fromMm && x <= tile.toMm;
  const labelAt = (l: TemplateLine, name: string) => {
    const bass = l.a.y < l.b.y ? l.a : l.b;
    const treble = l.a.y < l.b.y ? l.b : l.a;
    if (inside(bass.x)) text(name, offset(boardToPage(bass, tile, layout), -mmToPt(14), -2));
    return treble;
  };
  const nutTreble = labelAt(d.nut, "NUT");
  if (inside(nutTreble.x)) text("0", offset(boardToPage(nutTreble, tile, layout), mmToPt(3), -2));
  labelAt(d.bridge, "SADDLE");
  for (const f of d.frets) {
    const treble = labelAt(f, String(f.n));
    if (inside(treble.x)) text(f.label, offset(boardToPage(treble, tile, layout), mmToPt(3), -2));
  }

  // Alignment marks: a crosshair either side of the board and a dashed rule across at the same
  // board position on both pages of an overlap.
  for (const mark of tile.alignMarksMm) {
    const left = boardToPage({ x: mark, y: -layout.centreXMm + layout.marginMm + 4 }, tile, layout);
    const right = boardToPage({ x: mark, y: PAPER[layout.paper].widthMm - layout.marginMm - 14 - layout.centreXMm }, tile, layout);
    line(page, left, right, 0.3, GREY, [3, 3]);
    for (const c of [left, right]) {
      line(page, offset(c, -8, 0), offset(c, 8, 0), 0.5);
      line(page, offset(c, 0, -8), offset(c, 0, 8), 0.5);
    }
    text("ALIGN", offset(right, 10, -2), 6, GREY);
  }
}

const offset = (p: { x: number; y: number }, dx: number, dy: number) => ({ x: p.x + dx, y: p.y + dy });

function drawHeader(page: PDFPage, d: FretTemplateDrawing, tile: Tile, count: number, layout: TemplateLayout, font: PDFFont, bold: PDFFont) {
  const { paper } = templatePageGeometry(layout);
  const top = mmToPt(paper.heightMm - layout.marginMm);
  const x = mmToPt(layout.marginMm);
  page.drawText(pdfSafe(d.title), { x, y: top - 10, size: 11, font: bold });
  page.drawText(pdfSafe(d.subtitle), { x, y: top - 22, size: 8, font });
  const unit = d.unit ?? "mm";
  const at = (mm: number) => formatLength(mm, unit);
  const label = `Page ${tile.index + 1} of ${count} - board ${at(tile.fromMm)} to ${at(tile.toMm)} ${unit} from the nut - ${PAPER[layout.paper].name}`;
  page.drawText(pdfSafe(label), { x, y: top - 34, size: 8, font: bold, color: ACCENT });
  page.drawText("Print at 100% (actual size), never 'fit to page'. Check the rulers below before cutting.", { x, y: top - 46, size: 7, font, color: ACCENT });
}

/** The calibration rulers' start on the page, mm from the left and bottom edges. */
export const RULER_ORIGIN_MM = { x: 20, yMetric: 30, yImperial: 20 };

function drawRulers(page: PDFPage, layout: TemplateLayout, font: PDFFont) {
  void layout;
  const { x, yMetric, yImperial } = RULER_ORIGIN_MM;
  const base = (y: number) => ({ x: mmToPt(x), y: mmToPt(y) });
  // 100 mm with 1 mm ticks (5 and 10 mm longer).
  line(page, base(yMetric), { x: mmToPt(x + 100), y: mmToPt(yMetric) }, 0.4);
  for (let i = 0; i <= 100; i++) {
    const h = i % 10 === 0 ? 3 : i % 5 === 0 ? 2 : 1;
    line(page, { x: mmToPt(x + i), y: mmToPt(yMetric) }, { x: mmToPt(x + i), y: mmToPt(yMetric + h) }, 0.25);
  }
  page.drawText("100 mm", { x: mmToPt(x + 103), y: mmToPt(yMetric), size: 7, font });
  // 4 in with 1/16 in ticks.
  line(page, base(yImperial), { x: mmToPt(x + 101.6), y: mmToPt(yImperial) }, 0.4);
  for (let i = 0; i <= 64; i++) {
    const xi = x + (i * 25.4) / 16;
    const h = i % 16 === 0 ? 3 : i % 4 === 0 ? 2 : 1;
    line(page, { x: mmToPt(xi), y: mmToPt(yImperial) }, { x: mmToPt(xi), y: mmToPt(yImperial + h) }, 0.25);
  }
  page.drawText("4 in", { x: mmToPt(x + 104.6), y: mmToPt(yImperial), size: 7, font });
}

function drawCautions(page: PDFPage, layout: TemplateLayout, font: PDFFont) {
  CAUTIONS.forEach((c, i) => page.drawText(c, { x: mmToPt(layout.marginMm), y: mmToPt(14 - i * 3), size: 5.5, font, color: GREY }));
}
