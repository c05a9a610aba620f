"use server";

import { revalidatePath } from "next/cache";
import { z } from "zod";
import { workshopAction } from "@/lib/auth/actions";
import { saveWorkshopSetupRanges } from "@/lib/data/setup-ranges";
import { setupRangesSchema } from "@/lib/schemas/setup-ranges";

// The owner's edits of the workshop's common-practice setup ranges (mm and cents; the form converts).
export const saveSetupRangesAction = workshopAction({ permission: "settings.manage", schema: setupRangesSchema }, async (ranges, ctx) => {
  const saved = await saveWorkshopSetupRanges(ctx.scope, ranges);
  revalidatePath(`/${ctx.workshop.slug}/setup`);
  return saved;
});

export const resetSetupRangesAction = workshopAction({ permission: "settings.manage", schema: z.object({}) }, async (_input, ctx) => {
  const saved = await saveWorkshopSetupRanges(ctx.scope, null);
  revalidatePath(`/${ctx.workshop.slug}/setup`);
  return saved;
});
