// GET /api/workshops/[workshop]/commission-stages – the workshop's stage line and side states, for boards and filters (any member who sees commissions).
import { NextResponse } from "next/server";
import { withWorkshop } from "@/lib/auth/route-handlers";
import { getWorkshopSettings } from "@/lib/data/workshop-settings";
import { CANCELLED, ON_HOLD, stageLabel, stageLine } from "@/lib/workflow/stages";

export const GET = withWorkshop({ permission: "commission.read" }, async (_req, { scope }) => {
  const { buildStages } = await getWorkshopSettings(scope);
  const labelled = (key: string) => ({ key, label: stageLabel(key, buildStages) });
  return NextResponse.json({ stages: stageLine(buildStages).map(labelled), sideStages: [ON_HOLD, CANCELLED].map(labelled) });
});
