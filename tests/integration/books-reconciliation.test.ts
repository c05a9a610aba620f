// Reconciliation against the processor, end to end through the real stripe SDK and a payments fake of
// this file's own (so its webhook rules and payouts touch no other test), on the real test database.
// The month is made by the books demo's own driver (db/seeds/95_demo_books.ts): real checkouts paid on
// the fake, its signed webhooks handled by the webhook's code, then the fake's controls make each kind
// of difference. Then: every kind is detected, a payout is broken down to the payments in it, each
// exception is resolved with a note, the month is locked, a locked month refuses the bookkeeper and
// logs the owner, and a processor event landing in it is applied and flagged, never lost.
//
// Fee figures are the fake's published schedule (README "Payments fake": 1.45 % rounded + 25 for EUR),
// our own schedule, no outside source; the rest are the product's rules (issue 7).
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { seedBooksDemo } from "@/db/seeds/95_demo_books";
import { resolveMemberAccess } from "@/lib/auth/workshop-access";
import { monthOf } from "@/lib/books/months";
import { EXCEPTION_KINDS } from "@/lib/books/exception-kinds";
import { recordOfflinePayment } from "@/lib/data/payments";
import { lockPeriod, resolveException, reviewLockedChange } from "@/lib/data/reconciliation-actions";
import { runReconciliation } from "@/lib/data/reconciliation-run";
import { getReconciliationPeriod } from "@/lib/data/reconciliation-view";
import type { BooksDemoCommission } from "@/lib/demo/books";
import { stripeBooksReader } from "@/lib/payments/processor-books";
import { handleStripeEvent } from "@/lib/payments/stripe-events";
import { startStripeRig, type StripeRig } from "../fakes/helpers/stripe-setup";
import { createWorkshopWithMembers, type TestWorkshop } from "../http/fixtures";
import { closeTestDb, testDb } from "../setup/test-db";

let rig: StripeRig;
let ws: TestWorkshop;
let month: string;
const byTwist = new Map<string, number>();

const scopeOf = async (userId: number) => (await resolveMemberAccess(userId, ws.slug)).scope;
const reader = () => stripeBooksReader(rig.stripe);
const period = async () => getReconciliationPeriod(await scopeOf(ws.bookkeeper.userId), month);
const rowsOf = (commissionId: number) => testDb()("payments").where({ commission_id: commissionId }).orderBy("id").select("*");
const expectRefusal = async (p: Promise<unknown>, code: string, status: number) => {
  const err = (await p.then(() => null).catch((e: unknown) => e)) as { code?: string; status?: number } | null;
  expect(err, "expected a refusal").not.toBeNull();
  expect([err!.code, err!.status]).toEqual([code, status]);
};

beforeAll(async () => {
  rig = await startStripeRig();
  ws = await createWorkshopWithMembers({ extra: { client: 1 } });
  const [a, b] = ws.members.filter((m) => m.role === "client");
  const twists: BooksDemoCommission["twist"][] = ["clean", "lost-confirmation", "amount-changed", "currency-changed", "refund-untold", "refund-bounced"];
  const commissions = twists.map((twist, i) => ({ title: `Books test ${i + 1}: ${twist}`, client: (i % 2 ? b : a)!.email, priceMinor: 300_000 + i * 10_000, twist }));
  month = monthOf(new Date());
  const made = await seedBooksDemo(testDb(), { stripe: rig.stripe, fakeUrl: rig.fake.url, webhookSecret: rig.secret }, { slug: ws.slug, owner: ws.owner.email, builder: ws.builder.email, bookkeeper: ws.bookkeeper.email, commissions });
  expect(made).toBe(6);
  for (const c of commissions) byTwist.set(c.twist, (await testDb()("commissions").where({ workshop_id: ws.id, title: c.title }).first("id")).id);
}, 120_000);
afterAll(async () => {
  await rig?.close();
  await closeTestDb();
});

describe("the month as the driver left it", () => {
  it("recorded what the app was told and nothing it was not", async () => {
    const clean = await rowsOf(byTwist.get("clean")!);
    expect(clean.map((r) => [r.kind, r.status, r.method])).toEqual([
      ["deposit", "paid", "offline"],
      ["balance", "paid", "card"],
    ]);
    // Balance 70 % of 3,000.00 = 2,100.00; fee 1.45 % = 30.45 + 0.25 (the fake's schedule).
    expect([Number(clean[1].amount_minor), Number(clean[1].fee_minor), Number(clean[1].net_minor)]).toEqual([210_000, 3_070, 206_930]);
    const lost = await rowsOf(byTwist.get("lost-confirmation")!);
    expect(lost.map((r) => [r.kind, r.status])).toEqual([
      ["deposit", "paid"],
      ["balance", "pending"],
    ]);
    const untold = await rowsOf(byTwist.get("refund-untold")!);
    expect(untold.filter((r) => r.kind === "refund")).toEqual([]);
    const bounced = await rowsOf(byTwist.get("refund-bounced")!);
    expect(bounced.filter((r) => r.kind === "refund").map((r) => r.status)).toEqual(["paid"]);
    const refund = await rig.stripe.refunds.retrieve(bounced.find((r) => r.kind === "refund").processor_refund_id);
    expect(refund.status).toBe("failed");
  });
});

