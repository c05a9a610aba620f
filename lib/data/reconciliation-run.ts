// Running the reconciliation of one month: gather the ledger's card entries of the month and the
// processor's transactions and payouts of the month (with the other side of anything dated in
// another month), let lib/books/matching.ts decide, and store the result. Exceptions keep their
// resolution from one run to the next by fingerprint; one no longer found is marked cleared.
// The processor is read before the transaction, so a slow processor never holds a lock.
import { db } from "@/db/knex";
import { can } from "@/lib/auth/permissions";
import type { WorkshopScope } from "@/lib/auth/scope";
import { reconcileMonth, type LedgerCardEntry, type MatchResult, type ProcessorTxn } from "@/lib/books/matching";
import { monthLabel, monthRange, type Month } from "@/lib/books/months";
import { breakDownPayout, type LedgerRefs, type PayoutBreakdown } from "@/lib/books/payouts";
import { toProcessorTxn } from "@/lib/books/processor-txn";
import { AppError, forbidden } from "@/lib/http/errors";
import type { ProcessorBooksReader } from "@/lib/payments/processor-books";
import { writeAudit } from "./audit";
import { claimPeriod, findPeriod } from "./reconciliation-periods";
import { inTransaction, type Trx } from "./transaction";

interface CardRow {
  id: number;
  commission_id: number;
  number: string;
  kind: LedgerCardEntry["kind"];
  status: LedgerCardEntry["status"];
  currency: string;
  amount_minor: number | string;
  fee_minor: number | string | null;
  paid_at: Date | null;
  created_at: Date;
  processor_charge_id: string | null;
  processor_refund_id: string | null;
  processor_balance_txn_id: string | null;
  processor_reversal_txn_id: string | null;
}

const CARD_COLUMNS = [
  "p.id",
  "p.commission_id",
  "c.number",
  "p.kind",
  "p.status",
  "p.currency",
  "p.amount_minor",
  "p.fee_minor",
  "p.paid_at",
  "p.created_at",
  "p.processor_charge_id",
  "p.processor_refund_id",
  "p.processor_balance_txn_id",
  "p.processor_reversal_txn_id",
];

const cardRows = (workshopId: number) =>
  db("payments as p").join("commissions as c", "c.id", "p.commission_id").where({ "p.workshop_id": workshopId, "c.workshop_id": workshopId, "p.method": "card" }).whereNot("p.status", "cancelled");

function toEntry(r: CardRow, inPeriod: boolean): LedgerCardEntry {
  return {
    paymentId: r.id,
    commissionId: r.commission_id,
    commissionNumber: r.number,
    kind: r.kind,
    status: r.status,
    currency: r.currency,
    amountMinor: Number(r.amount_minor),
    feeMinor: r.fee_minor === null ? null : Number(r.fee_minor),
    date: new Date(r.paid_at ?? r.created_at),
    chargeId: r.processor_charge_id,
    refundId: r.processor_refund_id,
    balanceTxnId: r.processor_balance_txn_id,
    reversalTxnId: r.processor_reversal_txn_id,
    inPeriod,
  };
}

/** Ledger rows of any month that name one of these processor objects (the other side of a timing difference). */
async function rowsByRefs(workshopId: number, refs: { txnIds: string[]; chargeIds: string[]; refundIds: string[]; pendingOf: number[] }, exclude: number[]): Promise<CardRow[]> {
  const { txnIds, chargeIds, refundIds, pendingOf } = refs;
  if (!txnIds.length && !chargeIds.length && !refundIds.length && !pendingOf.length) return [];
  return (await cardRows(workshopId)
    .where((w) => {
      if (txnIds.length) w.orWhereIn("p.processor_balance_txn_id", txnIds).orWhereIn("p.processor_reversal_txn_id", txnIds);
      if (chargeIds.length) w.orWhereIn("p.processor_charge_id", chargeIds);
      if (refundIds.length) w.orWhereIn("p.processor_refund_id", refundIds);
      if (pendingOf.length) w.orWhere((p) => p.where("p.status", "pending").whereIn("p.commission_id", pendingOf));
    })
    .whereNotIn("p.id", exclude.length ? exclude : [0])
    .select(CARD_COLUMNS)) as CardRow[];
}

const UNAVAILABLE = "The payment service is not answering right now, so the month could not be compared. Nothing was changed; try again in a minute.";

