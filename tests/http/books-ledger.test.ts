// The payments ledger over HTTP: server-side filters (month, status, kind, method, commission,
// client), sorting, paging, the totals row per currency over every page, bad queries answered 422
// with field paths, and the CSV export read back with csv-parse (a reference CSV reader): RFC 4180
// quoting, ISO 8601 dates, major units per ISO 4217 (EUR 2 decimals, JPY none), totals rows. The
// expected figures are sums of the payments this file records (no outside source needed).
import { parse } from "csv-parse/sync";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { LedgerEntryOut } from "@/lib/schemas/books";
import { closeTestDb, testDb } from "../setup/test-db";
import { signInRoles } from "./commission-helpers";
import { approvedCommission, books, ledger, recordPayment, refundPayment } from "./books-helpers";
import { createWorkshopWithMembers, type TestWorkshop } from "./fixtures";
import type { HttpSession } from "./session";

let ws: TestWorkshop;
let s: Awaited<ReturnType<typeof signInRoles>>;
let otherClient: HttpSession;
const ids: Record<string, number> = {};
const TITLE = 'Baritone, 27" scale, "fanned" frets';

beforeAll(async () => {
  ws = await createWorkshopWithMembers({ extra: { client: 1 } });
  s = await signInRoles(ws);
  const second = ws.members.filter((m) => m.role === "client")[1]!;
  const { signIn } = await import("./session");
  otherClient = await signIn(second);
  // A: EUR 3,000.00 for the first client; B: EUR 2,000.00 for the second; C: USD 1,000.00.
  const a = await approvedCommission(s, ws, { title: TITLE, priceMinor: 300_000 });
  const b = await approvedCommission({ ...s, client: otherClient }, ws, { title: "Short-scale bass", priceMinor: 200_000, clientId: second.userId });
  const c = await approvedCommission(s, ws, { title: "Travel guitar", priceMinor: 100_000, currency: "USD" });
  Object.assign(ids, { a: a.id, b: b.id, c: c.id });
  ids.aDeposit = await recordPayment(s.bookkeeper, ws, a.id, { kind: "deposit", amountMinor: 90_000, paidOn: "2026-03-10", reference: "Transfer, March" });
  ids.aBalance = await recordPayment(s.bookkeeper, ws, a.id, { kind: "balance", amountMinor: 100_000, paidOn: "2026-04-02" });
  ids.bDeposit = await recordPayment(s.owner, ws, b.id, { kind: "deposit", amountMinor: 60_000, paidOn: "2026-03-20" });
  ids.bRefund = await refundPayment(s.bookkeeper, ws, b.id, ids.bDeposit, 15_000);
  ids.cDeposit = await recordPayment(s.bookkeeper, ws, c.id, { kind: "deposit", amountMinor: 30_000, paidOn: "2026-04-15" });
  // The refund is recorded today; date it in April so the months are known.
  await testDb()("payments").where({ id: ids.bRefund }).update({ paid_at: new Date("2026-04-20T09:00:00Z") });
  // A declined card attempt: not money, but in the ledger under its status.
  const [pending] = await testDb()("payments").insert({ workshop_id: ws.id, commission_id: a.id, kind: "balance", status: "cancelled", method: "card", amount_minor: 110_000, currency: "EUR", created_at: new Date("2026-04-03T10:00:00Z") });
  ids.cancelled = Number(pending);
});
afterAll(closeTestDb);

const idsOf = (items: LedgerEntryOut[]) => items.map((e) => e.id);

