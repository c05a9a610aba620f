// Books test helpers over HTTP: commissions with offline payments on chosen days (no processor
// calls, so these tests never steer the shared payments fake), the books routes, and a month's
// reconciliation state written straight to the test database where a test needs one that only the
// processor could produce (exceptions, changes after locking).
import type { LedgerPage } from "@/lib/schemas/books";
import { testDb } from "../setup/test-db";
import { approveSpec, base, openCommission } from "./commission-helpers";
import type { TestWorkshop } from "./fixtures";
import type { HttpSession } from "./session";

export const books = (ws: TestWorkshop) => `/api/workshops/${ws.slug}/books`;

/** A commission past its spec approval (in the deposit stage), priced `priceMinor` (deposit 30 %). */
export async function approvedCommission(s: { owner: HttpSession; builder: HttpSession; client: HttpSession }, ws: TestWorkshop, extra: Record<string, unknown> = {}) {
  const c = await openCommission(s.owner, ws, extra);
  await approveSpec(s.builder, s.client, ws, c.id);
  return c;
}

/** Records an offline payment (201 expected) and returns its id. */
export async function recordPayment(who: HttpSession, ws: TestWorkshop, commissionId: number, body: { kind: "deposit" | "balance"; amountMinor: number; reference?: string; paidOn?: string }) {
  const r = await who.json<{ paymentId: number }>(`${base(ws)}/${commissionId}/payments`, { json: { reference: "Bank transfer", ...body } });
  if (r.status !== 201) throw new Error(`payment ${r.status} ${JSON.stringify(r.body)}`);
  return r.body.paymentId;
}

/** Refunds an offline payment in full or part (201 expected). */
export async function refundPayment(who: HttpSession, ws: TestWorkshop, commissionId: number, paymentId: number, amountMinor?: number) {
  const r = await who.json<{ refund: { id: number } }>(`${base(ws)}/${commissionId}/refunds`, { json: { paymentId, amountMinor, reason: "Returned" } });
  if (r.status !== 201) throw new Error(`refund ${r.status} ${JSON.stringify(r.body)}`);
  return r.body.refund.id;
}

export async function ledger(who: HttpSession, ws: TestWorkshop, query = ""): Promise<LedgerPage> {
  const r = await who.json<LedgerPage>(`${books(ws)}/ledger${query ? `?${query}` : ""}`);
  if (r.status !== 200) throw new Error(`ledger ${r.status} ${JSON.stringify(r.body)}`);
  return r.body;
}

/** A month's row as a comparison would leave it (no processor needed): open, compared now. */
export async function comparedMonth(ws: TestWorkshop, month: string, lastRunAt = new Date()): Promise<number> {
  const [id] = await testDb()("reconciliation_periods").insert({ workshop_id: ws.id, month, status: "open", last_run_at: lastRunAt });
  return Number(id);
}

/** An open exception in a compared month (the kind a comparison would find). */
export async function openException(ws: TestWorkshop, periodId: number, n: number): Promise<number> {
  const [id] = await testDb()("reconciliation_exceptions").insert({
    workshop_id: ws.id,
    period_id: periodId,
    kind: "missing_in_ledger",
    fingerprint: `test:${n}:${Date.now()}`,
    processor_ref: `txn_test_${n}`,
    processor_amount_minor: 1_000,
    processor_currency: "EUR",
    detail: "A card payment of €10.00 is at the processor but not settled in the ledger.",
  });
  return Number(id);
}

/** A processor event flagged in a locked month, waiting for the owner's review. */
export async function flaggedChange(ws: TestWorkshop, periodId: number, n: number): Promise<number> {
  const [id] = await testDb()("reconciliation_locked_changes").insert({ workshop_id: ws.id, period_id: periodId, source: "processor", action: "processor.updated", event_id: `evt_test_${n}`, detail: JSON.stringify({}) });
  return Number(id);
}
