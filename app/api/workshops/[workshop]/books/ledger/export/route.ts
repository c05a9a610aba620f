// GET /api/workshops/[workshop]/books/ledger/export?(the ledger's filters) – the filtered ledger as CSV with totals rows (owner, bookkeeper).
import { withWorkshop } from "@/lib/auth/route-handlers";
import { ledgerCsv } from "@/lib/books/csv";
import { ledgerForExport } from "@/lib/data/ledger";
import { csvResponse } from "@/lib/http/csv-response";
import { readQuery } from "@/lib/http/respond";
import { ledgerExportQuerySchema } from "@/lib/schemas/books";

export const GET = withWorkshop({ permission: "ledger.read" }, async (req, { scope, workshop }) => {
  const query = readQuery(req, ledgerExportQuerySchema);
  const { items, totals, truncated } = await ledgerForExport(scope, query);
  const res = csvResponse(ledgerCsv(items, totals), `ledger-${workshop.slug}${query.period ? `-${query.period}` : ""}.csv`);
  if (truncated) res.headers.set("X-Ledger-Truncated", "true");
  return res;
});
