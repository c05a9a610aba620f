// The overview's invoices from the detail route's totals (pure), checked against the payments
// page's own rules (summarizeInvoices over the real payment lines). Amounts worked by hand.
import { describe, expect, it } from "vitest";
import { overviewInvoices } from "@/components/commissions/money-summary";
import { summarizeInvoices, type LedgerLine } from "@/lib/money/invoices";

const money = { currency: "EUR", priceMinor: 400_000, depositMinor: 120_000, depositPercent: 30 };

describe("overviewInvoices", () => {
  it("asks for the deposit in the deposit stage and not yet for the balance", () => {
    const s = overviewInvoices(money, { depositPaidMinor: 0, paidMinor: 0, refundedMinor: 0, depositPaid: false, balancePaid: false }, "deposit");
    expect(s.invoices.map((i) => [i.kind, i.status, i.outstandingMinor])).toEqual([
      ["deposit", "due", 120_000],
      ["balance", "not_due", 280_000],
    ]);
    expect(s.outstandingMinor).toBe(400_000);
  });

  it("counts a refund once: paid so far is the net amount the route gives", () => {
    // A 1,200.00 deposit paid and 150.00 of it refunded: the route answers paid 1,050.00, refunded 150.00.
    const totals = { depositPaidMinor: 105_000, paidMinor: 105_000, refundedMinor: 15_000, depositPaid: false, balancePaid: false };
    const s = overviewInvoices(money, totals, "timber");
    expect(s.paidMinor).toBe(105_000);
    expect(s.outstandingMinor).toBe(295_000);
    // The same as the payments page works out from the payment lines themselves.
    const lines: LedgerLine[] = [
      { id: 10, kind: "deposit", status: "paid", method: "card", amountMinor: 120_000, refundOf: null },
      { id: 11, kind: "refund", status: "paid", method: "card", amountMinor: 15_000, refundOf: 10 },
    ];
    const page = summarizeInvoices({ priceMinor: money.priceMinor, depositMinor: money.depositMinor, currency: "EUR", phase: "build" }, lines);
    expect(s.invoices.map((i) => [i.status, i.paidMinor, i.outstandingMinor])).toEqual(page.invoices.map((i) => [i.status, i.paidMinor, i.outstandingMinor]));
    expect(s.invoices[0]!.status).toBe("part_paid");
  });

  it("shows the balance due once the build has started and paid when all is in", () => {
    const during = overviewInvoices(money, { depositPaidMinor: 120_000, paidMinor: 120_000, refundedMinor: 0, depositPaid: true, balancePaid: false }, "final_setup");
    expect(during.invoices.map((i) => i.status)).toEqual(["paid", "due"]);
    const done = overviewInvoices(money, { depositPaidMinor: 120_000, paidMinor: 400_000, refundedMinor: 0, depositPaid: true, balancePaid: true }, "delivered");
    expect(done.invoices.map((i) => i.status)).toEqual(["paid", "paid"]);
    expect(done.outstandingMinor).toBe(0);
  });
});
