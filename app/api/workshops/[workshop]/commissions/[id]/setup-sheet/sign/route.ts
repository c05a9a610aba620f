// POST /api/workshops/[workshop]/commissions/[id]/setup-sheet/sign – sign the current revision {revision} (builder locks it; the owner countersigns when the workshop requires it).
import { NextResponse } from "next/server";
import { z } from "zod";
import { withWorkshop } from "@/lib/auth/route-handlers";
import { signSetupSheet } from "@/lib/data/setup-sheets";
import { readJson } from "@/lib/http/respond";
import { idParamSchema } from "@/lib/schemas/ids";
import { setupSignSchema } from "@/lib/schemas/setup-sheet-out";

const params = z.object({ id: idParamSchema });

export const POST = withWorkshop({ permission: "setup.signoff", params }, async (req, { scope, params }) => {
  const { revision } = await readJson(req, setupSignSchema);
  return NextResponse.json({ setup: await signSetupSheet(scope, params.id, revision) });
});