describe("reconciling the month", () => {
  it("detects one exception of each kind, each on the commission it concerns", async () => {
    const run = await runReconciliation(await scopeOf(ws.bookkeeper.userId), month, reader());
    expect(run.exceptions).toBe(5);
    const p = await period();
    const found = Object.fromEntries(p.exceptions.map((e) => [e.kind, e]));
    expect(Object.keys(found).sort()).toEqual([...EXCEPTION_KINDS].sort());
    const balanceOf = async (twist: string, kind = "balance") => (await rowsOf(byTwist.get(twist)!)).find((r) => r.kind === kind)!.id;
    expect(found.missing_in_ledger!.paymentId).toBe(await balanceOf("lost-confirmation"));
    expect(found.missing_in_ledger!.detail).toMatch(/pending \(its confirmation never arrived\)/);
    // Balances are 70 % of 3,200.00 … 3,500.00 (a 30 % deposit); the refunds 10 % of a balance.
    expect(found.amount_mismatch).toMatchObject({ paymentId: await balanceOf("amount-changed"), ledgerAmountMinor: 224_000, processorAmountMinor: 224_000 - 1_250 });
    expect(found.currency_mismatch).toMatchObject({ paymentId: await balanceOf("currency-changed"), ledgerCurrency: "EUR", processorCurrency: "USD" });
    expect(found.currency_mismatch!.detail).toMatch(/rate of 1\.0842/);
    expect(found.refund_not_recorded).toMatchObject({ paymentId: await balanceOf("refund-untold"), processorAmountMinor: -23_800 });
    expect(found.missing_at_processor).toMatchObject({ paymentId: await balanceOf("refund-bounced", "refund"), ledgerAmountMinor: -24_500 });
    expect(p.canLock).toBe(false);
    expect(p.lockBlocker).toMatch(/5 exceptions are still open/);
  });

  it("pairs the clean payment with its transaction and counts the offline deposits apart", async () => {
    const p = await period();
    const clean = (await rowsOf(byTwist.get("clean")!))[1];
    expect(p.matches.find((m) => m.paymentId === clean.id)).toMatchObject({ txnType: "charge", ledgerAmountMinor: 210_000, processorAmountMinor: 210_000, processorFeeMinor: 3_070, processorNetMinor: 206_930, otherMonth: null });
    expect(p.offlineEntries).toBe(6);
  });

  it("breaks each payout down to the payments it contains", async () => {
    const p = await period();
    const eur = p.payouts.find((po) => po.currency === "EUR")!;
    const usd = p.payouts.find((po) => po.currency === "USD")!;
    // Identity: a payout pays out the sum of its transactions' nets (this fake holds this workshop only).
    expect(eur.lines.reduce((s, l) => s + l.netMinor, 0)).toBe(eur.amountMinor);
    expect([eur.otherCount, eur.otherNetMinor]).toEqual([0, 0]);
    const charges = eur.lines.filter((l) => l.txnType === "charge");
    expect(charges).toHaveLength(5);
    const cardRows = await testDb()("payments").where({ workshop_id: ws.id, method: "card", kind: "balance", status: "paid" }).whereNot("commission_id", byTwist.get("currency-changed")!).select("id", "net_minor", "processor_balance_txn_id");
    for (const row of cardRows) {
      const line = charges.find((l) => l.txnId === row.processor_balance_txn_id)!;
      expect(line.paymentId).toBe(row.id);
    }
    // The confirmation that never arrived: in the payout, not in the ledger.
    expect(charges.filter((l) => l.paymentId === null)).toHaveLength(1);
    expect(eur.lines.filter((l) => l.txnType === "refund").map((l) => l.amountMinor).sort((x, y) => x - y)).toEqual([-24_500, -23_800]);
    expect(eur.lines.filter((l) => l.txnType === "refund_failure").map((l) => l.amountMinor)).toEqual([24_500]);
    expect(usd.lines).toHaveLength(1);
    expect(usd.amountMinor).toBe(usd.lines[0]!.netMinor);
  });

  it("keeps a resolution across runs, and locks only once every exception is resolved with a note", async () => {
    const bookkeeper = await scopeOf(ws.bookkeeper.userId);
    await expectRefusal(lockPeriod(bookkeeper, month, null), "conflict", 409);
    const [first, ...rest] = (await period()).exceptions;
    await resolveException(bookkeeper, month, first!.id, "Checked with the processor's statement.");
    await runReconciliation(bookkeeper, month, reader());
    const again = (await period()).exceptions.find((e) => e.id === first!.id)!;
    expect(again).toMatchObject({ status: "resolved", resolutionNote: "Checked with the processor's statement.", resolvedBy: ws.bookkeeper.name, cleared: false });
    for (const e of rest) await resolveException(bookkeeper, month, e.id, `Resolved: ${e.kind}`);
    await expectRefusal(resolveException(bookkeeper, month, first!.id, "again"), "conflict", 409);
    await lockPeriod(bookkeeper, month, "Agreed with the statement.");
    const locked = await period();
    expect([locked.status, locked.lockedBy, locked.lockNote]).toEqual(["locked", ws.bookkeeper.name, "Agreed with the statement."]);
    const audit = await testDb()("audit_log").where({ workshop_id: ws.id, entity_type: "reconciliation_exception" }).pluck("action");
    expect(audit.filter((a: string) => a === "reconciliation.exception_resolved")).toHaveLength(5);
  });
});

