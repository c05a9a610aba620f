// The owner's overview across builders: workload, time in stage against the workshop's median,
// overdue and upcoming target dates, deposits outstanding, cohort progress. A fixed handful of
// workshop-scoped queries whatever the number of commissions; the arithmetic is in lib/overview/.
import { db } from "@/db/knex";
import { can } from "@/lib/auth/permissions";
import type { WorkshopScope } from "@/lib/auth/scope";
import { notFound } from "@/lib/http/errors";
import { daysOverMedian, isOverdue, openStages, stageMedians, workload, type StageStay } from "@/lib/overview/figures";
import { addDays, daysBetween, median, utcDate } from "@/lib/overview/stats";
import type { Overview, OverviewCommission, OverviewQuery } from "@/lib/schemas/overview";
import { selectCommissionRefs, toCommissionRef, type CommissionRefRow } from "./commission-refs";
import { CANCELLED, DELIVERED, ON_HOLD, SPEC, type BuildStage } from "@/lib/workflow/stages";
import { listCohorts, visibleCohorts } from "./cohorts";
import { visibleCommissions } from "./commission-access";
import { getWorkshopSettings } from "./workshop-settings";

type OpenRow = CommissionRefRow & { stage_entered_at: Date };

const CLOSED = [DELIVERED, CANCELLED];

/** Open commissions (neither delivered nor cancelled) the caller may see, optionally of one cohort. */
function openCommissions(scope: WorkshopScope, cohortId: number | undefined) {
  const q = visibleCommissions(scope).whereNotIn("c.stage", CLOSED);
  if (cohortId !== undefined) q.where("c.cohort_id", cohortId);
  return q;
}

/**
 * Every finished stay in a stage across the workshop: each stage_history line is the entry into
 * `to_stage`, and the commission's next line (LEAD over its history) is when it left.
 */
async function finishedStays(scope: WorkshopScope): Promise<StageStay[]> {
  const entries = db("stage_history as h")
    .where("h.workshop_id", scope.workshopId)
    .select(
      "h.to_stage as stage",
      "h.created_at as entered_at",
      db.raw("LEAD(h.created_at) OVER (PARTITION BY h.commission_id ORDER BY h.created_at, h.id) AS left_at"),
    );
  const rows = (await db.from(entries.as("s")).whereNotNull("s.left_at").select("s.stage", "s.entered_at", "s.left_at")) as Array<{
    stage: string;
    entered_at: Date;
    left_at: Date;
  }>;
  return rows.map((r) => ({ stage: r.stage, enteredAt: r.entered_at, leftAt: r.left_at }));
}

/** The workshop's builders (a commission assigned to someone else, e.g. the owner, adds a row itself). */
async function listBuilders(scope: WorkshopScope): Promise<Array<{ id: number; name: string }>> {
  return db("memberships as m")
    .join("users as u", "u.id", "m.user_id")
    .where({ "m.workshop_id": scope.workshopId, "m.role": "builder" })
    .orderBy("u.name")
    .select("u.id", "u.name");
}

/**
 * Deposits asked for (the commission has left the spec stage) and not paid in full. The set-based
 * form of paymentTotals (lib/data/payment-totals.ts): paid deposits less refunds of deposits.
 */
async function depositsOutstanding(scope: WorkshopScope, cohortId: number | undefined, template: readonly BuildStage[], limit: number): Promise<NonNullable<Overview["depositsOutstanding"]>> {
  const paidSum = db.raw("COALESCE(SUM(CASE WHEN p.kind = 'deposit' THEN p.amount_minor WHEN p.kind = 'refund' AND o.kind = 'deposit' THEN -p.amount_minor ELSE 0 END), 0) AS paid");
  const q = selectCommissionRefs(openCommissions(scope, cohortId), "c.currency", "c.deposit_minor", paidSum)
    .leftJoin("payments as p", (j) => j.on("p.commission_id", "c.id").andOn("p.workshop_id", "c.workshop_id").andOnVal("p.status", "paid"))
    .leftJoin("payments as o", "o.id", "p.refund_of_payment_id")
    .whereNot("c.stage", SPEC)
    .whereNot((w) => w.where("c.stage", ON_HOLD).andWhere("c.held_from", SPEC))
    .where("c.deposit_minor", ">", 0)
    .groupBy("c.id", "bu.name")
    .havingRaw("paid < c.deposit_minor")
    .orderBy("c.number");
  const rows = (await q) as Array<CommissionRefRow & { currency: string; deposit_minor: number; paid: number | string }>;
  const items = rows.map((r) => {
    const paid = Number(r.paid);
    return { ...toCommissionRef(r, template), currency: r.currency, depositMinor: Number(r.deposit_minor), paidMinor: paid, outstandingMinor: Number(r.deposit_minor) - paid };
  });
  const totals = new Map<string, { currency: string; outstandingMinor: number; commissions: number }>();
  for (const i of items) {
    const t = totals.get(i.currency) ?? { currency: i.currency, outstandingMinor: 0, commissions: 0 };
    t.outstandingMinor += i.outstandingMinor;
    t.commissions += 1;
    totals.set(i.currency, t);
  }
  // Totals count every commission; the rows stop at `limit` (a long list is drawn from the table).
  return { totals: [...totals.values()].sort((a, b) => a.currency.localeCompare(b.currency)), items: items.slice(0, limit) };
}

