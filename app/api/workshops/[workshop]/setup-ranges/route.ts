// GET    /api/workshops/[workshop]/setup-ranges – the workshop's common-practice setup ranges (mm, cents) and whether they are its own.
// PUT    /api/workshops/[workshop]/setup-ranges – the owner saves them {guitar, bass}; a bad range → 422 with field paths.
// DELETE /api/workshops/[workshop]/setup-ranges – the owner goes back to the defaults.
import { NextResponse } from "next/server";
import { withWorkshop } from "@/lib/auth/route-handlers";
import { getWorkshopSetupRanges, saveWorkshopSetupRanges } from "@/lib/data/setup-ranges";
import { readJson } from "@/lib/http/respond";
import { setupRangesSchema } from "@/lib/schemas/setup-ranges";

export const GET = withWorkshop({ permission: "setup.read" }, async (_req, { scope }) => NextResponse.json(await getWorkshopSetupRanges(scope)));

export const PUT = withWorkshop({ permission: "settings.manage" }, async (req, { scope }) => {
  const ranges = await readJson(req, setupRangesSchema);
  return NextResponse.json(await saveWorkshopSetupRanges(scope, ranges));
});

export const DELETE = withWorkshop({ permission: "settings.manage" }, async (_req, { scope }) => NextResponse.json(await saveWorkshopSetupRanges(scope, null)));
