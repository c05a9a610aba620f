"use server";

import { revalidatePath } from "next/cache";
import { z } from "zod";
import { workshopAction } from "@/lib/auth/actions";
import { createCohort, deleteCohort, updateCohort } from "@/lib/data/cohorts";
import { updateCommission } from "@/lib/data/commissions";
import { cohortAssignmentSchema, cohortCreateSchema } from "@/lib/schemas/cohort";
import { idParamSchema } from "@/lib/schemas/ids";

// Each action authorises itself (workshopAction) and refreshes the cohort pages and the overview.
const refresh = (slug: string) => {
  revalidatePath(`/${slug}/cohorts`, "layout");
  revalidatePath(`/${slug}/overview`);
};

export const createCohortAction = workshopAction({ permission: "cohort.manage", schema: cohortCreateSchema }, async (input, ctx) => {
  const cohort = await createCohort(ctx.scope, input);
  refresh(ctx.workshop.slug);
  return cohort;
});

/** The edit form sends every field; the cohort's builders are replaced by the list sent. */
export const updateCohortAction = workshopAction(
  { permission: "cohort.manage", schema: z.intersection(z.object({ cohortId: idParamSchema }), cohortCreateSchema) },
  async ({ cohortId, ...changes }, ctx) => {
    const cohort = await updateCohort(ctx.scope, cohortId, changes);
    refresh(ctx.workshop.slug);
    return cohort;
  },
);

export const deleteCohortAction = workshopAction({ permission: "cohort.manage", schema: z.object({ cohortId: idParamSchema }) }, async ({ cohortId }, ctx) => {
  const result = await deleteCohort(ctx.scope, cohortId);
  refresh(ctx.workshop.slug);
  return result;
});

/** Puts a commission into a cohort or takes it out, through the commission's own update. */
export const assignCohortAction = workshopAction({ permission: "commission.assign", schema: cohortAssignmentSchema }, async ({ commissionId, cohortId }, ctx) => {
  const c = await updateCommission(ctx.scope, commissionId, { cohortId });
  refresh(ctx.workshop.slug);
  return { id: c.id, number: c.number };
});