describe("a locked month", () => {
  it("refuses the bookkeeper's changes and logs the owner's", async () => {
    const bookkeeper = await scopeOf(ws.bookkeeper.userId);
    const owner = await scopeOf(ws.owner.userId);
    const today = new Date().toISOString().slice(0, 10);
    const lost = byTwist.get("lost-confirmation")!;
    const before = (await rowsOf(lost)).length;
    await expectRefusal(recordOfflinePayment(bookkeeper, lost, { kind: "balance", amountMinor: 100, reference: "Cash", paidOn: today }), "forbidden", 403);
    await expectRefusal(runReconciliation(bookkeeper, month, reader()), "forbidden", 403);
    expect((await rowsOf(lost)).length).toBe(before);
    const r = await recordOfflinePayment(owner, lost, { kind: "balance", amountMinor: 100, reference: "Cash at the counter", paidOn: today });
    const changes = (await period()).lockedChanges;
    expect(changes).toMatchObject([{ source: "owner", action: "payment.recorded", paymentId: r.paymentId, actor: ws.owner.name }]);
    const audit = await testDb()("audit_log").where({ workshop_id: ws.id, action: "books.locked_month_changed" }).select("actor_user_id");
    expect(audit.map((a) => a.actor_user_id)).toEqual([ws.owner.userId]);
  });

  it("applies a processor event that lands in it and flags it for the owner, who reviews it", async () => {
    const lost = byTwist.get("lost-confirmation")!;
    const pending = (await rowsOf(lost)).find((r) => r.kind === "balance" && r.method === "card")!;
    // The confirmation the driver had dropped arrives after all (the processor sends it again).
    const events = await rig.stripe.events.list({ type: "checkout.session.completed", limit: 100 });
    const event = events.data.find((e) => (e.data.object as { id: string }).id === pending.processor_session_id)!;
    expect(await handleStripeEvent(event, rig.stripe)).toBe("applied");
    expect((await rowsOf(lost)).find((r) => r.id === pending.id).status).toBe("paid");
    const flagged = (await period()).lockedChanges.filter((c) => c.source === "processor");
    expect(flagged).toMatchObject([{ action: "processor.updated", paymentId: pending.id, eventId: event.id, reviewedAt: null }]);
    expect(flagged[0]!.detail).toMatchObject({ before: { status: "pending" }, after: { status: "paid" }, eventType: "checkout.session.completed" });
    // A second delivery of the same event changes and flags nothing more.
    expect(await handleStripeEvent(event, rig.stripe)).toBe("duplicate");
    expect((await period()).lockedChanges.filter((c) => c.source === "processor")).toHaveLength(1);

    await expectRefusal(reviewLockedChange(await scopeOf(ws.bookkeeper.userId), month, flagged[0]!.id, "Seen"), "forbidden", 403);
    await reviewLockedChange(await scopeOf(ws.owner.userId), month, flagged[0]!.id, "Late confirmation of a real payment.");
    expect((await period()).lockedChanges.find((c) => c.id === flagged[0]!.id)).toMatchObject({ reviewedBy: ws.owner.name, reviewNote: "Late confirmation of a real payment." });
  });

  it("lets the owner compare it again, which clears what the late event put right", async () => {
    await runReconciliation(await scopeOf(ws.owner.userId), month, reader());
    const p = await period();
    expect(p.status).toBe("locked");
    expect(p.exceptions.find((e) => e.kind === "missing_in_ledger")).toMatchObject({ cleared: true, status: "resolved" });
  });
});