/** Both sides of the month, matched, and its payouts broken down (reads only). */
async function gather(scope: WorkshopScope, month: Month, reader: ProcessorBooksReader) {
  const { start, end } = monthRange(month);
  const inMonth = (d: Date) => d >= start && d < end;
  const ours = (t: ProcessorTxn) => t.workshopId === scope.workshopId;

  const [rows, offline] = await Promise.all([
    cardRows(scope.workshopId).whereRaw("COALESCE(p.paid_at, p.created_at) >= ?", [start]).whereRaw("COALESCE(p.paid_at, p.created_at) < ?", [end]).select(CARD_COLUMNS) as Promise<CardRow[]>,
    db("payments").where({ workshop_id: scope.workshopId, method: "offline" }).whereRaw("COALESCE(paid_at, created_at) >= ?", [start]).whereRaw("COALESCE(paid_at, created_at) < ?", [end]).count({ n: "*" }).first(),
  ]);
  const entries = rows.map((r) => toEntry(r, true));

  const txns = new Map<string, ProcessorTxn>();
  const add = (list: Array<Parameters<typeof toProcessorTxn>[0]>, keep: (t: ProcessorTxn) => boolean) => {
    for (const raw of list) {
      const t = toProcessorTxn(raw, inMonth(new Date(raw.created * 1000)));
      if (keep(t) && !txns.has(t.id)) txns.set(t.id, t);
    }
  };
  add(await reader.transactionsCreated(start, end), ours);
  // The processor's side of our entries that it dates in another month (or that we stored no id for).
  const missingIds = entries.flatMap((e) => [e.balanceTxnId, e.reversalTxnId]).filter((id): id is string => !!id && !txns.has(id));
  const bySource = entries.filter((e) => e.status === "paid" && !e.balanceTxnId).map((e) => (e.kind === "refund" ? e.refundId : e.chargeId)).filter((s): s is string => !!s);
  const referenced = (t: ProcessorTxn) => ours(t) || t.workshopId === null;
  if (missingIds.length) add(await reader.transactionsByIds(missingIds), referenced);
  if (bySource.length) add(await reader.transactionsBySources(bySource), referenced);

  // Our side of the processor's transactions of the month that no entry of the month names.
  const named = new Set(entries.flatMap((e) => [e.balanceTxnId, e.reversalTxnId, e.chargeId, e.refundId]).filter(Boolean));
  const loose = [...txns.values()].filter((t) => t.inPeriod && !named.has(t.id) && !(t.chargeId && named.has(t.chargeId) && t.type === "charge") && !(t.refundId && named.has(t.refundId)));
  const others = await rowsByRefs(
    scope.workshopId,
    {
      txnIds: loose.map((t) => t.id),
      // A refund's charge too: the refunded payment may be dated in an earlier month.
      chargeIds: loose.filter((t) => t.chargeId).map((t) => t.chargeId!),
      refundIds: loose.filter((t) => t.refundId).map((t) => t.refundId!),
      pendingOf: loose.filter((t) => t.type === "charge" && t.commissionId).map((t) => t.commissionId!),
    },
    entries.map((e) => e.paymentId),
  );
  const allEntries = [...entries, ...others.map((r) => toEntry(r, inMonth(new Date(r.paid_at ?? r.created_at))))];
  const result = reconcileMonth(month, allEntries, [...txns.values()]);

  const payouts: PayoutBreakdown[] = [];
  for (const po of await reader.payoutsCreated(start, end)) {
    const lines = (await reader.payoutTransactions(po.id)).map((t) => toProcessorTxn(t, inMonth(new Date(t.created * 1000))));
    if (!lines.some(ours)) continue;
    const breakdown = breakDownPayout(
      { id: po.id, amountMinor: po.amount, currency: po.currency.toUpperCase(), created: new Date(po.created * 1000), arrival: new Date(po.arrival_date * 1000), status: po.status },
      lines,
      scope.workshopId,
      await ledgerRefs(scope.workshopId, lines.filter(ours)),
    );
    payouts.push(breakdown);
  }
  return { result, payouts, ledgerEntries: entries.length, offlineEntries: Number(offline?.n ?? 0), processorTxns: [...txns.values()].filter((t) => t.inPeriod).length };
}

/** Which of the workshop's ledger entries these transactions are. */
async function ledgerRefs(workshopId: number, txns: readonly ProcessorTxn[]): Promise<LedgerRefs> {
  const ids = txns.map((t) => t.id);
  const charges = txns.filter((t) => t.type === "charge" && t.chargeId).map((t) => t.chargeId!);
  const refunds = txns.filter((t) => t.refundId).map((t) => t.refundId!);
  const rows = (await rowsByRefs(workshopId, { txnIds: ids, chargeIds: charges, refundIds: refunds, pendingOf: [] }, [])) as CardRow[];
  const refs = { byTxn: new Map<string, number>(), byCharge: new Map<string, number>(), byRefund: new Map<string, number>() };
  for (const r of rows) {
    if (r.processor_balance_txn_id) refs.byTxn.set(r.processor_balance_txn_id, r.id);
    if (r.processor_reversal_txn_id) refs.byTxn.set(r.processor_reversal_txn_id, r.id);
    if (r.kind !== "refund" && r.processor_charge_id) refs.byCharge.set(r.processor_charge_id, r.id);
    if (r.processor_refund_id) refs.byRefund.set(r.processor_refund_id, r.id);
  }
  return refs;
}

