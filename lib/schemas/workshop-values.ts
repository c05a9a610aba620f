// What the workshop forms offer and propose (workshop.ts re-exports them). No zod here, so client
// components import these without bringing zod into a page's first load
// (components/forms/lazy-schema.ts loads the schemas on first use).

/** Currencies offered in the form; any ISO 4217 code the runtime knows is accepted by the API. */
export const COMMON_CURRENCIES = ["EUR", "USD", "GBP", "CAD", "AUD", "NZD", "CHF", "SEK", "NOK", "DKK", "JPY"] as const;

/** Proposes a slug from a name: "Fernhollow Luthiery" → "fernhollow-luthiery". */
const LETTERS: Record<string, string> = { ø: "o", æ: "ae", œ: "oe", ß: "ss", đ: "d", ł: "l", þ: "th" };

export function slugFromName(name: string): string {
  return name
    .toLowerCase()
    .replace(/[øæœßđłþ]/g, (c) => LETTERS[c] ?? c)
    .normalize("NFKD")
    .replace(/[\u0300-\u036f]/g, "")
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, "-")
    .replace(/^-+|-+$/g, "")
    .slice(0, 48)
    .replace(/-+$/g, "");
}