/** The overview as of now (UTC); `limit` caps each list (the counts are always complete). */
export async function getOverview(scope: WorkshopScope, query: OverviewQuery, opts: { limit?: number } = {}): Promise<Overview> {
  const limit = opts.limit ?? 50;
  const today = utcDate(new Date());
  const settings = await getWorkshopSettings(scope);
  const template = settings.buildStages;

  let cohort: Overview["cohort"] = null;
  if (query.cohort !== undefined) {
    const row = await visibleCohorts(scope).where("co.id", query.cohort).first("co.id", "co.name");
    if (!row) throw notFound("No such cohort.");
    cohort = { id: row.id, name: row.name };
  }

  const [open, stays, builders, deposits, cohorts] = await Promise.all([
    selectCommissionRefs(openCommissions(scope, query.cohort), "c.stage_entered_at").orderBy("c.number") as Promise<OpenRow[]>,
    finishedStays(scope),
    listBuilders(scope),
    can(scope.role, "payment.read") ? depositsOutstanding(scope, query.cohort, template, limit) : Promise.resolve(null),
    listCohorts(scope),
  ]);

  const medians = stageMedians(stays);
  const rows = open.map((r) => {
    const ref = toCommissionRef(r, template);
    const daysInStage = daysBetween(r.stage_entered_at, today);
    const stageMedianDays = medians.get(r.stage)?.medianDays ?? null;
    return { ...ref, daysInStage, stageMedianDays, overMedianDays: daysOverMedian(daysInStage, stageMedianDays), overdue: isOverdue(ref.targetDate, r.stage, today) };
  });

  const stages = openStages(template, rows.map((r) => r.stage));
  const counts = new Map<string, { builderId: number | null; builderName: string | null; stage: string; n: number; overdue: number }>();
  for (const r of rows) {
    const key = `${r.builder?.id ?? "-"}|${r.stage}`;
    const c = counts.get(key) ?? { builderId: r.builder?.id ?? null, builderName: r.builder?.name ?? null, stage: r.stage, n: 0, overdue: 0 };
    c.n += 1;
    if (r.overdue) c.overdue += 1;
    counts.set(key, c);
  }

  const byOverrun = [...rows].sort((a, b) => (b.overMedianDays ?? -Infinity) - (a.overMedianDays ?? -Infinity) || b.daysInStage - a.daysInStage || a.number.localeCompare(b.number));
  const horizon = addDays(today, query.upcomingDays);
  const strip = ({ id, number, title, stage, stageLabel, builder, targetDate }: OverviewCommission): OverviewCommission => ({ id, number, title, stage, stageLabel, builder, targetDate });

  return {
    asOf: today,
    cohort,
    stages,
    workload: workload(builders, [...counts.values()]),
    stageTimes: stages.map((s) => {
      const here = rows.filter((r) => r.stage === s.key);
      const m = medians.get(s.key);
      return { stage: s.key, label: s.label, medianDays: m?.medianDays ?? null, finishedStays: m?.stays ?? 0, current: here.length, currentMedianDays: median(here.map((r) => r.daysInStage)) };
    }),
    inStage: byOverrun.slice(0, limit),
    openTotal: rows.length,
    overdue: rows
      .filter((r) => r.overdue)
      .sort((a, b) => a.targetDate!.localeCompare(b.targetDate!) || a.number.localeCompare(b.number))
      .slice(0, limit)
      .map((r) => ({ ...strip(r), daysOverdue: daysBetween(r.targetDate!, today) })),
    upcoming: rows
      .filter((r) => r.targetDate !== null && r.targetDate >= today && r.targetDate <= horizon)
      .sort((a, b) => a.targetDate!.localeCompare(b.targetDate!) || a.number.localeCompare(b.number))
      .slice(0, limit)
      .map((r) => ({ ...strip(r), daysLeft: daysBetween(today, r.targetDate!) })),
    upcomingDays: query.upcomingDays,
    depositsOutstanding: deposits,
    cohorts,
  };
}
