// POST /api/workshops/[workshop]/books/reconciliation/[month]/changes/[changeId]/review {note} – the owner's review of a change that reached a locked month.
import { NextResponse } from "next/server";
import { z } from "zod";
import { withWorkshop } from "@/lib/auth/route-handlers";
import { reviewLockedChange } from "@/lib/data/reconciliation-actions";
import { getReconciliationPeriod } from "@/lib/data/reconciliation-view";
import { readJson } from "@/lib/http/respond";
import { monthSchema, resolveNoteSchema } from "@/lib/schemas/books";
import { idParamSchema } from "@/lib/schemas/ids";

const params = z.object({ month: monthSchema, changeId: idParamSchema });

export const POST = withWorkshop({ permission: "reconciliation.override", params }, async (req, { scope, params }) => {
  const { note } = await readJson(req, resolveNoteSchema);
  await reviewLockedChange(scope, params.month, params.changeId, note);
  return NextResponse.json({ period: await getReconciliationPeriod(scope, params.month) });
});
