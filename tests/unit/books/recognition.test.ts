// Held and earned money. The rule is the product's (lib/books/recognition.ts: held until the build
// starts, then earned; a refund reduces what it comes out of). The checks lean on the identity of
// deferred income (a "contract liability" in IFRS 15 terms): at any moment, what has been received
// less what has been refunded equals what is still held plus what has been earned.
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { earnedBetween, earnedBy, heldAt, heldByCommission, isHeldAt, recognisedAt, type MoneyEntry } from "@/lib/books/recognition";

const t = (iso: string) => new Date(`${iso}T12:00:00Z`);
const entry = (commissionId: number, signedMinor: number, paid: string, currency = "EUR"): MoneyEntry => ({ commissionId, signedMinor, currency, paidAt: t(paid) });

describe("held and earned", () => {
  it("holds a deposit until the build starts, then counts it earned from that day", () => {
    const deposit = entry(1, 90_000, "2027-03-02");
    const starts = new Map([[1, t("2027-03-20")]]);
    expect(heldAt([deposit], starts, t("2027-03-10"))).toEqual({ EUR: 90_000 });
    expect(earnedBy([deposit], starts, t("2027-03-10"))).toEqual({});
    expect(recognisedAt(deposit, starts)).toEqual(t("2027-03-20"));
    expect(heldAt([deposit], starts, t("2027-03-21"))).toEqual({});
    expect(earnedBy([deposit], starts, t("2027-03-21"))).toEqual({ EUR: 90_000 });
  });

  it("earns money received once the build has started when it is received", () => {
    const balance = entry(1, 210_000, "2027-05-10");
    const starts = new Map([[1, t("2027-03-20")]]);
    expect(recognisedAt(balance, starts)).toEqual(t("2027-05-10"));
    expect(isHeldAt(balance, starts, t("2027-05-11"))).toBe(false);
    expect(earnedBetween([balance], starts, t("2027-05-01"), t("2027-06-01"))).toEqual({ EUR: 210_000 });
    expect(earnedBetween([balance], starts, t("2027-04-01"), t("2027-05-01"))).toEqual({});
  });

  it("takes a refund before the build starts out of the held money, and one after out of earned income", () => {
    const early = [entry(1, 90_000, "2027-03-02"), entry(1, -30_000, "2027-03-05")];
    expect(heldAt(early, new Map(), t("2027-03-06"))).toEqual({ EUR: 60_000 });
    const late = [entry(2, 90_000, "2027-03-02"), entry(2, -30_000, "2027-04-05")];
    const starts = new Map([[2, t("2027-03-10")]]);
    expect(heldAt(late, starts, t("2027-04-06"))).toEqual({});
    expect(earnedBetween(late, starts, t("2027-04-01"), t("2027-05-01"))).toEqual({ EUR: -30_000 });
    expect(earnedBy(late, starts, t("2027-04-06"))).toEqual({ EUR: 60_000 });
  });

  it("keeps a cancelled commission's deposit held until it is refunded, and lists what each commission holds", () => {
    const entries = [entry(3, 45_000, "2027-02-01"), entry(4, 50_000, "2027-02-03", "USD"), entry(4, -50_000, "2027-02-20", "USD")];
    const held = heldByCommission(entries, new Map(), t("2027-03-01"));
    expect(held).toEqual([{ commissionId: 3, currency: "EUR", heldMinor: 45_000, since: t("2027-02-01") }]);
  });

  it("holds received − refunded = held + earned at every moment (property)", () => {
    const day = fc.integer({ min: 0, max: 120 });
    const at = (d: number) => new Date(Date.UTC(2027, 0, 1, 12) + d * 86_400_000);
    fc.assert(
      fc.property(
        fc.array(fc.record({ c: fc.integer({ min: 1, max: 4 }), amount: fc.integer({ min: -50_000, max: 200_000 }), d: day }), { maxLength: 25 }),
        fc.array(fc.option(day, { nil: null }), { minLength: 4, maxLength: 4 }),
        day,
        (raw, startDays, when) => {
          const entries = raw.map((r) => ({ commissionId: r.c, signedMinor: r.amount, currency: "EUR", paidAt: at(r.d) }));
          const starts = new Map(startDays.map((d, i) => [i + 1, d === null ? null : at(d)]));
          const moment = at(when);
          const received = entries.filter((e) => e.paidAt <= moment).reduce((s, e) => s + e.signedMinor, 0);
          const held = heldAt(entries, starts, moment).EUR ?? 0;
          const earned = earnedBy(entries, starts, moment).EUR ?? 0;
          expect(held + earned).toBe(received);
        },
      ),
    );
  });
});
