"use server";

import { revalidatePath } from "next/cache";
import { workshopAction } from "@/lib/auth/actions";
import { toSettingsOut, updateWorkshopSettings } from "@/lib/data/workshop-settings";
import { workshopSettingsPatchSchema } from "@/lib/schemas/workshop-settings";

// Both settings forms save through this one action; the name shows in every page's header, so the
// whole workshop layout is refreshed.
export const updateSettingsAction = workshopAction({ permission: "settings.manage", schema: workshopSettingsPatchSchema }, async (patch, ctx) => {
  const settings = toSettingsOut(await updateWorkshopSettings(ctx.scope, patch));
  revalidatePath(`/${ctx.workshop.slug}`, "layout");
  return settings;
});
