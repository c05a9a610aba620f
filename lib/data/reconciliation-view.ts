// A month's reconciliation as the page, the route and the CSV export show it, and the list of months.
import { db } from "@/db/knex";
import { can } from "@/lib/auth/permissions";
import type { WorkshopScope } from "@/lib/auth/scope";
import { EXCEPTION_LABELS, type ExceptionKind } from "@/lib/books/exception-kinds";
import { isMonthOver, monthLabel, monthOf, monthRange, monthsBetween, type Month } from "@/lib/books/months";
import { forbidden } from "@/lib/http/errors";
import type { ExceptionOut, LockedChangeOut, MatchOut, PayoutOut, ReconciliationPeriodOut, ReconciliationPeriodSummary } from "@/lib/schemas/books";
import { countChangedSince, findPeriod, type PeriodRow } from "./reconciliation-periods";
import { iso } from "./transaction";

const isoOrNull = (d: Date | null) => (d ? iso(d) : null);
const nameOf = (names: Map<number, string>, id: number | null) => (id === null ? null : (names.get(id) ?? null));

function assertMayRead(scope: WorkshopScope) {
  if (!can(scope.role, "reconciliation.manage")) throw forbidden();
}

async function userNames(ids: Array<number | null>): Promise<Map<number, string>> {
  const wanted = [...new Set(ids.filter((i): i is number => i !== null))];
  if (!wanted.length) return new Map();
  const rows = (await db("users").whereIn("id", wanted).select("id", "name")) as Array<{ id: number; name: string }>;
  return new Map(rows.map((r) => [r.id, r.name]));
}

function lockState(period: PeriodRow | undefined, openExceptions: number, changed: number): { canLock: boolean; lockBlocker: string | null } {
  if (!period?.last_run_at) return { canLock: false, lockBlocker: "Compare the month with the processor first." };
  if (period.status === "locked") return { canLock: false, lockBlocker: null };
  if (openExceptions > 0) return { canLock: false, lockBlocker: `${openExceptions} exception${openExceptions === 1 ? " is" : "s are"} still open: resolve each with a note.` };
  if (changed > 0) return { canLock: false, lockBlocker: `The ledger of this month changed since the last comparison (${changed} entr${changed === 1 ? "y" : "ies"}): compare it again.` };
  return { canLock: true, lockBlocker: null };
}

/** One month: its state, pairs, exceptions, payouts and changes after locking. */
export async function getReconciliationPeriod(scope: WorkshopScope, month: Month, now = new Date()): Promise<ReconciliationPeriodOut> {
  assertMayRead(scope);
  const period = await findPeriod(db, scope.workshopId, month);
  const { start, end } = monthRange(month);
  const offline = await db("payments")
    .where({ workshop_id: scope.workshopId, method: "offline" })
    .whereRaw("COALESCE(paid_at, created_at) >= ?", [start])
    .whereRaw("COALESCE(paid_at, created_at) < ?", [end])
    .count({ n: "*" })
    .first();
  const base = {
    month,
    label: monthLabel(month),
    monthOver: isMonthOver(month, now),
    offlineEntries: Number(offline?.n ?? 0),
  };
  if (!period) {
    return { ...base, status: "never", lastRunAt: null, lastRunBy: null, lockedAt: null, lockedBy: null, lockNote: null, ledgerEntries: 0, processorTransactions: 0, matches: [], exceptions: [], payouts: [], lockedChanges: [], changedSinceRun: 0, ...lockState(undefined, 0, 0) };
  }
  const scoped = { "x.workshop_id": scope.workshopId, "x.period_id": period.id };
  const withCommission = (table: string) =>
    db(`${table} as x`)
      .leftJoin("payments as p", "p.id", "x.payment_id")
      .leftJoin("commissions as c", "c.id", "p.commission_id")
      .where(scoped);
  const [matches, exceptions, payouts, lines, changes, changed] = await Promise.all([
    withCommission("reconciliation_matches").orderBy("x.txn_created_at").orderBy("x.id").select("x.*", "c.number as commission_number"),
    withCommission("reconciliation_exceptions").orderBy("x.id").select("x.*", "c.number as commission_number"),
    db("reconciliation_payouts as x").where(scoped).orderBy("x.payout_created_at").select("x.*"),
    withCommission("reconciliation_payout_lines").orderBy("x.txn_created_at").orderBy("x.id").select("x.*", "c.number as commission_number", "p.kind as payment_kind"),
    db("reconciliation_locked_changes as x").where(scoped).orderBy("x.id").select("x.*"),
    countChangedSince(db, scope.workshopId, month, period.last_run_at),
  ]);
  const names = await userNames([period.last_run_by, period.locked_by, ...exceptions.map((e) => e.resolved_by), ...changes.flatMap((c) => [c.actor_user_id, c.reviewed_by])]);

  const exceptionsOut: ExceptionOut[] = exceptions.map((e) => ({
    id: e.id,
    kind: e.kind as ExceptionKind,
    label: EXCEPTION_LABELS[e.kind as ExceptionKind],
    paymentId: e.payment_id,
    commissionNumber: e.commission_number ?? null,
    processorRef: e.processor_ref,
    ledgerAmountMinor: e.ledger_amount_minor === null ? null : Number(e.ledger_amount_minor),
    ledgerCurrency: e.ledger_currency,
    processorAmountMinor: e.processor_amount_minor === null ? null : Number(e.processor_amount_minor),
    processorCurrency: e.processor_currency,
    detail: e.detail,
    status: e.status,
    cleared: e.cleared_at !== null,
    resolutionNote: e.resolution_note,
    resolvedBy: nameOf(names, e.resolved_by),
    resolvedAt: isoOrNull(e.resolved_at),
  }));
  const openExceptions = exceptionsOut.filter((e) => e.status === "open" && !e.cleared).length;
  const matchesOut: MatchOut[] = matches.map((m) => ({
    paymentId: m.payment_id,
    commissionNumber: m.commission_number ?? null,
    txnId: m.balance_txn_id,
    txnType: m.txn_type,
    txnCreatedAt: iso(m.txn_created_at),
    ledgerAmountMinor: Number(m.ledger_amount_minor),
    ledgerCurrency: m.ledger_currency,
    processorAmountMinor: Number(m.processor_amount_minor),
    processorFeeMinor: Number(m.processor_fee_minor),
    processorNetMinor: Number(m.processor_net_minor),
    processorCurrency: m.processor_currency,
    payoutId: m.payout_id,
    otherMonth: m.other_month,
  }));
  const payoutsOut: PayoutOut[] = payouts.map((p) => ({
    payoutId: p.payout_id,
    amountMinor: Number(p.amount_minor),
    currency: p.currency,
    createdAt: iso(p.payout_created_at),
    arrivalAt: iso(p.arrival_at),
    status: p.status,
    workshopNetMinor: Number(p.workshop_net_minor),
    workshopCount: p.workshop_count,
    otherNetMinor: Number(p.other_net_minor),
    otherCount: p.other_count,
    lines: lines
      .filter((l) => l.payout_id === p.payout_id)
      .map((l) => ({
        txnId: l.balance_txn_id,
        txnType: l.txn_type,
        createdAt: iso(l.txn_created_at),
        amountMinor: Number(l.amount_minor),
        feeMinor: Number(l.fee_minor),
        netMinor: Number(l.net_minor),
        currency: l.currency,
        paymentId: l.payment_id,
        commissionNumber: l.commission_number ?? null,
        kind: l.payment_kind ?? null,
      })),
  }));
  const changesOut: LockedChangeOut[] = changes.map((c) => ({
    id: c.id,
    source: c.source,
    action: c.action,
    paymentId: c.payment_id,
    eventId: c.event_id,
    actor: nameOf(names, c.actor_user_id),
    detail: typeof c.detail === "string" ? JSON.parse(c.detail) : c.detail,
    createdAt: iso(c.created_at),
    reviewedAt: isoOrNull(c.reviewed_at),
    reviewedBy: nameOf(names, c.reviewed_by),
    reviewNote: c.review_note,
  }));
  return {
    ...base,
    status: period.status,
    lastRunAt: isoOrNull(period.last_run_at),
    lastRunBy: nameOf(names, period.last_run_by),
    lockedAt: isoOrNull(period.locked_at),
    lockedBy: nameOf(names, period.locked_by),
    lockNote: period.lock_note,
    ledgerEntries: period.ledger_entries,
    processorTransactions: period.processor_transactions,
    matches: matchesOut,
    exceptions: exceptionsOut,
    payouts: payoutsOut,
    lockedChanges: changesOut,
    changedSinceRun: changed,
    ...lockState(period, openExceptions, changed),
  };
}