describe("ledger", () => {
  it("lists settled entries newest first with gross, fee, net, dates and the commission; refunds negative", async () => {
    const page = await ledger(s.bookkeeper, ws);
    expect(idsOf(page.items)).toEqual([ids.bRefund, ids.cDeposit, ids.aBalance, ids.bDeposit, ids.aDeposit]);
    const refund = page.items[0]!;
    expect(refund).toMatchObject({ kind: "refund", status: "paid", method: "offline", grossMinor: -15_000, feeMinor: 0, netMinor: -15_000, refundOf: ids.bDeposit, date: "2026-04-20T09:00:00.000Z", month: "2026-04", monthLocked: false, processor: null });
    expect(page.items[4]).toMatchObject({ commission: { id: ids.a, title: TITLE }, client: { id: ws.client.userId, name: ws.client.name }, reference: "Transfer, March", paidAt: "2026-03-10T12:00:00.000Z" });
    expect(page.total).toBe(5);
  });

  it("totals each currency over every page, whatever the page size", async () => {
    const expected = [
      { currency: "EUR", count: 4, grossMinor: 90_000 + 100_000 + 60_000 - 15_000, feeMinor: 0, netMinor: 235_000 },
      { currency: "USD", count: 1, grossMinor: 30_000, feeMinor: 0, netMinor: 30_000 },
    ];
    const seen: LedgerEntryOut[] = [];
    for (let page = 1; page <= 3; page++) {
      const p = await ledger(s.owner, ws, `pageSize=2&page=${page}`);
      expect(p.totals).toEqual(expected);
      expect(p.total).toBe(5);
      seen.push(...p.items);
    }
    expect(seen).toHaveLength(5);
    // Identity: the totals row is the sum of the entries of its currency, across the pages.
    const eur = seen.filter((e) => e.currency === "EUR").reduce((sum, e) => sum + e.grossMinor, 0);
    expect(eur).toBe(expected[0]!.grossMinor);
  });

  it("filters by month, status, kind, method, commission and client", async () => {
    expect(idsOf((await ledger(s.owner, ws, "period=2026-03")).items)).toEqual([ids.bDeposit, ids.aDeposit]);
    expect((await ledger(s.owner, ws, "period=2026-03")).totals).toEqual([{ currency: "EUR", count: 2, grossMinor: 150_000, feeMinor: 0, netMinor: 150_000 }]);
    expect(idsOf((await ledger(s.owner, ws, "kind=refund")).items)).toEqual([ids.bRefund]);
    expect(idsOf((await ledger(s.owner, ws, "status=cancelled")).items)).toEqual([ids.cancelled]);
    // Totals count settled entries only: a filter on another status has none.
    expect((await ledger(s.owner, ws, "status=cancelled")).totals).toEqual([]);
    expect((await ledger(s.owner, ws, "status=all")).total).toBe(6);
    expect(idsOf((await ledger(s.owner, ws, "status=all&method=card")).items)).toEqual([ids.cancelled]);
    expect(idsOf((await ledger(s.owner, ws, `commission=${ids.a}`)).items)).toEqual([ids.aBalance, ids.aDeposit]);
    const second = ws.members.filter((m) => m.role === "client")[1]!;
    expect(idsOf((await ledger(s.owner, ws, `client=${second.userId}`)).items)).toEqual([ids.bRefund, ids.bDeposit]);
    expect((await ledger(s.owner, ws, "period=2026-03&kind=balance")).total).toBe(0);
  });

  it("sorts by date, amount (signed) and commission number, both ways", async () => {
    expect(idsOf((await ledger(s.owner, ws, "sort=date")).items)).toEqual([ids.aDeposit, ids.bDeposit, ids.aBalance, ids.cDeposit, ids.bRefund]);
    const byAmount = (await ledger(s.owner, ws, "sort=amount")).items.map((e) => e.grossMinor);
    expect(byAmount).toEqual([-15_000, 30_000, 60_000, 90_000, 100_000]);
    expect((await ledger(s.owner, ws, "sort=-amount")).items.map((e) => e.grossMinor)).toEqual([...byAmount].reverse());
    const numbers = (await ledger(s.owner, ws, "sort=commission")).items.map((e) => e.commission.number);
    expect(numbers).toEqual([...numbers].sort());
  });

  it("answers a bad query with 422 and the field's path, and a filter on another workshop's commission with nothing", async () => {
    for (const [q, path] of [
      ["period=2026-13", "period"],
      ["status=gone", "status"],
      ["sort=price", "sort"],
      ["pageSize=0", "pageSize"],
      ["commission=abc", "commission"],
    ] as const) {
      const r = await s.owner.json<{ error: { code: string; issues: Array<{ path: string }> } }>(`${books(ws)}/ledger?${q}`);
      expect(r.status, q).toBe(422);
      expect(r.body.error.code).toBe("validation_failed");
      expect(r.body.error.issues.map((i) => i.path)).toContain(path);
    }
    const other = await createWorkshopWithMembers();
    const theirs = await testDb()("commissions").insert({ workshop_id: other.id, number: "X-1", client_user_id: other.client.userId, title: "Theirs", currency: "EUR", deposit_percent: 30 });
    expect((await ledger(s.owner, ws, `commission=${theirs[0]}&status=all`)).total).toBe(0);
  });
});

