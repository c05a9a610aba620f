"use server";

import { revalidatePath } from "next/cache";
import { workshopAction } from "@/lib/auth/actions";
import { updateCommission } from "@/lib/data/commissions";
import { builderAssignmentSchema } from "@/lib/schemas/overview";

// Reassigning goes through the commission's own update (the same checks as PATCH …/commissions/[id]).
export const reassignBuilderAction = workshopAction({ permission: "commission.assign", schema: builderAssignmentSchema }, async ({ commissionId, builderId }, ctx) => {
  const c = await updateCommission(ctx.scope, commissionId, { builderId });
  revalidatePath(`/${ctx.workshop.slug}/overview`);
  return { id: c.id, number: c.number, builder: c.builder };
});
