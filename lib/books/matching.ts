// Reconciliation of one month: the ledger's card entries paired with the processor's balance
// transactions, and every difference as an exception of a kind. Pure: the data layer gathers both
// sides (lib/data/reconciliation-run.ts), this decides.
//
// Pairing: a payment with the balance transaction of its charge, a refund with the one of its
// refund (by the stored transaction id, else by the transaction's source). A refund the processor
// returned (a refund_failure transaction for it) pairs with both. Entries or transactions dated in
// another month are looked up too, so a timing difference pairs up (noted as such) rather than
// showing as missing on both sides; only what is dated in the month itself can raise an exception.
import { formatMoney, money } from "@/lib/money/money";
import type { EntryKind, EntryStatus } from "./entries";
import type { ExceptionKind } from "./exception-kinds";
import { monthOf, type Month } from "./months";

export interface LedgerCardEntry {
  paymentId: number;
  commissionId: number;
  commissionNumber: string;
  kind: EntryKind;
  status: EntryStatus;
  currency: string;
  /** As stored: positive, a refund subtracts by its kind. */
  amountMinor: number;
  feeMinor: number | null;
  /** When it was paid (settled), else when it was recorded. */
  date: Date;
  chargeId: string | null;
  refundId: string | null;
  balanceTxnId: string | null;
  reversalTxnId: string | null;
  inPeriod: boolean;
}

export interface ProcessorTxn {
  id: string;
  type: string;
  /** Signed as the processor has it: a charge positive, a refund negative, a returned refund positive. */
  amountMinor: number;
  feeMinor: number;
  netMinor: number;
  currency: string;
  created: Date;
  /** The charge, refund or payout the transaction comes from. */
  sourceId: string | null;
  /** The charge it concerns (for a refund: the refunded charge). */
  chargeId: string | null;
  refundId: string | null;
  /** From our metadata on the charge (or the refunded charge); null when it carries none. */
  workshopId: number | null;
  commissionId: number | null;
  invoiceKind: "deposit" | "balance" | null;
  exchangeRate: number | null;
  inPeriod: boolean;
}

export interface MatchPair {
  paymentId: number;
  txnId: string;
  txnType: string;
  txnCreated: Date;
  ledgerAmountMinor: number;
  ledgerCurrency: string;
  processorAmountMinor: number;
  processorFeeMinor: number;
  processorNetMinor: number;
  processorCurrency: string;
  /** The other side's month when it is not this one (a timing difference). */
  otherMonth: Month | null;
}

export interface FoundException {
  kind: ExceptionKind;
  /** Stable across runs while the difference stays the same (keeps the bookkeeper's resolution). */
  fingerprint: string;
  paymentId: number | null;
  processorRef: string | null;
  ledgerAmountMinor: number | null;
  ledgerCurrency: string | null;
  processorAmountMinor: number | null;
  processorCurrency: string | null;
  detail: string;
}

export interface MatchResult {
  matches: MatchPair[];
  exceptions: FoundException[];
}

const show = (minor: number, currency: string) => formatMoney(money(minor, currency));
const KIND_WORD: Record<EntryKind, string> = { deposit: "Deposit", balance: "Balance", refund: "Refund" };
const signed = (e: LedgerCardEntry) => (e.kind === "refund" ? -e.amountMinor : e.amountMinor);
const what = (e: LedgerCardEntry) => `${KIND_WORD[e.kind]} of ${show(e.amountMinor, e.currency)} on commission ${e.commissionNumber}`;

class Index {
  private byId = new Map<string, ProcessorTxn>();
  private bySource = new Map<string, ProcessorTxn>();
  readonly used = new Set<string>();

  constructor(readonly txns: readonly ProcessorTxn[]) {
    for (const t of txns) {
      this.byId.set(t.id, t);
      if (t.sourceId) this.bySource.set(`${t.type}:${t.sourceId}`, t);
    }
  }

  find(id: string | null, type: string, source: string | null): ProcessorTxn | undefined {
    return (id ? this.byId.get(id) : undefined) ?? (source ? this.bySource.get(`${type}:${source}`) : undefined);
  }
}

