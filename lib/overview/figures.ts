// The overview's figures from plain rows: time in stage against the workshop's median, the
// builders' workload, cohort progress. Pure: lib/data/overview.ts loads the rows, this shapes them.
import { CANCELLED, DELIVERED, ON_HOLD, stageLabel, stageLine, type BuildStage } from "@/lib/workflow/stages";
import { daysBetween, median, share } from "./stats";

/** One finished stay of a commission in a stage (from its stage history). */
export interface StageStay {
  stage: string;
  enteredAt: Date | string;
  leftAt: Date | string;
}

export interface StageMedian {
  medianDays: number | null;
  /** How many finished stays the median is taken over. */
  stays: number;
}

/** The median days a commission spent in each stage, over every finished stay. */
export function stageMedians(stays: readonly StageStay[]): Map<string, StageMedian> {
  const byStage = new Map<string, number[]>();
  for (const s of stays) {
    const list = byStage.get(s.stage) ?? [];
    list.push(daysBetween(s.enteredAt, s.leftAt));
    byStage.set(s.stage, list);
  }
  const out = new Map<string, StageMedian>();
  for (const [stage, days] of byStage) out.set(stage, { medianDays: median(days), stays: days.length });
  return out;
}

export const isClosedStage = (stage: string) => stage === DELIVERED || stage === CANCELLED;

/** Overdue: a target date before today (UTC) on a commission that is neither delivered nor cancelled. */
export function isOverdue(targetDate: string | null, stage: string, today: string): boolean {
  return targetDate !== null && targetDate < today && !isClosedStage(stage);
}

/**
 * The stages an open commission can sit in, in the workshop's order (spec, deposit, its build
 * stages, final setup, on hold), followed by any stage key found on a commission that the template
 * no longer has, so no commission drops out of a count.
 */
export function openStages(template: readonly BuildStage[], present: Iterable<string> = []): Array<{ key: string; label: string }> {
  const keys = [...stageLine(template).filter((s) => !isClosedStage(s)), ON_HOLD];
  for (const k of present) if (!keys.includes(k) && !isClosedStage(k)) keys.push(k);
  return keys.map((key) => ({ key, label: stageLabel(key, template) }));
}

export interface WorkloadRow {
  builder: { id: number; name: string } | null;
  /** Open commissions by stage key (only stages with at least one). */
  byStage: Record<string, number>;
  open: number;
  overdue: number;
}

/**
 * Open commissions by builder and stage. Every builder of the workshop gets a row (an idle one
 * shows as 0); commissions with nobody assigned come last as the builder `null`.
 */
export function workload(
  builders: ReadonlyArray<{ id: number; name: string }>,
  counts: ReadonlyArray<{ builderId: number | null; builderName: string | null; stage: string; n: number; overdue: number }>,
): WorkloadRow[] {
  const rows = new Map<number | null, WorkloadRow>();
  for (const b of builders) rows.set(b.id, { builder: { id: b.id, name: b.name }, byStage: {}, open: 0, overdue: 0 });
  for (const c of counts) {
    let row = rows.get(c.builderId);
    if (!row) {
      row = { builder: c.builderId === null ? null : { id: c.builderId, name: c.builderName ?? "" }, byStage: {}, open: 0, overdue: 0 };
      rows.set(c.builderId, row);
    }
    row.byStage[c.stage] = (row.byStage[c.stage] ?? 0) + c.n;
    row.open += c.n;
    row.overdue += c.overdue;
  }
  const named = [...rows.values()].filter((r) => r.builder !== null).sort((a, b) => a.builder!.name.localeCompare(b.builder!.name));
  const unassigned = rows.get(null);
  return unassigned ? [...named, unassigned] : named;
}

export interface CohortProgress {
  total: number;
  byStage: Record<string, number>;
  open: number;
  overdue: number;
  delivered: number;
  cancelled: number;
  /** Delivered ÷ (all − cancelled): a cancelled commission is neither done nor still to do. */
  shareDelivered: number | null;
}

/** A cohort's progress from its commission counts by stage. */
export function cohortProgress(counts: ReadonlyArray<{ stage: string; n: number; overdue: number }>): CohortProgress {
  const byStage: Record<string, number> = {};
  let total = 0;
  let overdue = 0;
  for (const c of counts) {
    byStage[c.stage] = (byStage[c.stage] ?? 0) + c.n;
    total += c.n;
    overdue += c.overdue;
  }
  const delivered = byStage[DELIVERED] ?? 0;
  const cancelled = byStage[CANCELLED] ?? 0;
  return { total, byStage, open: total - delivered - cancelled, overdue, delivered, cancelled, shareDelivered: share(delivered, total - cancelled) };
}

/** How far a commission's time in its stage runs past the stage's median (days; null without a median). */
export function daysOverMedian(daysInStage: number, medianDays: number | null): number | null {
  return medianDays === null ? null : daysInStage - medianDays;
}
