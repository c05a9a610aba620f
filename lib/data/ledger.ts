// The payments ledger: every deposit, balance and refund of the workshop with gross, processor fee,
// net, dates and the commission, filtered, sorted and paged in the database, with totals per
// currency over every page. Owner and bookkeeper only.
import type { Knex } from "knex";
import { db } from "@/db/knex";
import { can } from "@/lib/auth/permissions";
import type { WorkshopScope } from "@/lib/auth/scope";
import { entryFigures, type CurrencyTotals } from "@/lib/books/entries";
import { monthOf, monthRange } from "@/lib/books/months";
import { forbidden } from "@/lib/http/errors";
import type { LedgerEntryOut, LedgerExportQuery, LedgerPage, LedgerQuery } from "@/lib/schemas/books";
import { iso } from "./transaction";
import { lockedMonths } from "./reconciliation-periods";

/** Most entries one CSV export carries (a filter narrows a bigger ledger). */
export const LEDGER_EXPORT_LIMIT = 50_000;

// An entry's date is when the money moved, else when it was recorded: the period filter and the
// date sort use it.
const SORTS: Record<LedgerQuery["sort"], string> = {
  date: "COALESCE(p.paid_at, p.created_at) ASC, p.id ASC",
  "-date": "COALESCE(p.paid_at, p.created_at) DESC, p.id DESC",
  amount: "(CASE WHEN p.kind = 'refund' THEN -p.amount_minor ELSE p.amount_minor END) ASC, p.id ASC",
  "-amount": "(CASE WHEN p.kind = 'refund' THEN -p.amount_minor ELSE p.amount_minor END) DESC, p.id DESC",
  commission: "c.number ASC, p.id ASC",
  "-commission": "c.number DESC, p.id DESC",
};

interface Row {
  id: number;
  kind: LedgerEntryOut["kind"];
  status: LedgerEntryOut["status"];
  method: LedgerEntryOut["method"];
  amount_minor: number | string;
  fee_minor: number | string | null;
  net_minor: number | string | null;
  currency: string;
  reference: string | null;
  refund_of_payment_id: number | null;
  processor_charge_id: string | null;
  processor_refund_id: string | null;
  processor_balance_txn_id: string | null;
  paid_at: Date | null;
  created_at: Date;
  commission_id: number;
  number: string;
  title: string;
  client_id: number;
  client_name: string;
}

function assertMayRead(scope: WorkshopScope) {
  if (!can(scope.role, "ledger.read")) throw forbidden();
}

/** The workshop's payment rows with their commission and client, narrowed by the filters. */
function filtered(scope: WorkshopScope, q: LedgerExportQuery, knex: Knex = db): Knex.QueryBuilder {
  const b = knex("payments as p")
    .join("commissions as c", function () {
      this.on("c.id", "=", "p.commission_id").andOn("c.workshop_id", "=", "p.workshop_id");
    })
    .join("users as u", "u.id", "c.client_user_id")
    .where("p.workshop_id", scope.workshopId);
  if (q.status !== "all") b.where("p.status", q.status);
  if (q.kind) b.where("p.kind", q.kind);
  if (q.method) b.where("p.method", q.method);
  if (q.commission) b.where("p.commission_id", q.commission);
  if (q.client) b.where("c.client_user_id", q.client);
  if (q.period) {
    const { start, end } = monthRange(q.period);
    b.whereRaw("COALESCE(p.paid_at, p.created_at) >= ?", [start]).whereRaw("COALESCE(p.paid_at, p.created_at) < ?", [end]);
  }
  return b;
}

const COLUMNS = [
  "p.id",
  "p.kind",
  "p.status",
  "p.method",
  "p.amount_minor",
  "p.fee_minor",
  "p.net_minor",
  "p.currency",
  "p.reference",
  "p.refund_of_payment_id",
  "p.processor_charge_id",
  "p.processor_refund_id",
  "p.processor_balance_txn_id",
  "p.paid_at",
  "p.created_at",
  "p.commission_id",
  "c.number",
  "c.title",
  "c.client_user_id as client_id",
  "u.name as client_name",
];

const num = (v: number | string | null) => (v === null ? null : Number(v));

