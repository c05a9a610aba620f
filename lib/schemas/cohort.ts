// Course cohorts: a school's production course, with its dates and builders. One schema each for
// create and change, shared by the cohort forms, the route handlers and lib/data/cohorts.ts.
import { z } from "zod";
import { idParamSchema } from "./ids";
import type { OverviewCommission } from "./overview";

const day = z.iso.date({ error: "Use a date like 2027-03-31." });

const fields = {
  name: z.string({ error: "Give the cohort a name." }).trim().min(2, "Use at least 2 characters.").max(120, "Use at most 120 characters."),
  startsOn: day,
  endsOn: day,
  /** The cohort's builders (user ids of builders of this workshop); a change replaces the list. */
  builderIds: z.array(idParamSchema).max(200, "At most 200 builders.").refine((ids) => new Set(ids).size === ids.length, "Each builder once."),
};

const datesInOrder = (v: { startsOn?: string; endsOn?: string }) => !v.startsOn || !v.endsOn || v.endsOn >= v.startsOn;
const DATES_MESSAGE = { path: ["endsOn"], message: "The end date cannot be before the start date." };

export const cohortCreateSchema = z.object({ ...fields, builderIds: fields.builderIds.default([]) }).refine(datesInOrder, DATES_MESSAGE);
export type CohortCreate = z.output<typeof cohortCreateSchema>;
export type CohortCreateInput = z.input<typeof cohortCreateSchema>;

export const cohortPatchSchema = z
  .object(fields)
  .partial()
  .refine((v) => Object.keys(v).length > 0, { message: "Send at least one field to change." })
  .refine(datesInOrder, DATES_MESSAGE);
export type CohortPatch = z.output<typeof cohortPatchSchema>;

/** Putting a commission into a cohort, or taking it out (null). */
export const cohortAssignmentSchema = z.object({ commissionId: idParamSchema, cohortId: idParamSchema.nullable() });

export interface CohortStageCount {
  stage: string;
  label: string;
  n: number;
}

/** A cohort as the routes answer it; `progress` counts the commissions the caller may see. */
export interface CohortOut {
  id: number;
  name: string;
  startsOn: string;
  endsOn: string;
  builders: Array<{ id: number; name: string }>;
  progress: {
    total: number;
    open: number;
    overdue: number;
    delivered: number;
    cancelled: number;
    /** Delivered ÷ (all − cancelled), 0…1; null when the cohort has no commission yet. */
    shareDelivered: number | null;
    byStage: CohortStageCount[];
  };
}

/** A commission in a cohort: its short form, and whether it is overdue. */
export type CohortCommission = OverviewCommission & { overdue: boolean };

export interface CohortDetail extends CohortOut {
  commissions: CohortCommission[];
}
