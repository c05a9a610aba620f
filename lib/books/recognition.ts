// Held and earned money. Pure.
//
// The rule (the product's, stated in README "Books"): money received for a commission is HELD — a
// liability, the client's money the workshop may have to give back — until the commission's build
// starts, the moment it first enters a build stage (for a commission whose deposit completes in the
// deposit stage, that is the moment the deposit is covered). From then on it is EARNED. So:
//   - a deposit paid before the build starts is held, and becomes earned when the build starts;
//   - money paid once the build has started (the balance, a late deposit) is earned when received;
//   - a refund reduces what it comes out of: held money before the build starts, earned money after;
//   - a commission cancelled before its build keeps its money held until it is refunded.
// Every settled entry therefore has a recognition moment: max(paid, build start), or none yet.

export interface MoneyEntry {
  commissionId: number;
  currency: string;
  /** Signed: money in positive, refunds negative. */
  signedMinor: number;
  paidAt: Date;
}

/** When the build of each commission started (absent or null: not yet). */
export type BuildStarts = ReadonlyMap<number, Date | null>;

/** When an entry becomes earned, or null while its commission's build has not started. */
export function recognisedAt(entry: MoneyEntry, starts: BuildStarts): Date | null {
  const start = starts.get(entry.commissionId) ?? null;
  if (!start) return null;
  return start.getTime() > entry.paidAt.getTime() ? start : entry.paidAt;
}

/** True while the entry counts as held at `at`: received by then, its build not started by then. */
export function isHeldAt(entry: MoneyEntry, starts: BuildStarts, at: Date): boolean {
  if (entry.paidAt.getTime() > at.getTime()) return false;
  const start = starts.get(entry.commissionId) ?? null;
  return !start || start.getTime() > at.getTime();
}

export interface HeldCommission {
  commissionId: number;
  currency: string;
  heldMinor: number;
  /** When the first money still held came in. */
  since: Date;
}

/** What each commission holds at `at` (commissions holding nothing are left out). */
export function heldByCommission(entries: readonly MoneyEntry[], starts: BuildStarts, at: Date): HeldCommission[] {
  const by = new Map<number, HeldCommission>();
  for (const e of entries) {
    if (!isHeldAt(e, starts, at)) continue;
    const h = by.get(e.commissionId) ?? { commissionId: e.commissionId, currency: e.currency, heldMinor: 0, since: e.paidAt };
    h.heldMinor += e.signedMinor;
    if (e.paidAt < h.since) h.since = e.paidAt;
    by.set(e.commissionId, h);
  }
  return [...by.values()].filter((h) => h.heldMinor !== 0);
}

export type ByCurrency = Record<string, number>;

function addTo(map: ByCurrency, currency: string, amount: number) {
  map[currency] = (map[currency] ?? 0) + amount;
}

/** Held at `at`, per currency. */
export function heldAt(entries: readonly MoneyEntry[], starts: BuildStarts, at: Date): ByCurrency {
  const out: ByCurrency = {};
  for (const e of entries) if (isHeldAt(e, starts, at)) addTo(out, e.currency, e.signedMinor);
  return out;
}

/** Earned in [from, to), per currency: entries whose recognition moment falls in it. */
export function earnedBetween(entries: readonly MoneyEntry[], starts: BuildStarts, from: Date, to: Date): ByCurrency {
  const out: ByCurrency = {};
  for (const e of entries) {
    const r = recognisedAt(e, starts);
    if (r && r.getTime() >= from.getTime() && r.getTime() < to.getTime()) addTo(out, e.currency, e.signedMinor);
  }
  return out;
}

/** Earned up to `at` (inclusive), per currency. */
export function earnedBy(entries: readonly MoneyEntry[], starts: BuildStarts, at: Date): ByCurrency {
  return earnedBetween(entries, starts, new Date(0), new Date(at.getTime() + 1));
}
