// The books demo: a month of card payments at Fernhollow that contains one of each reconciliation
// exception, made through the payments fake by db/seeds/95_demo_books.ts. Every name is invented.
// Pure: what happens to each commission; the seed makes it happen.

export type BooksDemoTwist =
  /** Paid and confirmed: pairs up cleanly. */
  | "clean"
  /** Paid at the processor, its confirmation lost on the way: at the processor, not in the ledger. */
  | "lost-confirmation"
  /** The processor later settles a different gross amount: amounts differ. */
  | "amount-changed"
  /** The processor settles it in another currency: currencies differ. */
  | "currency-changed"
  /** Partly refunded at the processor, the app never told: refunded at the processor, not recorded. */
  | "refund-untold"
  /** Partly refunded from the app, then the bank returns the refund and the notice is lost:
   *  the ledger still counts a refund the processor no longer has (in the ledger, not at the processor). */
  | "refund-bounced";

export interface BooksDemoCommission {
  /** Unique within the workshop: how a second run recognises it. */
  title: string;
  client: string;
  priceMinor: number;
  twist: BooksDemoTwist;
}

export const BOOKS_DEMO_WORKSHOP = "fernhollow";

export const BOOKS_DEMO_COMMISSIONS: readonly BooksDemoCommission[] = [
  { title: "Books demo: ash single-cut, 24.75 in", client: "nadia.fensome@example.com", priceMinor: 320_000, twist: "clean" },
  { title: "Books demo: alder offset, 25.5 in", client: "otto.lindqvist@example.com", priceMinor: 285_000, twist: "clean" },
  { title: "Books demo: mahogany semi-hollow", client: "priya.ramnath@example.com", priceMinor: 410_000, twist: "lost-confirmation" },
  { title: "Books demo: korina flying wedge", client: "nadia.fensome@example.com", priceMinor: 365_000, twist: "amount-changed" },
  { title: "Books demo: walnut short-scale bass", client: "otto.lindqvist@example.com", priceMinor: 298_000, twist: "currency-changed" },
  { title: "Books demo: spruce-top archtop", client: "priya.ramnath@example.com", priceMinor: 540_000, twist: "refund-untold" },
  { title: "Books demo: maple five-string bass", client: "wren.tallis@example.com", priceMinor: 372_000, twist: "refund-bounced" },
];

/** What the processor settles 1.00 of the workshop's currency as, when it converts (an invented rate). */
export const BOOKS_DEMO_CONVERSION = { currency: "usd", rate: 1.0842 } as const;
/** How much less the processor settles for "amount-changed" (minor units). */
export const BOOKS_DEMO_SHORTFALL_MINOR = 1_250;
/** The share of a payment refunded in the two refund twists. */
export const BOOKS_DEMO_REFUND_SHARE = 0.1;
