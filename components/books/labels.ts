// Words and badge tones for ledger entries and reconciliation states.
import type { BadgeTone } from "@/components/ui/badge";
import type { LedgerEntryOut, ReconciliationPeriodSummary } from "@/lib/schemas/books";

const KIND: Record<LedgerEntryOut["kind"], string> = { deposit: "Deposit", balance: "Balance", refund: "Refund" };

/** "Deposit by card", "Balance, bank transfer/cash", "Refund of #12". */
export function entryKindLabel(e: Pick<LedgerEntryOut, "kind" | "method" | "refundOf">): string {
  if (e.kind === "refund") return `Refund${e.refundOf ? ` of #${e.refundOf}` : ""}${e.method === "card" ? " (card)" : ""}`;
  return `${KIND[e.kind]}${e.method === "card" ? " by card" : ", offline"}`;
}

export function entryStatus(e: Pick<LedgerEntryOut, "kind" | "status">): { label: string; tone: BadgeTone } {
  if (e.status === "paid") return { label: e.kind === "refund" ? "Refunded" : "Settled", tone: "success" };
  if (e.status === "pending") return { label: e.kind === "refund" ? "Refund pending" : "Checkout open", tone: "warning" };
  if (e.status === "failed") return { label: e.kind === "refund" ? "Refund failed" : "Declined", tone: "danger" };
  return { label: "Not completed", tone: "neutral" };
}

export const PERIOD_STATUS: Record<ReconciliationPeriodSummary["status"], { label: string; tone: BadgeTone }> = {
  never: { label: "Not compared", tone: "neutral" },
  open: { label: "Compared, open", tone: "warning" },
  locked: { label: "Reconciled, locked", tone: "success" },
};
