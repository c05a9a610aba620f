// The ledger's sort keys, statuses and kinds (books.ts builds the query schema from them and
// re-exports them). No zod here, so client components import these without bringing zod into a
// page's first load (components/forms/lazy-schema.ts loads the schemas on first use).

export const LEDGER_SORTS = ["date", "-date", "amount", "-amount", "commission", "-commission"] as const;
export const LEDGER_STATUSES = ["paid", "pending", "failed", "cancelled", "all"] as const;
export const LEDGER_KINDS = ["deposit", "balance", "refund"] as const;
