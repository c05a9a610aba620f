// A month's figures. The arithmetic identities checked: net = received − refunded − fees; held at the
// end = held at the start + money received into held − held money earned or refunded (a roll-forward
// of the deposits liability, as any balance-sheet account rolls forward).
import { describe, expect, it } from "vitest";
import { monthFigures, type SettledEntry } from "@/lib/books/summary";

const at = (m: number, d: number) => new Date(Date.UTC(2027, m - 1, d, 12));
const e = (commissionId: number, kind: SettledEntry["kind"], amount: number, fee: number, paidAt: Date, currency = "EUR"): SettledEntry => {
  const signedMinor = kind === "refund" ? -amount : amount;
  return { commissionId, kind, currency, signedMinor, feeMinor: fee, netMinor: signedMinor - fee, paidAt };
};

describe("monthFigures", () => {
  it("gives received, refunded, fees, net, earned and held at both ends per currency", () => {
    const entries = [
      e(1, "deposit", 90_000, 1_330, at(2, 20)), // held into March, build starts 5 March
      e(2, "deposit", 60_000, 0, at(3, 3)), // still held at the end of March
      e(1, "balance", 210_000, 3_070, at(3, 15)),
      e(2, "refund", 10_000, 0, at(3, 20)),
      e(3, "deposit", 5_000, 0, at(3, 9), "USD"),
    ];
    const starts = new Map([[1, at(3, 5)]]);
    const [eur, usd] = monthFigures(entries, starts, "2027-03");
    expect(eur).toEqual({ currency: "EUR", receivedMinor: 270_000, refundedMinor: 10_000, feeMinor: 3_070, netMinor: 256_930, earnedMinor: 300_000, heldAtStartMinor: 90_000, heldAtEndMinor: 50_000 });
    expect(eur!.netMinor).toBe(eur!.receivedMinor - eur!.refundedMinor - eur!.feeMinor);
    // Roll-forward: 90,000 + 60,000 received into held − 90,000 earned − 10,000 refunded = 50,000.
    expect(eur!.heldAtStartMinor + 60_000 - 90_000 - 10_000).toBe(eur!.heldAtEndMinor);
    expect(usd).toMatchObject({ currency: "USD", receivedMinor: 5_000, heldAtEndMinor: 5_000, earnedMinor: 0 });
  });

  it("shows a month with only money still held from before", () => {
    const figures = monthFigures([e(2, "deposit", 60_000, 0, at(1, 3))], new Map(), "2027-03");
    expect(figures).toEqual([{ currency: "EUR", receivedMinor: 0, refundedMinor: 0, feeMinor: 0, netMinor: 0, earnedMinor: 0, heldAtStartMinor: 60_000, heldAtEndMinor: 60_000 }]);
    expect(monthFigures([], new Map(), "2027-03")).toEqual([]);
  });
});
