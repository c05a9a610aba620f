// POST /api/workshops/[workshop]/books/reconciliation/[month]/run – compare the month with the processor now (owner, bookkeeper; a locked month: owner).
import { NextResponse } from "next/server";
import { z } from "zod";
import { withWorkshop } from "@/lib/auth/route-handlers";
import { runReconciliation } from "@/lib/data/reconciliation-run";
import { getReconciliationPeriod } from "@/lib/data/reconciliation-view";
import { stripeBooksReader } from "@/lib/payments/processor-books";
import { monthSchema } from "@/lib/schemas/books";

const params = z.object({ month: monthSchema });

export const POST = withWorkshop({ permission: "reconciliation.manage", params }, async (_req, { scope, params }) => {
  const run = await runReconciliation(scope, params.month, stripeBooksReader());
  return NextResponse.json({ run, period: await getReconciliationPeriod(scope, params.month) });
});
