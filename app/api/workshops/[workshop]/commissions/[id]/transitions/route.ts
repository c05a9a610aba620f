// GET  /api/workshops/[workshop]/commissions/[id]/transitions – the stage history (a client: what they were told).
// POST /api/workshops/[workshop]/commissions/[id]/transitions – move it: advance, back, hold, resume, cancel.
//   Who may make which move is the stage machine's (lib/workflow/machine.ts); a refusal is 403 or 409 with the reason.
import { NextResponse } from "next/server";
import { z } from "zod";
import { withWorkshop } from "@/lib/auth/route-handlers";
import { listStageHistory, transitionCommission } from "@/lib/data/stage-transitions";
import { readJson } from "@/lib/http/respond";
import { transitionSchema } from "@/lib/schemas/commission";
import { idParamSchema } from "@/lib/schemas/ids";

const params = z.object({ id: idParamSchema });

export const GET = withWorkshop({ permission: "commission.read", params }, async (_req, { scope, params }) => {
  return NextResponse.json({ history: await listStageHistory(scope, params.id) });
});

export const POST = withWorkshop({ permission: "commission.read", params }, async (req, { scope, params }) => {
  const { action, note } = await readJson(req, transitionSchema);
  return NextResponse.json(await transitionCommission(scope, params.id, { kind: action }, note ?? null));
});
