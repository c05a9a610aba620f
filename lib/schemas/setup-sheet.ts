import { z } from "zod";
import { ELECTRONICS_CHECKS, type ElectronicsCheckKey } from "./setup-sheet-values";

// The final setup sheet of a commission, as stored: every length in millimetres (forms convert
// from the workshop's unit before sending), forces in newtons, intonation in cents.

const mm = (what: string) => z.number({ error: `Enter ${what} as a number.` }).finite();

export { ELECTRONICS_CHECKS, type ElectronicsCheckKey } from "./setup-sheet-values";

export const pullTestSchema = z.object({
  forceN: mm("the force").positive("The force must be above zero."),
  deflectionMm: mm("the deflection").positive("The deflection must be above zero."),
  /** Span between the two support points (usually nut to saddle); the scale length when left out. */
  spanMm: mm("the span").positive().optional(),
});

export const setupStringSchema = z.object({
  /** 1 = highest-pitched string, as in the spec. */
  string: z.int().min(1).max(12),
  actionAt12Mm: mm("the action"),
  nutSlotAt1Mm: mm("the nut slot height"),
  intonationCents: z.number({ error: "Enter the error in cents." }).finite(),
  pullTest: pullTestSchema.nullish(),
});

export const setupSheetSchema = z.object({
  strings: z.array(setupStringSchema).min(1, "Record at least one string.").max(12),
  neck: z.object({
    reliefMm: mm("the relief"),
    reliefAtFret: z.union([z.literal(7), z.literal(8), z.literal(9)]),
    trussRodNotes: z.string().max(2000).default(""),
  }),
  pickups: z
    .array(
      z.object({
        label: z.string().trim().min(1).max(40),
        bassSideMm: mm("the bass-side height"),
        trebleSideMm: mm("the treble-side height"),
      }),
    )
    .max(6),
  electronics: z.object({
    checks: z.partialRecord(z.enum(ELECTRONICS_CHECKS.map((c) => c.key) as [ElectronicsCheckKey, ...ElectronicsCheckKey[]]), z.boolean()),
    notes: z.string().max(2000).default(""),
  }),
  notes: z.string().max(4000).default(""),
});

export type SetupSheet = z.infer<typeof setupSheetSchema>;
export type SetupString = z.infer<typeof setupStringSchema>;
