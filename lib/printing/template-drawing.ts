// The fret-slot template's drawing, in board millimetres, from a stored build-math result (the
// approved spec version's `result`): nut, saddle line, every fret, centre line, fretboard outline.
// Pure. Board coordinates (lib/printing/fret-template-pdf.ts): x along the neck toward the bridge,
// 0 at the nut end nearest the headstock; y across, bass side negative.
import { widthAtFret } from "@/lib/lutherie/multiscale";
import { formatLength, toMm, type LengthUnit } from "@/lib/lutherie/units";
import type { ComputeResult } from "@/lib/schemas/instrument-spec";
import type { BoardPoint, FretTemplateDrawing, TemplateFret, TemplateLine } from "./fret-template-pdf";

/** How far the drawn board runs past the last fret, mm (a guide; the builder trims to taste). */
export const BOARD_RUN_OUT_MM = 6;

/**
 * Board widths used when the spec gives none: a guide for the outline only, labelled "assumed" on
 * the template. [common practice, no source] [from memory]: about 43/56 mm for a 6-string guitar,
 * 38/62 mm for a 4-string bass, wider per extra string.
 */
export function assumedWidthsMm(family: "guitar" | "bass", strings: number): { nut: number; lastFret: number } {
  if (family === "bass") return { nut: 38 + 9 * Math.max(0, strings - 4), lastFret: 62 + 15 * Math.max(0, strings - 4) };
  return { nut: 43 + 7.5 * Math.max(0, strings - 6), lastFret: 56 + 9 * Math.max(0, strings - 6) };
}

export interface TemplateDrawingInput {
  result: ComputeResult;
  /** The workshop's unit, for the printed distances. */
  unit: LengthUnit;
  title: string;
  subtitle: string;
}

export interface TemplateDrawingOutput extends FretTemplateDrawing {
  /** True when the spec had no widths and the outline uses assumedWidthsMm. */
  widthsAssumed: boolean;
}

/**
 * Along-board position of both ends of fret n, from the result alone: each edge is its own
 * single-scale string measured from its own nut end (fromNut), and the two nut ends differ by the
 * nut's offset (bass end minus treble end), SOURCES §2.3.
 */
function endsX(fromNut: { bass: number; treble: number }, nutOffset: number, shift: number) {
  return { bass: nutOffset + fromNut.bass - shift, treble: fromNut.treble - shift };
}

export function fretTemplateDrawing(input: TemplateDrawingInput): TemplateDrawingOutput {
  const { result, unit } = input;
  const mm = (v: number) => toMm(v, result.units);
  const frets = result.frets;
  const lastFret = frets.length - 1;
  const nutOffset = mm(frets[0]!.offset);
  // Origin on whichever nut end is nearer the headstock.
  const shift = Math.min(0, nutOffset);
  const given = frets[0]!.width !== null && frets[lastFret]!.width !== null;
  const widths = given ? { nut: mm(frets[0]!.width!), lastFret: mm(frets[lastFret]!.width!) } : assumedWidthsMm(result.family, result.strings.length);
  const halfWidth = (n: number) => widthAtFret(widths.nut, widths.lastFret, lastFret, n) / 2;

  const lineAt = (fromNut: { bass: number; treble: number }, half: { bass: number; treble: number }): TemplateLine => {
    const x = endsX(fromNut, nutOffset, shift);
    return { a: { x: x.bass, y: -half.bass }, b: { x: x.treble, y: half.treble } };
  };
  const fretLine = (n: number) => {
    const h = halfWidth(n);
    return lineAt({ bass: mm(frets[n]!.fromNut.bass), treble: mm(frets[n]!.fromNut.treble) }, { bass: h, treble: h });
  };

  const multi = result.scale.multiScale;
  const label = (n: number) => {
    const f = frets[n]!.fromNut;
    return multi
      ? `B ${formatLength(mm(f.bass), unit)} / T ${formatLength(mm(f.treble), unit)} ${unit}`
      : `${formatLength(mm(f.treble), unit)} ${unit}`;
  };
  const templateFrets: TemplateFret[] = [];
  for (let n = 1; n <= lastFret; n++) templateFrets.push({ n, label: label(n), ...fretLine(n) });

  // The saddle line: each edge's full scale from its nut end; drawn as wide as the board's taper
  // would be there, so it reads as a line across the strings rather than a board edge.
  const scaleMm = { bass: mm(result.scale.bass), treble: mm(result.scale.treble) };
  const saddleHalf = Math.max(halfWidth(lastFret), widths.lastFret / 2);
  const bridge = lineAt(scaleMm, { bass: saddleHalf, treble: saddleHalf });

  // Outline: nut ends, then each edge continued straight past the last fret by BOARD_RUN_OUT_MM.
  const nut = fretLine(0);
  const last = fretLine(lastFret);
  const runOut = (from: BoardPoint, to: BoardPoint): BoardPoint => {
    const dx = to.x - from.x;
    const dy = to.y - from.y;
    const k = (dx + BOARD_RUN_OUT_MM) / dx;
    return { x: from.x + dx * k, y: from.y + dy * k };
  };
  const outline = [nut.a, nut.b, runOut(nut.b, last.b), runOut(nut.a, last.a)];
  const centre: TemplateLine = { a: { x: (nut.a.x + nut.b.x) / 2, y: 0 }, b: { x: (bridge.a.x + bridge.b.x) / 2, y: 0 } };

  return {
    title: input.title,
    subtitle: given ? input.subtitle : `${input.subtitle} - board widths not in the spec: outline drawn at ${formatLength(widths.nut, unit)}/${formatLength(widths.lastFret, unit)} ${unit} (assumed)`,
    nut,
    bridge,
    frets: templateFrets,
    outline,
    centre,
    unit,
    widthsAssumed: !given,
  };
}

/** The template's second header line: which spec, which scale, how many frets. */
export function templateCaption(result: ComputeResult, unit: LengthUnit, spec: { version: number; approvedAt: string }): string {
  const L = (v: number) => formatLength(toMm(v, result.units), unit);
  const scale = result.scale.multiScale
    ? `multi-scale ${L(result.scale.bass)} ${unit} bass / ${L(result.scale.treble)} ${unit} treble, fret ${result.scale.perpendicularFret} square`
    : `scale ${L(result.scale.bass)} ${unit}`;
  return `Approved spec v${spec.version} (${spec.approvedAt.slice(0, 10)}): ${scale}, ${result.frets.length - 1} frets. Distances from the nut in ${unit}.`;
}
