// GET   /api/workshops/[workshop]/settings – the workshop's settings (owner).
// PATCH /api/workshops/[workshop]/settings – change any of them; a stage with commissions in it cannot be removed (409) (owner).
import { NextResponse } from "next/server";
import { withWorkshop } from "@/lib/auth/route-handlers";
import { getWorkshopSettings, toSettingsOut, updateWorkshopSettings } from "@/lib/data/workshop-settings";
import { readJson } from "@/lib/http/respond";
import { workshopSettingsPatchSchema } from "@/lib/schemas/workshop-settings";

export const GET = withWorkshop({ permission: "settings.manage" }, async (_req, { scope }) => {
  return NextResponse.json({ settings: toSettingsOut(await getWorkshopSettings(scope)) });
});

export const PATCH = withWorkshop({ permission: "settings.manage" }, async (req, { scope }) => {
  const patch = await readJson(req, workshopSettingsPatchSchema);
  return NextResponse.json({ settings: toSettingsOut(await updateWorkshopSettings(scope, patch)) });
});
