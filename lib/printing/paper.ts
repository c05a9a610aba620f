// Paper sizes for printouts, in millimetres (portrait).
// A4 per ISO 216 (210 × 297 mm) [standard]; US Letter 8.5 × 11 in = 215.9 × 279.4 mm [standard: ANSI/ASME Y14.1].

export const PAPER = {
  a4: { name: "A4", widthMm: 210, heightMm: 297 },
  letter: { name: "Letter", widthMm: 215.9, heightMm: 279.4 },
} as const;

export type PaperSize = keyof typeof PAPER;

export const MM_PER_INCH = 25.4;
/** PDF user space unit: 1/72 in. */
export const PT_PER_MM = 72 / MM_PER_INCH;

export const mmToPt = (mm: number) => mm * PT_PER_MM;
export const ptToMm = (pt: number) => pt / PT_PER_MM;
