// Held and earned money over HTTP, after a deposit, the start of the build and refunds. The rule is
// the product's (README "Books": held until the build starts, then earned; a refund reduces what it
// comes out of). Each step also checks the identity of deferred income (IFRS 15's contract
// liability): received − refunded = held + earned.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { HoldingsOut, MonthSummaryOut } from "@/lib/schemas/books";
import { DEFAULT_BUILD_STAGES } from "@/lib/workflow/stages";
import { closeTestDb } from "../setup/test-db";
import { detail, signInRoles } from "./commission-helpers";
import { approvedCommission, books, recordPayment, refundPayment } from "./books-helpers";
import { createWorkshopWithMembers, type TestWorkshop } from "./fixtures";

let ws: TestWorkshop;
let s: Awaited<ReturnType<typeof signInRoles>>;
let a: number;
let b: number;
let aFirst: number;

beforeAll(async () => {
  ws = await createWorkshopWithMembers();
  s = await signInRoles(ws);
  a = (await approvedCommission(s, ws, { title: "Held A", priceMinor: 300_000 })).id;
  b = (await approvedCommission(s, ws, { title: "Held B", priceMinor: 200_000 })).id;
});
afterAll(closeTestDb);

async function holdings(): Promise<HoldingsOut> {
  const r = await s.bookkeeper.json<{ holdings: HoldingsOut }>(`${books(ws)}/holdings`);
  expect(r.status).toBe(200);
  return r.body.holdings;
}
const eur = (list: Array<{ currency: string; amountMinor: number }>) => list.find((x) => x.currency === "EUR")?.amountMinor ?? 0;

describe("held and earned", () => {
  it("holds a part deposit while the commission waits in the deposit stage", async () => {
    aFirst = await recordPayment(s.bookkeeper, ws, a, { kind: "deposit", amountMinor: 40_000 });
    expect((await detail(s.owner, ws, a)).stage).toBe("deposit");
    const h = await holdings();
    expect([eur(h.held), eur(h.earned)]).toEqual([40_000, 0]);
    expect(h.commissions).toMatchObject([{ id: a, heldMinor: 40_000, stage: "deposit", stageLabel: "Deposit", currency: "EUR" }]);
  });

  it("counts the whole deposit earned once it is covered and the build starts", async () => {
    await recordPayment(s.bookkeeper, ws, a, { kind: "deposit", amountMinor: 50_000 });
    expect((await detail(s.owner, ws, a)).stage).toBe(DEFAULT_BUILD_STAGES[0]!.key);
    const h = await holdings();
    expect([eur(h.held), eur(h.earned)]).toEqual([0, 90_000]);
    expect(h.commissions).toEqual([]);
  });

  it("takes a refund before the build out of held money, and one after it out of earned income", async () => {
    const bDeposit = await recordPayment(s.bookkeeper, ws, b, { kind: "deposit", amountMinor: 30_000 });
    await refundPayment(s.bookkeeper, ws, b, bDeposit, 10_000);
    let h = await holdings();
    expect([eur(h.held), eur(h.earned)]).toEqual([20_000, 90_000]);
    await refundPayment(s.owner, ws, a, aFirst, 15_000);
    h = await holdings();
    expect([eur(h.held), eur(h.earned)]).toEqual([20_000, 75_000]);
    // received 40,000 + 50,000 + 30,000 − refunded 25,000 = held + earned.
    expect(eur(h.held) + eur(h.earned)).toBe(120_000 - 25_000);
  });

  it("shows the same in the month's summary: received, refunded, earned and held at the end", async () => {
    const r = await s.owner.json<{ months: MonthSummaryOut[] }>(`${books(ws)}/summary`);
    expect(r.status).toBe(200);
    const now = r.body.months[0]!;
    expect(now.figures).toEqual([{ currency: "EUR", receivedMinor: 120_000, refundedMinor: 25_000, feeMinor: 0, netMinor: 95_000, earnedMinor: 75_000, heldAtStartMinor: 0, heldAtEndMinor: 20_000 }]);
    expect(now.reconciliation).toBe("never");
  });
});
