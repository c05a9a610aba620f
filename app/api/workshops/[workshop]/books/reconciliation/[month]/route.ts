// GET /api/workshops/[workshop]/books/reconciliation/[month] – one month: pairs, exceptions, payouts, changes after locking (owner, bookkeeper).
import { NextResponse } from "next/server";
import { z } from "zod";
import { withWorkshop } from "@/lib/auth/route-handlers";
import { getReconciliationPeriod } from "@/lib/data/reconciliation-view";
import { monthSchema } from "@/lib/schemas/books";

const params = z.object({ month: monthSchema });

export const GET = withWorkshop({ permission: "reconciliation.manage", params }, async (_req, { scope, params }) => {
  return NextResponse.json({ period: await getReconciliationPeriod(scope, params.month) });
});