/** Every month from the first ledger entry to now (newest first) with its reconciliation state. */
export async function listReconciliationPeriods(scope: WorkshopScope, now = new Date()): Promise<ReconciliationPeriodSummary[]> {
  assertMayRead(scope);
  const [counts, periods, open, flagged] = await Promise.all([
    db("payments")
      .where({ workshop_id: scope.workshopId })
      .groupByRaw("DATE_FORMAT(COALESCE(paid_at, created_at), '%Y-%m')")
      .select(db.raw("DATE_FORMAT(COALESCE(paid_at, created_at), '%Y-%m') AS m"), db.raw("COUNT(*) AS n")) as Promise<Array<{ m: string; n: number | string }>>,
    db("reconciliation_periods").where({ workshop_id: scope.workshopId }).select("*") as Promise<PeriodRow[]>,
    db("reconciliation_exceptions").where({ workshop_id: scope.workshopId, status: "open" }).whereNull("cleared_at").groupBy("period_id").select("period_id", db.raw("COUNT(*) AS n")),
    db("reconciliation_locked_changes").where({ workshop_id: scope.workshopId, source: "processor" }).whereNull("reviewed_at").groupBy("period_id").select("period_id", db.raw("COUNT(*) AS n")),
  ]);
  const entries = new Map(counts.map((c) => [c.m, Number(c.n)]));
  const byPeriod = (rows: Array<{ period_id: number; n: number | string }>) => new Map(rows.map((r) => [r.period_id, Number(r.n)]));
  const openBy = byPeriod(open as Array<{ period_id: number; n: number }>);
  const flaggedBy = byPeriod(flagged as Array<{ period_id: number; n: number }>);
  const rowOf = new Map(periods.map((p) => [p.month, p]));
  const known = [...entries.keys(), ...rowOf.keys()].sort();
  const current = monthOf(now);
  const first = known[0] && known[0] < current ? known[0] : current;
  const last = known.at(-1) && known.at(-1)! > current ? known.at(-1)! : current;
  return monthsBetween(first, last).map((month) => {
    const p = rowOf.get(month);
    return {
      month,
      status: p ? p.status : "never",
      lastRunAt: p?.last_run_at ? iso(p.last_run_at) : null,
      openExceptions: p ? (openBy.get(p.id) ?? 0) : 0,
      flaggedChanges: p ? (flaggedBy.get(p.id) ?? 0) : 0,
      ledgerEntries: entries.get(month) ?? 0,
    };
  });
}
