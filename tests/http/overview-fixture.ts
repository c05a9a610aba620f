// Builds commissions for the overview tests through the API (open, approve the spec, pay the
// deposit, move stages, set dates), then moves the stage-change stamps back in time. The API stamps
// every move with the current time, so that last step — a direct write to the test database — is
// the only way to get stays of known length; everything else goes through the routes.
import { addDays, utcDate } from "@/lib/overview/stats";
import type { CommissionSummary } from "@/lib/schemas/commission-out";
import { testDb } from "../setup/test-db";
import { approveSpec, base, move, openCommission } from "./commission-helpers";
import type { TestWorkshop } from "./fixtures";
import type { HttpSession } from "./session";

/** Noon UTC `daysAgo` days before `today` (noon keeps every stamp well inside its calendar day). */
export const noonDaysAgo = (today: string, daysAgo: number) => new Date(`${addDays(today, -daysAgo)}T12:00:00.000Z`);

export const todayUtc = () => utcDate(new Date());

/** Records the deposit offline; a full deposit moves the commission on to its first build stage. */
export async function payDeposit(s: HttpSession, ws: TestWorkshop, id: number, amountMinor: number) {
  const r = await s.fetch(`${base(ws)}/${id}/payments`, { method: "POST", json: { kind: "deposit", amountMinor, reference: `Bank transfer ${id}` } });
  if (r.status !== 201) throw new Error(`deposit ${r.status} ${await r.text()}`);
}

/** Opens a commission and takes it `advances` stages past the deposit (0 = just into the first build stage). */
export async function commissionInBuild(owner: HttpSession, client: HttpSession, ws: TestWorkshop, opts: { builderId: number | null; advances: number; title: string }): Promise<CommissionSummary> {
  const c = await openCommission(owner, ws, { builderId: opts.builderId, title: opts.title });
  await approveSpec(owner, client, ws, c.id);
  await payDeposit(owner, ws, c.id, c.money!.depositMinor);
  for (let i = 0; i < opts.advances; i++) {
    const r = await move(owner, ws, c.id, "advance");
    if (r.status !== 200) throw new Error(`advance ${r.status} ${await r.text()}`);
  }
  return c;
}

/**
 * Moves a commission's stage history back in time: the n-th change (oldest first, the opening
 * included) to noon `daysAgo[n]` days before today; the commission entered its current stage at
 * the last of them. Throws unless there are exactly as many changes as dates.
 */
export async function backdateHistory(commissionId: number, today: string, daysAgo: number[]): Promise<void> {
  const db = testDb();
  const rows = (await db("stage_history").where({ commission_id: commissionId }).orderBy([{ column: "created_at" }, { column: "id" }]).select("id")) as Array<{ id: number }>;
  if (rows.length !== daysAgo.length) throw new Error(`commission ${commissionId} has ${rows.length} stage changes, not ${daysAgo.length}`);
  for (const [i, r] of rows.entries()) await db("stage_history").where({ id: r.id }).update({ created_at: noonDaysAgo(today, daysAgo[i]!) });
  await db("commissions").where({ id: commissionId }).update({ stage_entered_at: noonDaysAgo(today, daysAgo.at(-1)!) });
}
