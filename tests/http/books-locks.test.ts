// Reconciling and locking a month over HTTP, and what a locked month refuses: the bookkeeper's
// payments and refunds dated in it (403, nothing stored), a new comparison; the owner's changes are
// allowed and logged. The comparison reads the shared payments fake; this workshop took no card
// payments, so the processor has nothing of it and the month compares clean. Product rules (issue 7).
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { ReconciliationPeriodOut, ReconciliationPeriodSummary } from "@/lib/schemas/books";
import { closeTestDb, testDb } from "../setup/test-db";
import { base, signInRoles } from "./commission-helpers";
import { approvedCommission, books, comparedMonth, openException, recordPayment } from "./books-helpers";
import { createWorkshopWithMembers, type TestWorkshop } from "./fixtures";

let ws: TestWorkshop;
let s: Awaited<ReturnType<typeof signInRoles>>;
let c: number;
let june: number;
const MONTH = "2026-06";
const rec = () => `${books(ws)}/reconciliation/${MONTH}`;

beforeAll(async () => {
  ws = await createWorkshopWithMembers();
  s = await signInRoles(ws);
  c = (await approvedCommission(s, ws, { priceMinor: 300_000 })).id;
  june = await recordPayment(s.bookkeeper, ws, c, { kind: "deposit", amountMinor: 90_000, paidOn: "2026-06-15" });
});
afterAll(closeTestDb);

const payments = () => testDb()("payments").where({ commission_id: c }).count({ n: "*" }).first().then((r) => Number(r!.n));

describe("reconciling a month", () => {
  it("will not lock a month that was never compared", async () => {
    const r = await s.bookkeeper.json<{ error: { code: string; message: string } }>(`${rec()}/lock`, { json: {} });
    expect(r.status).toBe(404);
    expect(r.body.error.message).toMatch(/has not been compared/);
  });

  it("compares the month (offline entries only: nothing at the processor), then locks it", async () => {
    const run = await s.bookkeeper.json<{ run: { matches: number; exceptions: number }; period: ReconciliationPeriodOut }>(`${rec()}/run`, { json: {} });
    expect(run.status).toBe(200);
    expect(run.body.run).toEqual({ matches: 0, exceptions: 0 });
    expect(run.body.period).toMatchObject({ status: "open", ledgerEntries: 1, offlineEntries: 1, processorTransactions: 0, canLock: true, lastRunBy: ws.bookkeeper.name, monthOver: true });
    const bad = await s.bookkeeper.json<{ error: { issues: Array<{ path: string }> } }>(`${rec()}/lock`, { json: { note: "x".repeat(1001) } });
    expect(bad.status).toBe(422);
    expect(bad.body.error.issues[0]!.path).toBe("note");
    const lock = await s.bookkeeper.json<{ period: ReconciliationPeriodOut }>(`${rec()}/lock`, { json: { note: "Agrees with the bank statement." } });
    expect(lock.status).toBe(200);
    expect(lock.body.period).toMatchObject({ status: "locked", lockedBy: ws.bookkeeper.name, lockNote: "Agrees with the bank statement." });
    const again = await s.bookkeeper.fetch(`${rec()}/lock`, { method: "POST", json: {} });
    expect(again.status).toBe(409);
    const list = await s.owner.json<{ periods: ReconciliationPeriodSummary[] }>(`${books(ws)}/reconciliation`);
    expect(list.body.periods.find((p) => p.month === MONTH)).toMatchObject({ status: "locked", ledgerEntries: 1, openExceptions: 0 });
    const audit = await testDb()("audit_log").where({ workshop_id: ws.id, action: "reconciliation.locked" }).select("actor_user_id", "data");
    expect(audit).toHaveLength(1);
    expect(audit[0]!.actor_user_id).toBe(ws.bookkeeper.userId);
  });

  it("refuses to lock while an exception is open or the ledger changed since the comparison", async () => {
    const period = await comparedMonth(ws, "2026-08", new Date(Date.now() - 60_000));
    await openException(ws, period, 1);
    const open = await s.bookkeeper.json<{ error: { message: string } }>(`${books(ws)}/reconciliation/2026-08/lock`, { json: {} });
    expect([open.status, open.body.error.message]).toEqual([409, expect.stringMatching(/still open/)]);
    await comparedMonth(ws, "2026-09", new Date(Date.now() - 60_000));
    await recordPayment(s.bookkeeper, ws, c, { kind: "balance", amountMinor: 1_000, paidOn: "2026-09-01" });
    const changed = await s.bookkeeper.json<{ error: { message: string } }>(`${books(ws)}/reconciliation/2026-09/lock`, { json: {} });
    expect([changed.status, changed.body.error.message]).toEqual([409, expect.stringMatching(/changed since the last comparison/)]);
    const resolve = await s.bookkeeper.json<{ error: { issues: Array<{ path: string }> } }>(`${books(ws)}/reconciliation/2026-08/exceptions/999999999/resolve`, { json: { note: "" } });
    expect([resolve.status, resolve.body.error.issues[0]!.path]).toEqual([422, "note"]);
    expect((await s.bookkeeper.fetch(`${books(ws)}/reconciliation/2026-08/exceptions/999999999/resolve`, { method: "POST", json: { note: "fine" } })).status).toBe(404);
    expect((await s.bookkeeper.fetch(`${books(ws)}/reconciliation/2026-13`)).status).toBe(404);
  });
});

