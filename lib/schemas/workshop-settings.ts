// A workshop's settings as its owner changes them: one schema for the settings form, the stage
// template editor, PATCH /api/workshops/[workshop]/settings and lib/data/workshop-settings.ts.
import { z } from "zod";
import { templateProblems } from "@/lib/workflow/stages";
import { workshopCreateSchema } from "./workshop";

export const buildStageSchema = z.object({
  key: z.string().trim(),
  label: z.string().trim().min(1, "Give the stage a name.").max(60, "Use at most 60 characters."),
});

/** The ordered build stages, checked by the stage machine's own rules (paths `buildStages.N.key`). */
export const buildStagesSchema = z.array(buildStageSchema).superRefine((stages, ctx) => {
  for (const p of templateProblems(stages)) {
    const rest = p.path.split(".").slice(1);
    ctx.addIssue({ code: "custom", message: p.message, path: rest.map((s) => (/^\d+$/.test(s) ? Number(s) : s)) });
  }
});

// A sender name goes into an e-mail header: no line breaks, quotes or angle brackets.
const senderName = z
  .string()
  .trim()
  .max(120, "Use at most 120 characters.")
  .regex(/^[^\r\n"<>]*$/, "Leave out quotes, angle brackets and line breaks.")
  .transform((v) => (v === "" ? null : v))
  .nullable();

export const workshopSettingsPatchSchema = z
  .object({
    name: workshopCreateSchema.shape.name,
    unitPreference: workshopCreateSchema.shape.unitPreference,
    currency: workshopCreateSchema.shape.currency,
    depositPercent: z
      .number({ error: "Enter a percentage from 0 to 100." })
      .min(0, "At least 0 %.")
      .max(100, "At most 100 %.")
      .refine((v) => Math.abs(v * 100 - Math.round(v * 100)) < 1e-6, "At most two decimals."),
    buildStages: buildStagesSchema,
    requireStageSignoff: z.boolean({ error: "Choose on or off." }),
    emailSenderName: senderName,
  })
  .partial()
  .refine((v) => Object.keys(v).length > 0, { message: "Send at least one setting to change." });
export type WorkshopSettingsPatch = z.output<typeof workshopSettingsPatchSchema>;
export type WorkshopSettingsPatchInput = z.input<typeof workshopSettingsPatchSchema>;

/** The settings as GET …/settings and the settings page see them. */
export interface WorkshopSettingsOut {
  slug: string;
  name: string;
  unitPreference: "mm" | "in";
  currency: string;
  depositPercent: number;
  buildStages: Array<{ key: string; label: string }>;
  requireStageSignoff: boolean;
  emailSenderName: string | null;
  /** Where the logo is served to members (the authorised logo route); null until one is uploaded. */
  logoUrl: string | null;
}
