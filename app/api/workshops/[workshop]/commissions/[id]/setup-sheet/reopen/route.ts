// POST /api/workshops/[workshop]/commissions/[id]/setup-sheet/reopen – start the next revision of a signed sheet {note} (builder, owner).
import { NextResponse } from "next/server";
import { z } from "zod";
import { withWorkshop } from "@/lib/auth/route-handlers";
import { reopenSetupSheet } from "@/lib/data/setup-sheets";
import { readJson } from "@/lib/http/respond";
import { idParamSchema } from "@/lib/schemas/ids";
import { setupReopenSchema } from "@/lib/schemas/setup-sheet-out";

const params = z.object({ id: idParamSchema });

export const POST = withWorkshop({ permission: "setup.write", params }, async (req, { scope, params }) => {
  const { note } = await readJson(req, setupReopenSchema);
  return NextResponse.json({ setup: await reopenSetupSheet(scope, params.id, note) }, { status: 201 });
});