describe("a locked month", () => {
  it("refuses the bookkeeper's payment dated in it and a refund of its payment, storing nothing", async () => {
    const before = await payments();
    const pay = await s.bookkeeper.json<{ error: { code: string; message: string } }>(`${base(ws)}/${c}/payments`, { json: { kind: "balance", amountMinor: 5_000, reference: "Cash", paidOn: "2026-06-28" } });
    expect(pay.status).toBe(403);
    expect(pay.body.error).toEqual({ code: "forbidden", message: "June 2026 is reconciled and locked: only the owner can change payments in it." });
    const refund = await s.bookkeeper.fetch(`${base(ws)}/${c}/refunds`, { method: "POST", json: { paymentId: june, amountMinor: 1_000 } });
    expect(refund.status).toBe(403);
    const rerun = await s.bookkeeper.fetch(`${rec()}/run`, { method: "POST", json: {} });
    expect(rerun.status).toBe(403);
    expect(await payments()).toBe(before);
  });

  it("lets the owner change it, and logs each change in the audit log and on the month", async () => {
    const pay = await s.owner.json<{ paymentId: number }>(`${base(ws)}/${c}/payments`, { json: { kind: "balance", amountMinor: 5_000, reference: "Cash at the counter", paidOn: "2026-06-28" } });
    expect(pay.status).toBe(201);
    const refund = await s.owner.json<{ refund: { id: number } }>(`${base(ws)}/${c}/refunds`, { json: { paymentId: june, amountMinor: 1_000, reason: "Goodwill" } });
    expect(refund.status).toBe(201);
    const p = (await s.bookkeeper.json<{ period: ReconciliationPeriodOut }>(rec())).body.period;
    expect(p.lockedChanges.map((x) => [x.source, x.action, x.paymentId, x.actor])).toEqual([
      ["owner", "payment.recorded", pay.body.paymentId, ws.owner.name],
      ["owner", "refund.recorded", refund.body.refund.id, ws.owner.name],
    ]);
    const audit = await testDb()("audit_log").where({ workshop_id: ws.id, action: "books.locked_month_changed" }).orderBy("id").select("actor_user_id", "data");
    expect(audit.map((a) => [a.actor_user_id, (typeof a.data === "string" ? JSON.parse(a.data) : a.data).action])).toEqual([
      [ws.owner.userId, "payment.recorded"],
      [ws.owner.userId, "refund.recorded"],
    ]);
    // The ledger marks the month's entries as locked.
    const page = await s.bookkeeper.json<{ items: Array<{ id: number; monthLocked: boolean }> }>(`${books(ws)}/ledger?period=${MONTH}`);
    expect(page.body.items.every((e) => e.monthLocked)).toBe(true);
  });

  it("exports the month's reconciliation as CSV", async () => {
    const r = await s.bookkeeper.fetch(`${rec()}/export`);
    expect(r.status).toBe(200);
    expect(r.headers.get("content-disposition")).toBe(`attachment; filename="reconciliation-${ws.slug}-${MONTH}.csv"`);
    const bytes = new Uint8Array(await r.arrayBuffer());
    // A UTF-8 byte-order mark (EF BB BF), then the header row and CRLF (RFC 4180).
    expect([...bytes.slice(0, 3)]).toEqual([0xef, 0xbb, 0xbf]);
    expect(new TextDecoder().decode(bytes.slice(3)).split("\r\n")[0]).toBe("section,month,kind,state,payment_id,commission_number,processor_ref,payout,date,ledger_amount,ledger_currency,processor_amount,processor_fee,processor_net,processor_currency,detail,resolution_note,resolved_by,resolved_at");
  });
});
