import { z } from "zod";
import { IMPOSSIBLE, type SetupRanges } from "../setup/ranges";

// A workshop's common-practice setup ranges, as the owner saves them (millimetres, cents). Each
// range must lie inside what can physically be measured, with its minimum not above its maximum.

const bound = z.number({ error: "Enter a number." }).finite();

function rangeSchema(limits: { min: number; max: number }, what: string) {
  return z
    .object({ min: bound, max: bound })
    .superRefine((r, ctx) => {
      if (r.min > r.max) ctx.addIssue({ code: "custom", path: ["min"], message: "The minimum must not be above the maximum." });
      for (const end of ["min", "max"] as const) {
        if (r[end] < limits.min || r[end] > limits.max) {
          ctx.addIssue({ code: "custom", path: [end], message: `${what} must be between ${limits.min} and ${limits.max} mm.` });
        }
      }
    });
}

export const familyRangesSchema = z.object({
  actionBassSideMm: rangeSchema(IMPOSSIBLE.actionMm, "An action"),
  actionTrebleSideMm: rangeSchema(IMPOSSIBLE.actionMm, "An action"),
  reliefMm: rangeSchema(IMPOSSIBLE.reliefMm, "A relief"),
  nutSlotMm: rangeSchema(IMPOSSIBLE.nutSlotMm, "A nut slot height"),
  pickupBassSideMm: rangeSchema(IMPOSSIBLE.pickupMm, "A pickup height"),
  pickupTrebleSideMm: rangeSchema(IMPOSSIBLE.pickupMm, "A pickup height"),
  intonationToleranceCents: z
    .number({ error: "Enter a number." })
    .finite()
    .min(0, "The tolerance cannot be negative.")
    .max(IMPOSSIBLE.intonationCents.max, `At most ${IMPOSSIBLE.intonationCents.max} cents.`),
}) satisfies z.ZodType<SetupRanges>;

export const setupRangesSchema = z.object({ guitar: familyRangesSchema, bass: familyRangesSchema });
export type WorkshopSetupRanges = z.infer<typeof setupRangesSchema>;

export { RANGE_FIELDS } from "./setup-ranges-values";
