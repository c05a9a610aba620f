// GET /api/workshops/[workshop]/books/reconciliation/[month]/export – the month's reconciliation as CSV: pairs, exceptions with resolutions, payouts (owner, bookkeeper).
import { z } from "zod";
import { withWorkshop } from "@/lib/auth/route-handlers";
import { reconciliationCsvText } from "@/lib/books/reconciliation-csv";
import { getReconciliationPeriod } from "@/lib/data/reconciliation-view";
import { csvResponse } from "@/lib/http/csv-response";
import { monthSchema } from "@/lib/schemas/books";

const params = z.object({ month: monthSchema });

export const GET = withWorkshop({ permission: "reconciliation.manage", params }, async (_req, { scope, params, workshop }) => {
  const period = await getReconciliationPeriod(scope, params.month);
  return csvResponse(reconciliationCsvText(period), `reconciliation-${workshop.slug}-${params.month}.csv`);
});
