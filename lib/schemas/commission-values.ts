// The commission list's sort keys (the list query schema in commission.ts is built from them and
// re-exports them). No zod here, so client components import these without bringing zod into a
// page's first load (components/forms/lazy-schema.ts loads the schemas on first use).

/** Sort keys of the commission list; a leading "-" is descending. */
export const COMMISSION_SORTS = ["number", "-number", "title", "-title", "stage", "-stage", "targetDate", "-targetDate", "updated", "-updated"] as const;
