// POST /api/workshops/[workshop]/books/reconciliation/[month]/lock {note?} – lock a compared month whose exceptions are all resolved (owner, bookkeeper).
import { NextResponse } from "next/server";
import { z } from "zod";
import { withWorkshop } from "@/lib/auth/route-handlers";
import { lockPeriod } from "@/lib/data/reconciliation-actions";
import { getReconciliationPeriod } from "@/lib/data/reconciliation-view";
import { readJson } from "@/lib/http/respond";
import { lockPeriodSchema, monthSchema } from "@/lib/schemas/books";

const params = z.object({ month: monthSchema });

export const POST = withWorkshop({ permission: "reconciliation.manage", params }, async (req, { scope, params }) => {
  const { note } = await readJson(req, lockPeriodSchema);
  await lockPeriod(scope, params.month, note || null);
  return NextResponse.json({ period: await getReconciliationPeriod(scope, params.month) });
});
