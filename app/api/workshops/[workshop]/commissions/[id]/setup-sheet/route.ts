// GET /api/workshops/[workshop]/commissions/[id]/setup-sheet – the final setup sheet with checks and figures (a client: the latest signed revision; ?revision=N for an earlier one).
// PUT /api/workshops/[workshop]/commissions/[id]/setup-sheet – save the current draft (builder, owner); impossible values → 422 with field paths.
import { NextResponse } from "next/server";
import { z } from "zod";
import { withWorkshop } from "@/lib/auth/route-handlers";
import { getSetupSheetView, saveSetupSheet } from "@/lib/data/setup-sheets";
import { readJson, readQuery } from "@/lib/http/respond";
import { idParamSchema } from "@/lib/schemas/ids";
import { setupSheetSchema } from "@/lib/schemas/setup-sheet";
import { setupSheetQuerySchema } from "@/lib/schemas/setup-sheet-out";

const params = z.object({ id: idParamSchema });

export const GET = withWorkshop({ permission: "setup.read", params }, async (req, { scope, params }) => {
  const { revision } = readQuery(req, setupSheetQuerySchema);
  return NextResponse.json({ setup: await getSetupSheetView(scope, params.id, { revision }) });
});

export const PUT = withWorkshop({ permission: "setup.write", params }, async (req, { scope, params }) => {
  const values = await readJson(req, setupSheetSchema);
  return NextResponse.json({ setup: await saveSetupSheet(scope, params.id, values) });
});
