"use server";

import { revalidatePath } from "next/cache";
import { z } from "zod";
import { workshopAction } from "@/lib/auth/actions";
import { reopenSetupSheet, saveSetupSheet, signSetupSheet } from "@/lib/data/setup-sheets";
import { idParamSchema } from "@/lib/schemas/ids";
import { setupSheetSchema } from "@/lib/schemas/setup-sheet";
import { setupReopenSchema, setupSignSchema } from "@/lib/schemas/setup-sheet-out";

// The setup page's actions; each authorises itself (workshopAction) and calls the same data
// functions as the API routes. Values arrive in mm and N: the form converts before sending.
const commission = z.object({ commissionId: idParamSchema });
const refresh = (slug: string, id: number) => revalidatePath(`/${slug}/commissions/${id}/setup`);

export const saveSetupSheetAction = workshopAction(
  { permission: "setup.write", schema: commission.extend({ values: setupSheetSchema }) },
  async ({ commissionId, values }, ctx) => {
    const view = await saveSetupSheet(ctx.scope, commissionId, values);
    refresh(ctx.workshop.slug, commissionId);
    return view;
  },
);

export const signSetupSheetAction = workshopAction({ permission: "setup.signoff", schema: commission.extend(setupSignSchema.shape) }, async ({ commissionId, revision }, ctx) => {
  const view = await signSetupSheet(ctx.scope, commissionId, revision);
  refresh(ctx.workshop.slug, commissionId);
  return view;
});

export const reopenSetupSheetAction = workshopAction({ permission: "setup.write", schema: commission.extend(setupReopenSchema.shape) }, async ({ commissionId, note }, ctx) => {
  const view = await reopenSetupSheet(ctx.scope, commissionId, note);
  refresh(ctx.workshop.slug, commissionId);
  return view;
});
