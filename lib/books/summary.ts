// The figures of one month per currency: received, refunded, fees, net, earned, held at its start
// and end. Pure; "earned" and "held" follow lib/books/recognition.ts.
import type { MonthFiguresOut } from "@/lib/schemas/books";
import type { EntryKind } from "./entries";
import { earnedBetween, heldAt, type BuildStarts, type MoneyEntry } from "./recognition";
import { monthRange, type Month } from "./months";

export interface SettledEntry extends MoneyEntry {
  kind: EntryKind;
  feeMinor: number;
  netMinor: number;
}

export function monthFigures(entries: readonly SettledEntry[], starts: BuildStarts, month: Month): MonthFiguresOut[] {
  const { start, end } = monthRange(month);
  const justBefore = (d: Date) => new Date(d.getTime() - 1);
  const heldStart = heldAt(entries, starts, justBefore(start));
  const heldEnd = heldAt(entries, starts, justBefore(end));
  const earned = earnedBetween(entries, starts, start, end);
  const by = new Map<string, MonthFiguresOut>();
  const row = (currency: string) => {
    let r = by.get(currency);
    if (!r) {
      r = { currency, receivedMinor: 0, refundedMinor: 0, feeMinor: 0, netMinor: 0, earnedMinor: earned[currency] ?? 0, heldAtStartMinor: heldStart[currency] ?? 0, heldAtEndMinor: heldEnd[currency] ?? 0 };
      by.set(currency, r);
    }
    return r;
  };
  for (const e of entries) {
    if (e.paidAt < start || e.paidAt >= end) continue;
    const r = row(e.currency);
    if (e.kind === "refund") r.refundedMinor -= e.signedMinor;
    else r.receivedMinor += e.signedMinor;
    r.feeMinor += e.feeMinor;
    r.netMinor += e.netMinor;
  }
  for (const currency of new Set([...Object.keys(earned), ...Object.keys(heldStart), ...Object.keys(heldEnd)])) {
    const r = row(currency);
    if (r.receivedMinor === 0 && r.refundedMinor === 0 && r.earnedMinor === 0 && r.heldAtStartMinor === 0 && r.heldAtEndMinor === 0) by.delete(currency);
  }
  return [...by.values()].sort((a, b) => a.currency.localeCompare(b.currency));
}
