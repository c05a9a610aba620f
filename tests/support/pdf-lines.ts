// Reads a PDF back with pdfjs-dist (Mozilla's PDF parser) and returns every stroked straight
// segment per page in millimetres, with its line width and whether it was dashed.
import { createRequire } from "node:module";
import { dirname, join } from "node:path";
import { getDocument, OPS } from "pdfjs-dist/legacy/build/pdf.mjs";

const fontsDir = join(dirname(createRequire(import.meta.url).resolve("pdfjs-dist/package.json")), "standard_fonts/");

const MM_PER_PT = 25.4 / 72;

export interface PdfSegment {
  x1: number;
  y1: number;
  x2: number;
  y2: number;
  widthPt: number;
  dashed: boolean;
}

export interface PdfPageLines {
  widthMm: number;
  heightMm: number;
  segments: PdfSegment[];
  text: string;
}

// DrawOPS codes inside a constructPath's path data (pdfjs ≥ 5).
const MOVE = 0;
const LINE = 1;

export async function readPdfLines(data: Uint8Array): Promise<PdfPageLines[]> {
  const doc = await getDocument({ data: data.slice(), isEvalSupported: false, useSystemFonts: false, standardFontDataUrl: fontsDir }).promise;
  const pages: PdfPageLines[] = [];
  for (let p = 1; p <= doc.numPages; p++) {
    const page = await doc.getPage(p);
    const [x0, y0, x1, y1] = page.view as [number, number, number, number];
    const ops = await page.getOperatorList();
    const segments: PdfSegment[] = [];
    let width = 1;
    let dashed = false;
    const stack: Array<{ width: number; dashed: boolean }> = [];
    for (let i = 0; i < ops.fnArray.length; i++) {
      const fn = ops.fnArray[i];
      const args = ops.argsArray[i] as unknown[];
      if (fn === OPS.save) stack.push({ width, dashed });
      else if (fn === OPS.restore) ({ width, dashed } = stack.pop() ?? { width: 1, dashed: false });
      else if (fn === OPS.setLineWidth) width = args[0] as number;
      else if (fn === OPS.setDash) dashed = ((args[0] as number[]) ?? []).length > 0;
      else if (fn === OPS.transform) throw new Error("transforms are not expected in these printouts");
      else if (fn === OPS.constructPath && args[0] === OPS.stroke) {
        const path = (args[1] as ArrayLike<number>[])[0]!;
        let cx = 0;
        let cy = 0;
        for (let k = 0; k < path.length; ) {
          const op = path[k++];
          if (op === MOVE) {
            cx = path[k++]!;
            cy = path[k++]!;
          } else if (op === LINE) {
            const nx = path[k++]!;
            const ny = path[k++]!;
            segments.push({ x1: cx * MM_PER_PT, y1: cy * MM_PER_PT, x2: nx * MM_PER_PT, y2: ny * MM_PER_PT, widthPt: width, dashed });
            cx = nx;
            cy = ny;
          } else throw new Error(`unexpected path op ${op}`);
        }
      }
    }
    const content = await page.getTextContent();
    const text = content.items.map((it) => ("str" in it ? it.str : "")).join(" ");
    pages.push({ widthMm: (x1 - x0) * MM_PER_PT, heightMm: (y1 - y0) * MM_PER_PT, segments, text });
  }
  return pages;
}
