import { z } from "zod";
import { CURRENCIES } from "../money/money";
import { COMMISSION_SORTS } from "./commission-values";

// One schema per commission input, shared by the forms, the route handlers and lib/data.

const id = z.coerce.number().int().positive();
const isoDate = z.iso.date({ error: "Use a date like 2027-03-31." });

export const commissionCreateSchema = z.object({
  title: z.string().trim().min(3, "Give the commission a title (at least 3 characters).").max(160),
  /** Owner/builder create for a client; a client creating a request is their own client. */
  clientId: id.optional(),
  builderId: id.nullish(),
  priceMinor: z.int().min(0).max(1e11).default(0),
  currency: z.enum(CURRENCIES).optional(),
  depositPercent: z.number().min(0).max(100).optional(),
  targetDate: isoDate.nullish(),
  requestNotes: z.string().trim().max(4000).default(""),
});
export type CommissionCreate = z.infer<typeof commissionCreateSchema>;

export const commissionPatchSchema = z
  .object({
    title: z.string().trim().min(3).max(160),
    builderId: id.nullable(),
    priceMinor: z.int().min(0).max(1e11),
    depositPercent: z.number().min(0).max(100),
    /** An explicit deposit amount overrides the percentage (before approval only). */
    depositMinor: z.int().min(0).max(1e11),
    targetDate: isoDate.nullable(),
    /** The course cohort it is built in (owner), or null to take it out. */
    cohortId: id.nullable(),
  })
  .partial()
  .refine((v) => Object.keys(v).length > 0, { message: "Send at least one field to change." });
export type CommissionPatch = z.infer<typeof commissionPatchSchema>;

export { COMMISSION_SORTS } from "./commission-values";

const boolParam = z.enum(["true", "false", "1", "0"]).transform((v) => v === "true" || v === "1");

export const commissionListQuerySchema = z.object({
  stage: z.string().trim().max(40).regex(/^[a-z0-9_,]+$/, "Stages are lower-case keys, comma-separated.").optional(),
  builder: z.union([id, z.literal("none")]).optional(),
  client: id.optional(),
  cohort: id.optional(),
  overdue: boolParam.optional(),
  q: z.string().trim().max(80).optional(),
  sort: z.enum(COMMISSION_SORTS).default("-updated"),
  page: z.coerce.number().int().min(1).max(100_000).default(1),
  pageSize: z.coerce.number().int().min(1).max(200).default(25),
});
export type CommissionListQuery = z.infer<typeof commissionListQuerySchema>;

export const transitionSchema = z.object({
  action: z.enum(["advance", "back", "hold", "resume", "cancel"]),
  note: z.string().trim().max(1000).optional(),
});

export const commentSchema = z.object({
  body: z.string().trim().min(1, "Write something first.").max(4000, "At most 4000 characters."),
});

/** Tomorrow in UTC (YYYY-MM-DD): a workshop ahead of UTC may already be on that day. */
const tomorrowUtc = () => new Date(Date.now() + 86_400_000).toISOString().slice(0, 10);

export const offlinePaymentSchema = z.object({
  kind: z.enum(["deposit", "balance"]),
  amountMinor: z.int().positive().max(1e11),
  reference: z.string().trim().min(2, "Give the reference (bank transfer, receipt number…).").max(120),
  // The day the money arrived: not in the future, and inside what the payment's timestamp can hold.
  // (Checked only once it is a date, so a malformed one gets the one message about its format.)
  paidOn: isoDate
    .pipe(z.string().refine((d) => d >= "2000-01-01", "Use a date from 2000 on.").refine((d) => d <= tomorrowUtc(), "A payment cannot have arrived in the future."))
    .optional(),
});