/** Pairs the month's ledger card entries with the processor's transactions and lists the differences. */
export function reconcileMonth(month: Month, ledger: readonly LedgerCardEntry[], txns: readonly ProcessorTxn[]): MatchResult {
  const index = new Index(txns);
  const matches: MatchPair[] = [];
  const exceptions: FoundException[] = [];

  const pair = (e: LedgerCardEntry, t: ProcessorTxn) => {
    index.used.add(t.id);
    const otherMonth = e.inPeriod && !t.inPeriod ? monthOf(t.created) : !e.inPeriod && t.inPeriod ? monthOf(e.date) : null;
    matches.push({
      paymentId: e.paymentId,
      txnId: t.id,
      txnType: t.type,
      txnCreated: t.created,
      ledgerAmountMinor: t.type === "refund_failure" ? e.amountMinor : signed(e),
      ledgerCurrency: e.currency,
      processorAmountMinor: t.amountMinor,
      processorFeeMinor: t.feeMinor,
      processorNetMinor: t.netMinor,
      processorCurrency: t.currency,
      otherMonth,
    });
  };
  const raise = (e: LedgerCardEntry | null, t: ProcessorTxn | null, kind: ExceptionKind, detail: string, extra = "") => {
    exceptions.push({
      kind,
      fingerprint: `${kind}:${e?.paymentId ?? "-"}:${t?.id ?? "-"}${extra}`,
      paymentId: e?.paymentId ?? null,
      processorRef: t?.id ?? null,
      ledgerAmountMinor: e ? signed(e) : null,
      ledgerCurrency: e?.currency ?? null,
      processorAmountMinor: t?.amountMinor ?? null,
      processorCurrency: t?.currency ?? null,
      detail,
    });
  };

  /** Compares a pair on currency, gross and (for payments) fee; raises at most one exception. */
  const compare = (e: LedgerCardEntry, t: ProcessorTxn) => {
    if (!e.inPeriod && !t.inPeriod) return;
    if (e.currency !== t.currency) {
      const rate = t.exchangeRate ? ` at a rate of ${t.exchangeRate}` : "";
      raise(e, t, "currency_mismatch", `${what(e)}: the processor settled it as ${show(Math.abs(t.amountMinor), t.currency)}${rate} (transaction ${t.id}).`);
    } else if (signed(e) !== t.amountMinor) {
      raise(e, t, "amount_mismatch", `${what(e)}: the processor has ${show(Math.abs(t.amountMinor), t.currency)} (transaction ${t.id}).`, `:${signed(e)}:${t.amountMinor}`);
    } else if (e.kind !== "refund" && e.feeMinor !== null && e.feeMinor !== t.feeMinor) {
      raise(e, t, "amount_mismatch", `${what(e)}: the fee is ${show(e.feeMinor, e.currency)} in the ledger, ${show(t.feeMinor, t.currency)} at the processor (transaction ${t.id}).`, `:fee:${e.feeMinor}:${t.feeMinor}`);
    }
  };

  const pendingCheckouts = new Map<string, LedgerCardEntry>();
  for (const e of ledger) if (e.kind !== "refund" && e.status === "pending") pendingCheckouts.set(`${e.commissionId}:${e.kind}`, e);

  for (const e of ledger) {
    if (e.kind !== "refund") {
      if (e.status !== "paid") continue;
      const t = index.find(e.balanceTxnId, "charge", e.chargeId);
      if (t) {
        pair(e, t);
        compare(e, t);
      } else if (e.inPeriod) {
        raise(e, null, "missing_at_processor", `${what(e)} (charge ${e.chargeId ?? "not recorded"}): the processor has no transaction for it.`);
      }
      continue;
    }
    const t = index.find(e.balanceTxnId, "refund", e.refundId);
    const back = index.find(e.reversalTxnId, "refund_failure", e.refundId);
    if (t) pair(e, t);
    if (back) pair(e, back);
    const inScope = e.inPeriod || !!(t?.inPeriod || back?.inPeriod);
    if (!inScope) continue;
    if (e.status === "paid") {
      if (!t) raise(e, null, "missing_at_processor", `${what(e)} (refund ${e.refundId ?? "not recorded"}): the processor has no transaction for it.`);
      else if (back) raise(e, back, "missing_at_processor", `${what(e)}: the processor returned this refund (transaction ${back.id}), so the money never left; the ledger still counts it.`);
      else compare(e, t);
    } else if (t && !back && (e.status === "failed" || e.status === "pending")) {
      const ledgerSays = e.status === "failed" ? "as failed" : "as still pending";
      raise(e, t, "refund_not_recorded", `${what(e)}: the processor refunded it (transaction ${t.id}); the ledger has it ${ledgerSays}.`);
    }
  }

  const paidCharges = new Map<string, LedgerCardEntry>();
  for (const e of ledger) if (e.kind !== "refund" && e.status === "paid" && e.chargeId) paidCharges.set(e.chargeId, e);

  for (const t of txns) {
    if (!t.inPeriod || index.used.has(t.id)) continue;
    const amount = show(Math.abs(t.amountMinor), t.currency);
    if (t.type === "charge") {
      const pending = t.commissionId && t.invoiceKind ? pendingCheckouts.get(`${t.commissionId}:${t.invoiceKind}`) : undefined;
      const why = pending ? `; the ledger still shows the checkout of commission ${pending.commissionNumber} as pending (its confirmation never arrived)` : "";
      raise(pending ?? null, t, "missing_in_ledger", `A card payment of ${amount} (charge ${t.chargeId ?? t.sourceId}) is at the processor but not settled in the ledger${why}.`);
    } else if (t.type === "refund") {
      const refunded = t.chargeId ? paidCharges.get(t.chargeId) : undefined;
      if (refunded) raise(refunded, t, "refund_not_recorded", `${what(refunded)}: the processor refunded ${amount} of it (refund ${t.refundId ?? t.sourceId}); the ledger has no such refund.`);
      else raise(null, t, "missing_in_ledger", `A refund of ${amount} (refund ${t.refundId ?? t.sourceId}) is at the processor but not in the ledger.`);
    } else if (t.type === "refund_failure") {
      raise(null, t, "missing_in_ledger", `A returned refund of ${amount} (refund ${t.refundId ?? t.sourceId}) is at the processor but not in the ledger.`);
    }
  }
  return { matches, exceptions };
}
