"use server";

import { revalidatePath } from "next/cache";
import { z } from "zod";
import { workshopAction } from "@/lib/auth/actions";
import { removeWorkshopLogo } from "@/lib/data/workshop-logo";
import { toSettingsOut, updateWorkshopSettings } from "@/lib/data/workshop-settings";
import { deleteStoredFiles } from "@/lib/photos/store";
import { workshopSettingsPatchSchema } from "@/lib/schemas/workshop-settings";

// Both settings forms save through this one action; the name shows in every page's header, so the
// whole workshop layout is refreshed.
export const updateSettingsAction = workshopAction({ permission: "settings.manage", schema: workshopSettingsPatchSchema }, async (patch, ctx) => {
  const settings = toSettingsOut(await updateWorkshopSettings(ctx.scope, patch));
  revalidatePath(`/${ctx.workshop.slug}`, "layout");
  return settings;
});

// The logo is uploaded through the `workshopLogo` file route; removing it happens here. The header
// of every page shows it, so the whole layout is refreshed.
export const removeLogoAction = workshopAction({ permission: "settings.manage", schema: z.object({}) }, async (_input, ctx) => {
  await removeWorkshopLogo(ctx.scope, deleteStoredFiles);
  revalidatePath(`/${ctx.workshop.slug}`, "layout");
  return { removed: true };
});