describe("ledger CSV", () => {
  const csv = async (query: string) => {
    const r = await s.bookkeeper.fetch(`${books(ws)}/ledger/export${query ? `?${query}` : ""}`);
    expect(r.status).toBe(200);
    expect(r.headers.get("content-type")).toBe("text/csv; charset=utf-8");
    expect(r.headers.get("content-disposition")).toMatch(/^attachment; filename="ledger-ws-[a-f0-9]+(-\d{4}-\d{2})?\.csv"$/);
    const text = await r.text();
    return { text, rows: parse(text, { bom: true, columns: true }) as Array<Record<string, string>> };
  };

  it("exports every filtered entry, quoted so the title with commas and quotes comes back whole, then a total per currency", async () => {
    const { text, rows } = await csv("");
    expect(text).toContain('"Baritone, 27"" scale, ""fanned"" frets"');
    const entries = rows.filter((r) => r.row_type === "entry");
    expect(entries.map((r) => Number(r.entry_id))).toEqual([ids.bRefund, ids.cDeposit, ids.aBalance, ids.bDeposit, ids.aDeposit]);
    const aDeposit = entries.find((r) => Number(r.entry_id) === ids.aDeposit)!;
    expect(aDeposit).toMatchObject({ commission_title: TITLE, kind: "deposit", status: "paid", method: "offline", currency: "EUR", gross: "900.00", fee: "0.00", net: "900.00", date: "2026-03-10T12:00:00.000Z", month: "2026-03", month_locked: "no", reference: "Transfer, March" });
    expect(entries.find((r) => Number(r.entry_id) === ids.bRefund)!.gross).toBe("-150.00");
    for (const r of entries) expect(new Date(r.date!).toISOString()).toBe(r.date);
    const totals = rows.filter((r) => r.row_type === "total");
    expect(totals.map((t) => [t.currency, t.gross, t.fee, t.net, t.reference])).toEqual([
      ["EUR", "2350.00", "0.00", "2350.00", "4 settled entries"],
      ["USD", "300.00", "0.00", "300.00", "1 settled entry"],
    ]);
    // Identity: each total is the sum of its currency's rows, in cents.
    for (const t of totals) {
      const cents = entries.filter((r) => r.currency === t.currency).reduce((sum, r) => sum + Math.round(Number(r.net) * 100), 0);
      expect(cents).toBe(Math.round(Number(t.net) * 100));
    }
  });

  it("applies the same filters as the page", async () => {
    const { rows } = await csv("period=2026-04&kind=deposit");
    expect(rows.filter((r) => r.row_type === "entry").map((r) => Number(r.entry_id))).toEqual([ids.cDeposit]);
    expect(rows.filter((r) => r.row_type === "total").map((r) => r.currency)).toEqual(["USD"]);
    const bad = await s.bookkeeper.fetch(`${books(ws)}/ledger/export?period=April`);
    expect(bad.status).toBe(422);
  });

  it("writes yen without decimals (ISO 4217: JPY has no minor unit)", async () => {
    const yen = await createWorkshopWithMembers();
    await testDb()("workshops").where({ id: yen.id }).update({ currency: "JPY" });
    const ys = await signInRoles(yen);
    const c = await approvedCommission(ys, yen, { priceMinor: 450_000 });
    await recordPayment(ys.bookkeeper, yen, c.id, { kind: "deposit", amountMinor: 135_000, paidOn: "2026-02-02" });
    const r = await ys.owner.fetch(`${books(yen)}/ledger/export`);
    const rows = parse(await r.text(), { bom: true, columns: true }) as Array<Record<string, string>>;
    expect(rows.map((x) => [x.row_type, x.currency, x.gross, x.net])).toEqual([
      ["entry", "JPY", "135000", "135000"],
      ["total", "JPY", "135000", "135000"],
    ]);
  });
});
