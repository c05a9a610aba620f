// POST /api/workshops/[workshop]/books/reconciliation/[month]/exceptions/[exceptionId]/resolve {note} – resolve an exception with a note (owner, bookkeeper; a locked month: owner).
import { NextResponse } from "next/server";
import { z } from "zod";
import { withWorkshop } from "@/lib/auth/route-handlers";
import { resolveException } from "@/lib/data/reconciliation-actions";
import { getReconciliationPeriod } from "@/lib/data/reconciliation-view";
import { readJson } from "@/lib/http/respond";
import { monthSchema, resolveNoteSchema } from "@/lib/schemas/books";
import { idParamSchema } from "@/lib/schemas/ids";

const params = z.object({ month: monthSchema, exceptionId: idParamSchema });

export const POST = withWorkshop({ permission: "reconciliation.manage", params }, async (req, { scope, params }) => {
  const { note } = await readJson(req, resolveNoteSchema);
  await resolveException(scope, params.month, params.exceptionId, note);
  return NextResponse.json({ period: await getReconciliationPeriod(scope, params.month) });
});
