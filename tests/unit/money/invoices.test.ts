// The deposit and balance invoices of a commission. Which invoice is payable when is a product
// rule of issue 6 (no outside source); the arithmetic is checked against plain identities of
// bookkeeping (amount = paid + still due; what was paid less what was refunded is what is held),
// and a property test feeds it arbitrary ledgers.
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { phaseOf, refundableMinor, summarizeInvoices, type CommissionPhase, type LedgerLine } from "@/lib/money/invoices";

const commission = (phase: CommissionPhase, priceMinor = 300_000, depositMinor = 90_000) => ({ priceMinor, depositMinor, currency: "EUR", phase });
let nextId = 1;
const pay = (kind: "deposit" | "balance", amountMinor: number, status: LedgerLine["status"] = "paid", method: LedgerLine["method"] = "card"): LedgerLine => ({
  id: nextId++,
  kind,
  status,
  method,
  amountMinor,
  refundOf: null,
});
const refund = (of: LedgerLine, amountMinor: number, status: LedgerLine["status"] = "paid"): LedgerLine => ({
  id: nextId++,
  kind: "refund",
  status,
  method: of.method,
  amountMinor,
  refundOf: of.id,
});

describe("invoices", () => {
  it("splits the price into the deposit and the balance (deposit + balance = price)", () => {
    const s = summarizeInvoices(commission("deposit"), []);
    const [deposit, balance] = s.invoices;
    expect(deposit.amountMinor + balance.amountMinor).toBe(300_000);
    expect(deposit).toMatchObject({ kind: "deposit", amountMinor: 90_000, outstandingMinor: 90_000, status: "due", payable: true });
    // Product rule: the balance falls due once the deposit is paid and the build has started.
    expect(balance).toMatchObject({ kind: "balance", amountMinor: 210_000, status: "not_due", payable: false });
    expect(s.outstandingMinor).toBe(300_000);
  });

  it("asks nothing while the spec is open and nothing more once cancelled", () => {
    expect(summarizeInvoices(commission("spec"), []).invoices[0]).toMatchObject({ status: "not_due", payable: false });
    const cancelled = summarizeInvoices(commission("cancelled"), [pay("deposit", 90_000)]);
    expect(cancelled.invoices[0].status).toBe("paid");
    expect(cancelled.invoices[1]).toMatchObject({ status: "void", payable: false });
  });

  it("opens the balance once the deposit is covered and the build is under way", () => {
    const lines = [pay("deposit", 90_000)];
    const s = summarizeInvoices(commission("build"), lines);
    expect(s.invoices[0]).toMatchObject({ status: "paid", outstandingMinor: 0, payable: false });
    expect(s.invoices[1]).toMatchObject({ status: "due", outstandingMinor: 210_000, payable: true });
    expect(summarizeInvoices(commission("final_setup"), [...lines, pay("balance", 210_000)]).invoices[1].status).toBe("paid");
  });

  it("counts only payments that went through, and marks an open card checkout", () => {
    const s = summarizeInvoices(commission("deposit"), [pay("deposit", 90_000, "pending"), pay("deposit", 90_000, "cancelled"), pay("deposit", 90_000, "failed")]);
    expect(s.invoices[0]).toMatchObject({ paidMinor: 0, outstandingMinor: 90_000, checkoutOpen: true, payable: true });
    expect(s.paidMinor).toBe(0);
  });

  it("subtracts refunds that went through from the invoice of the payment they return", () => {
    const d = pay("deposit", 90_000);
    const s = summarizeInvoices(commission("build"), [d, refund(d, 30_000), refund(d, 10_000, "pending"), refund(d, 5_000, "failed")]);
    expect(s.invoices[0]).toMatchObject({ paidMinor: 60_000, outstandingMinor: 30_000, status: "part_paid", payable: true });
    expect(s.refundedMinor).toBe(30_000);
    expect(s.refundPendingMinor).toBe(10_000);
    // A balance is not payable while the deposit is short again.
    expect(s.invoices[1].payable).toBe(false);
  });

  it("reports money paid beyond the price", () => {
    const s = summarizeInvoices(commission("build"), [pay("deposit", 90_000), pay("deposit", 90_000, "paid", "offline")]);
    expect(s.overpaidMinor).toBe(0);
    const over = summarizeInvoices(commission("final_setup"), [pay("deposit", 90_000), pay("balance", 210_000), pay("balance", 50_000, "paid", "offline")]);
    expect(over.overpaidMinor).toBe(50_000);
    expect(over.outstandingMinor).toBe(0);
  });

  it("has nothing to pay for a deposit of 0 %", () => {
    const s = summarizeInvoices(commission("deposit", 300_000, 0), []);
    expect(s.invoices[0]).toMatchObject({ status: "none", payable: false });
    expect(summarizeInvoices(commission("build", 300_000, 0), []).invoices[1]).toMatchObject({ status: "due", payable: true, amountMinor: 300_000 });
  });

  it("lets a payment be refunded up to what is left, counting refunds on their way", () => {
    const d = pay("deposit", 90_000);
    const lines = [d, refund(d, 20_000), refund(d, 30_000, "pending"), refund(d, 40_000, "failed")];
    expect(refundableMinor(d, lines)).toBe(40_000);
    expect(refundableMinor(pay("deposit", 1_000, "pending"), lines)).toBe(0);
    expect(refundableMinor(lines[1]!, lines)).toBe(0);
  });

  it("maps stages to phases", () => {
    expect(phaseOf("timber", true)).toBe("build");
    expect(phaseOf("deposit", false)).toBe("deposit");
    expect(phaseOf("final_setup", false)).toBe("final_setup");
    expect(phaseOf("on_hold", false)).toBe("on_hold");
  });

  it("keeps amount = paid + still due on every invoice and paid − refunded = net, for any ledger (property)", () => {
    const kind = fc.constantFrom("deposit" as const, "balance" as const);
    const status = fc.constantFrom("pending" as const, "paid" as const, "failed" as const, "cancelled" as const);
    const ledger = fc.array(fc.record({ kind, status, amount: fc.integer({ min: 1, max: 200_000 }), refunds: fc.array(fc.record({ status, amount: fc.integer({ min: 1, max: 50_000 }) }), { maxLength: 3 }) }), {
      maxLength: 6,
    });
    const phase = fc.constantFrom<CommissionPhase>("spec", "deposit", "build", "final_setup", "delivered", "on_hold", "cancelled");
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 500_000 }), fc.integer({ min: 0, max: 100 }), phase, ledger, (price, pct, ph, entries) => {
        const depositMinor = Math.round((price * pct) / 100);
        const lines: LedgerLine[] = [];
        let gross = 0;
        let refunded = 0;
        for (const e of entries) {
          const p = pay(e.kind, e.amount, e.status);
          lines.push(p);
          if (e.status === "paid") gross += e.amount;
          for (const r of e.refunds) {
            lines.push(refund(p, r.amount, r.status));
            if (r.status === "paid") refunded += r.amount;
          }
        }
        const s = summarizeInvoices({ priceMinor: price, depositMinor, currency: "EUR", phase: ph }, lines);
        expect(s.invoices[0].amountMinor + s.invoices[1].amountMinor).toBe(price);
        for (const i of s.invoices) {
          expect(i.paidMinor + i.outstandingMinor).toBe(i.amountMinor);
          expect(i.outstandingMinor).toBeGreaterThanOrEqual(0);
          if (i.payable) expect(i.outstandingMinor).toBeGreaterThan(0);
        }
        expect(s.paidMinor).toBe(gross - refunded);
        expect(s.refundedMinor).toBe(refunded);
        expect(s.outstandingMinor).toBe(Math.max(0, price - s.paidMinor));
      }),
    );
  });
});
