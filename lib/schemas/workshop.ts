// The workshop (tenant): name, slug, unit preference and currency.
import { z } from "zod";

export { COMMON_CURRENCIES, slugFromName } from "./workshop-values";

export const UNIT_PREFERENCES = ["mm", "in"] as const;

const KNOWN_CURRENCIES = new Set(Intl.supportedValuesOf("currency"));

// Top-level paths the app uses itself: a workshop slug must never shadow them.
export const RESERVED_SLUGS = new Set([
  "account", "admin", "api", "app", "auth", "calculator", "help", "invitations", "new", "reset",
  "settings", "sign-in", "sign-out", "sign-up", "static", "workshops", "check-email", "_next",
]);

export const slugSchema = z
  .string({ error: "Choose a short address." })
  .trim()
  .toLowerCase()
  .min(3, "Use at least 3 characters.")
  .max(48, "Use at most 48 characters.")
  .regex(/^[a-z0-9]+(?:-[a-z0-9]+)*$/, "Use lower-case letters, digits and single hyphens, like my-workshop.")
  .refine((s) => !RESERVED_SLUGS.has(s), "This address is reserved; choose another.");

export const workshopCreateSchema = z.object({
  name: z.string({ error: "Enter the workshop's name." }).trim().min(2, "Use at least 2 characters.").max(120, "Use at most 120 characters."),
  slug: slugSchema,
  unitPreference: z.enum(UNIT_PREFERENCES, { error: "Choose millimetres or inches." }),
  currency: z
    .string({ error: "Choose a currency." })
    .trim()
    .toUpperCase()
    .refine((c) => KNOWN_CURRENCIES.has(c), "Choose a currency by its three-letter ISO 4217 code."),
});
export type WorkshopCreateInput = z.input<typeof workshopCreateSchema>;

/** A workshop as every API answer shows it. */
export const workshopOutSchema = z.object({
  slug: z.string(),
  name: z.string(),
  unitPreference: z.enum(UNIT_PREFERENCES),
  currency: z.string(),
});
