// The kinds of difference reconciliation finds between the ledger and the processor, in words for
// the bookkeeper. Pure.

export const EXCEPTION_KINDS = ["missing_at_processor", "missing_in_ledger", "amount_mismatch", "currency_mismatch", "refund_not_recorded"] as const;
export type ExceptionKind = (typeof EXCEPTION_KINDS)[number];

export const EXCEPTION_LABELS: Record<ExceptionKind, string> = {
  missing_at_processor: "In the ledger, not at the processor",
  missing_in_ledger: "At the processor, not in the ledger",
  amount_mismatch: "Amounts differ",
  currency_mismatch: "Currencies differ",
  refund_not_recorded: "Refunded at the processor, not recorded",
};

export const EXCEPTION_HELP: Record<ExceptionKind, string> = {
  missing_at_processor: "The ledger shows card money moving that the processor has no standing transaction for (never settled, or returned since).",
  missing_in_ledger: "The processor moved money for this workshop that the ledger does not show as settled (a confirmation that never arrived, or a payment made outside the app).",
  amount_mismatch: "Both sides have the entry, but the gross amount or the fee differs.",
  currency_mismatch: "Both sides have the entry, but in different currencies (a conversion at the processor, or a wrong record).",
  refund_not_recorded: "The processor refunded a payment the ledger has, but the ledger shows no settled refund for it.",
};
