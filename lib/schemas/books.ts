import { z } from "zod";
import type { CurrencyTotals } from "../books/entries";
import type { ExceptionKind } from "../books/exception-kinds";
import { MONTH_PATTERN } from "../books/months";
import { LEDGER_KINDS, LEDGER_SORTS, LEDGER_STATUSES } from "./books-values";

// The books (ledger, reconciliation, held and earned, monthly summary): the inputs of their routes
// and pages, and the shapes that leave lib/data.

const id = z.coerce.number().int().positive().max(2_147_483_647);
export const monthSchema = z.string().regex(MONTH_PATTERN, "Use a month like 2027-03.");

export { LEDGER_KINDS, LEDGER_SORTS, LEDGER_STATUSES } from "./books-values";

export const ledgerQuerySchema = z.object({
  period: monthSchema.optional(),
  status: z.enum(LEDGER_STATUSES).default("paid"),
  kind: z.enum(LEDGER_KINDS).optional(),
  method: z.enum(["offline", "card"]).optional(),
  commission: id.optional(),
  client: id.optional(),
  sort: z.enum(LEDGER_SORTS).default("-date"),
  page: z.coerce.number().int().min(1).max(100_000).default(1),
  pageSize: z.coerce.number().int().min(1).max(200).default(25),
});
export type LedgerQuery = z.infer<typeof ledgerQuerySchema>;

/** The same filters for a CSV export (every matching entry, no paging). */
export const ledgerExportQuerySchema = ledgerQuerySchema.omit({ page: true, pageSize: true });
export type LedgerExportQuery = z.infer<typeof ledgerExportQuerySchema>;

export interface LedgerEntryOut {
  id: number;
  /** When the money moved (paid or refunded), else when the entry was recorded; ISO 8601 UTC. */
  date: string;
  paidAt: string | null;
  recordedAt: string;
  kind: "deposit" | "balance" | "refund";
  status: "pending" | "paid" | "failed" | "cancelled";
  method: "offline" | "card";
  currency: string;
  /** Signed: refunds negative. */
  grossMinor: number;
  feeMinor: number;
  netMinor: number;
  reference: string | null;
  refundOf: number | null;
  commission: { id: number; number: string; title: string };
  client: { id: number; name: string };
  processor: { chargeId: string | null; refundId: string | null; balanceTransactionId: string | null } | null;
  /** The month the entry is counted in, and whether that month is reconciled and locked. */
  month: string;
  monthLocked: boolean;
}

export interface LedgerPage {
  items: LedgerEntryOut[];
  total: number;
  page: number;
  pageSize: number;
  /** Per currency, over every page of the filtered entries that settled (status paid). */
  totals: CurrencyTotals[];
}

export const resolveNoteSchema = z.object({
  note: z.string().trim().min(3, "Say how it was resolved (at least 3 characters).").max(1000, "At most 1000 characters."),
});

export const lockPeriodSchema = z.object({
  note: z.string().trim().max(1000, "At most 1000 characters.").optional(),
});

export interface ReconciliationPeriodSummary {
  month: string;
  status: "open" | "locked" | "never";
  lastRunAt: string | null;
  openExceptions: number;
  flaggedChanges: number;
  ledgerEntries: number;
}

export interface MatchOut {
  paymentId: number | null;
  commissionNumber: string | null;
  txnId: string;
  txnType: string;
  txnCreatedAt: string;
  ledgerAmountMinor: number;
  ledgerCurrency: string;
  processorAmountMinor: number;
  processorFeeMinor: number;
  processorNetMinor: number;
  processorCurrency: string;
  payoutId: string | null;
  otherMonth: string | null;
}

export interface ExceptionOut {
  id: number;
  kind: ExceptionKind;
  label: string;
  paymentId: number | null;
  commissionNumber: string | null;
  processorRef: string | null;
  ledgerAmountMinor: number | null;
  ledgerCurrency: string | null;
  processorAmountMinor: number | null;
  processorCurrency: string | null;
  detail: string;
  status: "open" | "resolved";
  /** No longer found by the latest run (put right since): not open whatever its status. */
  cleared: boolean;
  resolutionNote: string | null;
  resolvedBy: string | null;
  resolvedAt: string | null;
}

export interface PayoutLineOut {
  txnId: string;
  txnType: string;
  createdAt: string;
  amountMinor: number;
  feeMinor: number;
  netMinor: number;
  currency: string;
  paymentId: number | null;
  commissionNumber: string | null;
  kind: string | null;
}

export interface PayoutOut {
  payoutId: string;
  amountMinor: number;
  currency: string;
  createdAt: string;
  arrivalAt: string;
  status: string;
  workshopNetMinor: number;
  workshopCount: number;
  otherNetMinor: number;
  otherCount: number;
  lines: PayoutLineOut[];
}

export interface LockedChangeOut {
  id: number;
  source: "owner" | "processor";
  action: string;
  paymentId: number | null;
  eventId: string | null;
  actor: string | null;
  detail: unknown;
  createdAt: string;
  reviewedAt: string | null;
  reviewedBy: string | null;
  reviewNote: string | null;
}

export interface ReconciliationPeriodOut {
  month: string;
  label: string;
  status: "open" | "locked" | "never";
  monthOver: boolean;
  lastRunAt: string | null;
  lastRunBy: string | null;
  lockedAt: string | null;
  lockedBy: string | null;
  lockNote: string | null;
  ledgerEntries: number;
  processorTransactions: number;
  /** Entries taken outside the processor (bank transfer, cash): not compared with it. */
  offlineEntries: number;
  matches: MatchOut[];
  exceptions: ExceptionOut[];
  payouts: PayoutOut[];
  lockedChanges: LockedChangeOut[];
  /** Ledger changes in the month since the last run (the run must be repeated before locking). */
  changedSinceRun: number;
  canLock: boolean;
  /** Why it cannot be locked now (null when it can, or is already). */
  lockBlocker: string | null;
}

export interface AmountOut {
  currency: string;
  amountMinor: number;
}

export interface HeldCommissionOut {
  id: number;
  number: string;
  title: string;
  client: string;
  stage: string;
  stageLabel: string;
  currency: string;
  heldMinor: number;
  since: string;
}

export interface HoldingsOut {
  asOf: string;
  /** Money received for commissions whose build has not started (a liability), per currency. */
  held: AmountOut[];
  /** Money recognised as income so far (received for commissions whose build has started), per currency. */
  earned: AmountOut[];
  commissions: HeldCommissionOut[];
}

export interface MonthFiguresOut {
  currency: string;
  /** Deposits and balances settled in the month. */
  receivedMinor: number;
  /** Refunds settled in the month (positive). */
  refundedMinor: number;
  feeMinor: number;
  /** Received − refunded − fees. */
  netMinor: number;
  earnedMinor: number;
  heldAtStartMinor: number;
  heldAtEndMinor: number;
}

export interface MonthSummaryOut {
  month: string;
  label: string;
  figures: MonthFiguresOut[];
  reconciliation: "open" | "locked" | "never";
  openExceptions: number;
  entries: number;
}
