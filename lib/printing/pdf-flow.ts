// A small top-to-bottom text layout on pdf-lib for document printouts (the build sheet): headings,
// wrapped paragraphs, label/value lists and tables whose header repeats on each new page, with
// "page i of n" footers added at the end.
import { PDFDocument, StandardFonts, rgb, type PDFFont, type PDFImage, type PDFPage, type RGB } from "pdf-lib";
import { PAPER, mmToPt, type PaperSize } from "./paper";
import { pdfSafe } from "./pdf-text";

export const INK = rgb(0.1, 0.1, 0.1);
export const MUTED = rgb(0.42, 0.42, 0.42);
export const ACCENT = rgb(0.44, 0.18, 0.16);
const RULE = rgb(0.78, 0.78, 0.78);

export interface Column {
  label: string;
  /** Share of the content width. */
  width: number;
  align?: "left" | "right";
}

export class PdfFlow {
  private page!: PDFPage;
  private y = 0;
  readonly margin = mmToPt(15);
  readonly width: number;
  readonly height: number;

  private constructor(
    readonly doc: PDFDocument,
    readonly font: PDFFont,
    readonly bold: PDFFont,
    paper: PaperSize,
    private readonly footer: string,
  ) {
    this.width = mmToPt(PAPER[paper].widthMm);
    this.height = mmToPt(PAPER[paper].heightMm);
    this.newPage();
  }

  static async create(paper: PaperSize, meta: { title: string; footer: string }): Promise<PdfFlow> {
    const doc = await PDFDocument.create();
    doc.setTitle(pdfSafe(meta.title));
    doc.setCreator("Scalewright");
    const [font, bold] = await Promise.all([doc.embedFont(StandardFonts.Helvetica), doc.embedFont(StandardFonts.HelveticaBold)]);
    return new PdfFlow(doc, font, bold, paper, meta.footer);
  }

  get contentWidth(): number {
    return this.width - 2 * this.margin;
  }

  private newPage() {
    this.page = this.doc.addPage([this.width, this.height]);
    this.y = this.height - this.margin;
  }

  /** Starts a new page unless `pt` of height is left above the footer. */
  ensure(pt: number) {
    if (this.y - pt < this.margin + 14) this.newPage();
  }

  space(mm: number) {
    this.y -= mmToPt(mm);
  }

  /** Draws an image with its top-right corner at the current line's right margin (no flow). */
  imageTopRight(image: PDFImage, heightMm: number) {
    const h = mmToPt(heightMm);
    const w = (image.width / image.height) * h;
    this.page.drawImage(image, { x: this.width - this.margin - w, y: this.y - h, width: w, height: h });
  }

  /** Splits text into lines no wider than `maxWidth` at `size`. */
  wrap(text: string, size: number, maxWidth: number, font = this.font): string[] {
    const lines: string[] = [];
    for (const para of text.split("\n")) {
      let line = "";
      for (const word of pdfSafe(para).split(/\s+/)) {
        const next = line ? `${line} ${word}` : word;
        if (font.widthOfTextAtSize(next, size) <= maxWidth || !line) line = next;
        else {
          lines.push(line);
          line = word;
        }
      }
      lines.push(line);
    }
    return lines;
  }

  text(text: string, opts: { size?: number; bold?: boolean; color?: RGB; indentMm?: number } = {}) {
    const size = opts.size ?? 9;
    const font = opts.bold ? this.bold : this.font;
    const indent = mmToPt(opts.indentMm ?? 0);
    for (const line of this.wrap(text, size, this.contentWidth - indent, font)) {
      this.ensure(size * 1.35);
      this.y -= size * 1.35;
      this.page.drawText(line, { x: this.margin + indent, y: this.y + size * 0.3, size, font, color: opts.color ?? INK });
    }
  }

  heading(text: string, level: 1 | 2 = 2) {
    const size = level === 1 ? 16 : 11.5;
    this.ensure(size * 3);
    this.space(level === 1 ? 0 : 3);
    this.text(text, { size, bold: true, color: level === 1 ? INK : ACCENT });
    if (level === 2) {
      this.page.drawLine({ start: { x: this.margin, y: this.y }, end: { x: this.width - this.margin, y: this.y }, thickness: 0.5, color: RULE });
      this.space(1.5);
    }
  }

  /** Label: value pairs in two columns (labels muted). */
  pairs(rows: Array<[string, string]>, size = 8.5) {
    const labelWidth = this.contentWidth * 0.3;
    for (const [label, value] of rows) {
      const lines = this.wrap(value, size, this.contentWidth - labelWidth);
      this.ensure(size * 1.35 * lines.length);
      lines.forEach((line, i) => {
        this.y -= size * 1.35;
        if (i === 0) this.page.drawText(pdfSafe(label), { x: this.margin, y: this.y + size * 0.3, size, font: this.font, color: MUTED });
        this.page.drawText(line, { x: this.margin + labelWidth, y: this.y + size * 0.3, size, font: this.font, color: INK });
      });
    }
  }

  /** A table; cells too wide for their column are shortened with "...". */
  table(columns: Column[], rows: string[][], size = 7.5) {
    const rowHeight = size * 1.55;
    const xs: number[] = [];
    let x = this.margin;
    for (const c of columns) {
      xs.push(x);
      x += c.width * this.contentWidth;
    }
    const drawRow = (cells: string[], font: PDFFont, color: RGB) => {
      this.y -= rowHeight;
      cells.forEach((cell, i) => {
        const col = columns[i]!;
        const w = col.width * this.contentWidth - 4;
        const text = fit(pdfSafe(cell), font, size, w);
        const tx = col.align === "right" ? xs[i]! + w - font.widthOfTextAtSize(text, size) : xs[i]!;
        this.page.drawText(text, { x: tx, y: this.y + size * 0.45, size, font, color });
      });
    };
    const header = () => {
      drawRow(columns.map((c) => c.label), this.bold, MUTED);
      this.page.drawLine({ start: { x: this.margin, y: this.y + 1 }, end: { x: this.width - this.margin, y: this.y + 1 }, thickness: 0.4, color: RULE });
    };
    this.ensure(rowHeight * 3);
    header();
    for (const r of rows) {
      if (this.y - rowHeight < this.margin + 14) {
        this.newPage();
        header();
      }
      drawRow(r, this.font, INK);
    }
    this.space(2);
  }

  /** Footers on every page, then the file. */
  async save(): Promise<Uint8Array> {
    const pages = this.doc.getPages();
    pages.forEach((p, i) => {
      const text = pdfSafe(`${this.footer} - page ${i + 1} of ${pages.length}`);
      p.drawText(text, { x: this.margin, y: this.margin - 4, size: 7, font: this.font, color: MUTED });
    });
    return this.doc.save();
  }
}

function fit(text: string, font: PDFFont, size: number, width: number): string {
  if (font.widthOfTextAtSize(text, size) <= width) return text;
  let t = text;
  while (t.length > 1 && font.widthOfTextAtSize(`${t}...`, size) > width) t = t.slice(0, -1);
  return `${t}...`;
}