async function store(trx: Trx, scope: WorkshopScope, periodId: number, result: MatchResult, payouts: PayoutBreakdown[]) {
  const scoped = { workshop_id: scope.workshopId, period_id: periodId };
  for (const t of ["reconciliation_matches", "reconciliation_payout_lines", "reconciliation_payouts"]) await trx(t).where(scoped).del();
  const payoutOf = new Map<string, string>();
  for (const b of payouts) for (const l of b.lines) payoutOf.set(l.txnId, b.payout.id);
  for (const m of result.matches) {
    await trx("reconciliation_matches").insert({
      ...scoped,
      payment_id: m.paymentId,
      balance_txn_id: m.txnId,
      txn_type: m.txnType,
      txn_created_at: m.txnCreated,
      ledger_amount_minor: m.ledgerAmountMinor,
      ledger_currency: m.ledgerCurrency,
      processor_amount_minor: m.processorAmountMinor,
      processor_fee_minor: m.processorFeeMinor,
      processor_net_minor: m.processorNetMinor,
      processor_currency: m.processorCurrency,
      payout_id: payoutOf.get(m.txnId) ?? null,
      other_month: m.otherMonth,
    });
  }
  for (const b of payouts) {
    const p = b.payout;
    await trx("reconciliation_payouts").insert({
      ...scoped,
      payout_id: p.id,
      amount_minor: p.amountMinor,
      currency: p.currency,
      payout_created_at: p.created,
      arrival_at: p.arrival,
      status: p.status,
      workshop_net_minor: b.workshopNetMinor,
      workshop_count: b.lines.length,
      other_net_minor: b.otherNetMinor,
      other_count: b.otherCount,
    });
    for (const l of b.lines) {
      await trx("reconciliation_payout_lines").insert({
        ...scoped,
        payout_id: p.id,
        balance_txn_id: l.txnId,
        txn_type: l.txnType,
        txn_created_at: l.created,
        amount_minor: l.amountMinor,
        fee_minor: l.feeMinor,
        net_minor: l.netMinor,
        currency: l.currency,
        payment_id: l.paymentId,
      });
    }
  }
  const now = new Date();
  const existing = (await trx("reconciliation_exceptions").where(scoped).select("id", "fingerprint")) as Array<{ id: number; fingerprint: string }>;
  const found = new Set(result.exceptions.map((e) => e.fingerprint));
  for (const e of result.exceptions) {
    const fields = {
      kind: e.kind,
      payment_id: e.paymentId,
      processor_ref: e.processorRef,
      ledger_amount_minor: e.ledgerAmountMinor,
      ledger_currency: e.ledgerCurrency,
      processor_amount_minor: e.processorAmountMinor,
      processor_currency: e.processorCurrency,
      detail: e.detail.slice(0, 500),
      last_seen_at: now,
      cleared_at: null,
    };
    const old = existing.find((x) => x.fingerprint === e.fingerprint);
    if (old) await trx("reconciliation_exceptions").where({ id: old.id }).update(fields);
    else await trx("reconciliation_exceptions").insert({ ...scoped, fingerprint: e.fingerprint, first_seen_at: now, ...fields });
  }
  const gone = existing.filter((x) => !found.has(x.fingerprint)).map((x) => x.id);
  if (gone.length) await trx("reconciliation_exceptions").whereIn("id", gone).whereNull("cleared_at").update({ cleared_at: now });
}

/**
 * Compares the month with the processor and stores the result. 403 without the permission, or for a
 * locked month without `reconciliation.override`; 503 when the processor cannot be read.
 */
export async function runReconciliation(scope: WorkshopScope, month: Month, reader: ProcessorBooksReader): Promise<{ matches: number; exceptions: number }> {
  if (!can(scope.role, "reconciliation.manage")) throw forbidden();
  const lockedRefusal = () => forbidden(`${monthLabel(month)} is reconciled and locked: only the owner can compare it again.`);
  const before = await findPeriod(db, scope.workshopId, month);
  if (before?.status === "locked" && !can(scope.role, "reconciliation.override")) throw lockedRefusal();

  // Stamped as of the start of reading: a payment changed while the processor was read counts as changed since.
  const startedAt = new Date();
  let gathered: Awaited<ReturnType<typeof gather>>;
  try {
    gathered = await gather(scope, month, reader);
  } catch (err) {
    if (err instanceof AppError && err.code === "unavailable") throw new AppError("unavailable", UNAVAILABLE, undefined, err.retryAfterSeconds);
    throw err;
  }
  const { result, payouts } = gathered;

  return inTransaction(async (trx) => {
    const period = await claimPeriod(trx, scope.workshopId, month);
    if (period.status === "locked" && !can(scope.role, "reconciliation.override")) throw lockedRefusal();
    await store(trx, scope, period.id, result, payouts);
    await trx("reconciliation_periods").where({ id: period.id }).update({
      last_run_at: startedAt,
      last_run_by: scope.userId,
      ledger_entries: gathered.ledgerEntries + gathered.offlineEntries,
      processor_transactions: gathered.processorTxns,
    });
    const byKind: Record<string, number> = {};
    for (const e of result.exceptions) byKind[e.kind] = (byKind[e.kind] ?? 0) + 1;
    await writeAudit(trx, {
      workshopId: scope.workshopId,
      actorUserId: scope.userId,
      action: "reconciliation.run",
      entityType: "reconciliation_period",
      entityId: period.id,
      data: { month, locked: period.status === "locked", matches: result.matches.length, exceptions: byKind, payouts: payouts.map((p) => p.payout.id) },
    });
    return { matches: result.matches.length, exceptions: result.exceptions.length };
  });
}
