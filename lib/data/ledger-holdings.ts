// Held and earned money and the monthly summary, from the settled ledger entries and the moment each
// commission's build started (lib/books/recognition.ts states the rule). Owner and bookkeeper.
import { db } from "@/db/knex";
import { can } from "@/lib/auth/permissions";
import type { WorkshopScope } from "@/lib/auth/scope";
import { monthLabel, monthOf, monthsBetween } from "@/lib/books/months";
import { earnedBy, heldByCommission, type BuildStarts } from "@/lib/books/recognition";
import { monthFigures, type SettledEntry } from "@/lib/books/summary";
import { forbidden } from "@/lib/http/errors";
import type { AmountOut, HoldingsOut, MonthSummaryOut } from "@/lib/schemas/books";
import { CANCELLED, DEPOSIT, ON_HOLD, SPEC, stageLabel } from "@/lib/workflow/stages";
import { listReconciliationPeriods } from "./reconciliation-view";
import { iso } from "./transaction";
import { getWorkshopSettings } from "./workshop-settings";

function assertMayRead(scope: WorkshopScope) {
  if (!can(scope.role, "ledger.read")) throw forbidden();
}

/** Every settled entry of the workshop, signed, oldest first. */
async function settledEntries(workshopId: number): Promise<SettledEntry[]> {
  const rows = (await db("payments")
    .where({ workshop_id: workshopId, status: "paid" })
    .orderByRaw("COALESCE(paid_at, created_at) ASC, id ASC")
    .select("commission_id", "kind", "currency", "amount_minor", "fee_minor", "net_minor", "paid_at", "created_at")) as Array<{
    commission_id: number;
    kind: SettledEntry["kind"];
    currency: string;
    amount_minor: number | string;
    fee_minor: number | string | null;
    net_minor: number | string | null;
    paid_at: Date | null;
    created_at: Date;
  }>;
  return rows.map((r) => {
    const signedMinor = r.kind === "refund" ? -Number(r.amount_minor) : Number(r.amount_minor);
    const feeMinor = r.fee_minor === null ? 0 : Number(r.fee_minor);
    return {
      commissionId: r.commission_id,
      kind: r.kind,
      currency: r.currency,
      signedMinor,
      feeMinor,
      netMinor: r.net_minor === null ? signedMinor - feeMinor : Number(r.net_minor),
      paidAt: new Date(r.paid_at ?? r.created_at),
    };
  });
}

/**
 * When each commission's build started: its first move into a stage past the deposit (a build
 * stage, or final setup or delivery for a template that changed since), whatever followed.
 */
async function buildStarts(workshopId: number): Promise<BuildStarts> {
  const rows = (await db("stage_history")
    .where({ workshop_id: workshopId })
    .whereNotIn("to_stage", [SPEC, DEPOSIT, ON_HOLD, CANCELLED])
    .groupBy("commission_id")
    .select("commission_id", db.raw("MIN(created_at) AS started"))) as Array<{ commission_id: number; started: Date | string }>;
  return new Map(rows.map((r) => [r.commission_id, new Date(r.started)]));
}

const amounts = (by: Record<string, number>): AmountOut[] =>
  Object.entries(by)
    .filter(([, v]) => v !== 0)
    .sort(([a], [b]) => a.localeCompare(b))
    .map(([currency, amountMinor]) => ({ currency, amountMinor }));

/** What the workshop holds for commissions whose build has not started, and what it has earned. */
export async function getHoldings(scope: WorkshopScope, at = new Date()): Promise<HoldingsOut> {
  assertMayRead(scope);
  const [entries, starts, settings] = await Promise.all([settledEntries(scope.workshopId), buildStarts(scope.workshopId), getWorkshopSettings(scope)]);
  const held = heldByCommission(entries, starts, at);
  const rows = held.length
    ? ((await db("commissions as c")
        .join("users as u", "u.id", "c.client_user_id")
        .where("c.workshop_id", scope.workshopId)
        .whereIn(
          "c.id",
          held.map((h) => h.commissionId),
        )
        .select("c.id", "c.number", "c.title", "c.stage", "u.name as client")) as Array<{ id: number; number: string; title: string; stage: string; client: string }>)
    : [];
  const byId = new Map(rows.map((r) => [r.id, r]));
  const heldTotals: Record<string, number> = {};
  for (const h of held) heldTotals[h.currency] = (heldTotals[h.currency] ?? 0) + h.heldMinor;
  return {
    asOf: iso(at),
    held: amounts(heldTotals),
    earned: amounts(earnedBy(entries, starts, at)),
    commissions: held
      .map((h) => {
        const c = byId.get(h.commissionId)!;
        return { id: c.id, number: c.number, title: c.title, client: c.client, stage: c.stage, stageLabel: stageLabel(c.stage, settings.buildStages), currency: h.currency, heldMinor: h.heldMinor, since: iso(h.since) };
      })
      .sort((a, b) => a.since.localeCompare(b.since)),
  };
}

/** Month by month (newest first, from the first entry to now): the figures and the reconciliation state. */
export async function getMonthlySummary(scope: WorkshopScope, now = new Date()): Promise<MonthSummaryOut[]> {
  assertMayRead(scope);
  const [entries, starts, periods] = await Promise.all([settledEntries(scope.workshopId), buildStarts(scope.workshopId), listReconciliationPeriods(scope, now)]);
  const first = entries[0] ? monthOf(entries[0].paidAt) : monthOf(now);
  const byMonth = new Map(periods.map((p) => [p.month, p]));
  const current = monthOf(now);
  return monthsBetween(first < current ? first : current, current).map((month) => {
    const p = byMonth.get(month);
    return {
      month,
      label: monthLabel(month),
      figures: monthFigures(entries, starts, month),
      reconciliation: p?.status ?? "never",
      openExceptions: p?.openExceptions ?? 0,
      entries: p?.ledgerEntries ?? 0,
    };
  });
}