function toEntry(r: Row, locked: ReadonlySet<string>): LedgerEntryOut {
  const date = r.paid_at ?? r.created_at;
  const month = monthOf(new Date(date));
  const figures = entryFigures({ kind: r.kind, amountMinor: Number(r.amount_minor), feeMinor: num(r.fee_minor), netMinor: num(r.net_minor) });
  return {
    id: r.id,
    date: iso(date),
    paidAt: r.paid_at ? iso(r.paid_at) : null,
    recordedAt: iso(r.created_at),
    kind: r.kind,
    status: r.status,
    method: r.method,
    currency: r.currency,
    ...figures,
    reference: r.reference,
    refundOf: r.refund_of_payment_id,
    commission: { id: r.commission_id, number: r.number, title: r.title },
    client: { id: r.client_id, name: r.client_name },
    processor: r.method === "card" ? { chargeId: r.processor_charge_id, refundId: r.processor_refund_id, balanceTransactionId: r.processor_balance_txn_id } : null,
    month,
    monthLocked: locked.has(month),
  };
}

/** Totals per currency of the filtered entries that settled (status paid), over every page. */
async function ledgerTotals(scope: WorkshopScope, q: LedgerExportQuery): Promise<CurrencyTotals[]> {
  const rows = (await filtered(scope, q)
    .where("p.status", "paid")
    .groupBy("p.currency")
    .orderBy("p.currency")
    .select(
      "p.currency",
      db.raw("COUNT(*) AS n"),
      db.raw("SUM(CASE WHEN p.kind = 'refund' THEN -p.amount_minor ELSE p.amount_minor END) AS gross"),
      db.raw("SUM(COALESCE(p.fee_minor, 0)) AS fee"),
      db.raw("SUM(COALESCE(p.net_minor, (CASE WHEN p.kind = 'refund' THEN -p.amount_minor ELSE p.amount_minor END) - COALESCE(p.fee_minor, 0))) AS net"),
    )) as Array<{ currency: string; n: number | string; gross: number | string; fee: number | string; net: number | string }>;
  return rows.map((r) => ({ currency: r.currency, count: Number(r.n), grossMinor: Number(r.gross), feeMinor: Number(r.fee), netMinor: Number(r.net) }));
}

/** One page of the ledger, its total count and the totals row. */
export async function listLedger(scope: WorkshopScope, q: LedgerQuery): Promise<LedgerPage> {
  assertMayRead(scope);
  const [count, rows, totals, locked] = await Promise.all([
    filtered(scope, q).count({ n: "*" }).first(),
    filtered(scope, q)
      .orderByRaw(SORTS[q.sort])
      .limit(q.pageSize)
      .offset((q.page - 1) * q.pageSize)
      .select(COLUMNS) as Promise<Row[]>,
    ledgerTotals(scope, q),
    lockedMonths(scope),
  ]);
  return { items: rows.map((r) => toEntry(r, locked)), total: Number(count?.n ?? 0), page: q.page, pageSize: q.pageSize, totals };
}

/** Every filtered entry (up to LEDGER_EXPORT_LIMIT) and the totals, for the CSV export. */
export async function ledgerForExport(scope: WorkshopScope, q: LedgerExportQuery): Promise<{ items: LedgerEntryOut[]; totals: CurrencyTotals[]; truncated: boolean }> {
  assertMayRead(scope);
  const [rows, totals, locked] = await Promise.all([
    filtered(scope, q).orderByRaw(SORTS[q.sort]).limit(LEDGER_EXPORT_LIMIT + 1).select(COLUMNS) as Promise<Row[]>,
    ledgerTotals(scope, q),
    lockedMonths(scope),
  ]);
  return { items: rows.slice(0, LEDGER_EXPORT_LIMIT).map((r) => toEntry(r, locked)), totals, truncated: rows.length > LEDGER_EXPORT_LIMIT };
}

/** What the ledger's filters offer: months with entries, clients and commissions that have payments. */
export async function ledgerFilterOptions(scope: WorkshopScope) {
  assertMayRead(scope);
  const base = () => db("payments as p").join("commissions as c", "c.id", "p.commission_id").where("p.workshop_id", scope.workshopId).where("c.workshop_id", scope.workshopId);
  const [dates, clients, commissions] = await Promise.all([
    base().select(db.raw("MIN(COALESCE(p.paid_at, p.created_at)) AS first"), db.raw("MAX(COALESCE(p.paid_at, p.created_at)) AS last")).first(),
    base().join("users as u", "u.id", "c.client_user_id").distinct("u.id", "u.name").orderBy("u.name"),
    base().distinct("c.id", "c.number", "c.title").orderBy("c.number", "desc"),
  ]);
  return {
    firstMonth: dates?.first ? monthOf(new Date(dates.first)) : null,
    lastMonth: dates?.last ? monthOf(new Date(dates.last)) : null,
    clients: (clients as Array<{ id: number; name: string }>).map((c) => ({ id: c.id, name: c.name })),
    commissions: (commissions as Array<{ id: number; number: string; title: string }>).map((c) => ({ id: c.id, number: c.number, title: c.title })),
  };
}
