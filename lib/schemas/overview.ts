// The owner's overview: its query (the filters) and the shape every answer has.
import { z } from "zod";
import type { CohortOut } from "./cohort";
import { idParamSchema } from "./ids";

export const overviewQuerySchema = z.object({
  /** Only the commissions of this cohort (the stage medians stay the workshop's). */
  cohort: idParamSchema.optional(),
  /** How far ahead "upcoming target dates" looks. */
  upcomingDays: z.coerce.number().int().min(1).max(366).default(30),
});
export type OverviewQuery = z.output<typeof overviewQuerySchema>;

export interface OverviewPerson {
  id: number;
  name: string;
}

export interface OverviewCommission {
  id: number;
  number: string;
  title: string;
  stage: string;
  stageLabel: string;
  builder: OverviewPerson | null;
  targetDate: string | null;
}

export interface Overview {
  /** Today's date in UTC: every day count is taken against it. */
  asOf: string;
  cohort: { id: number; name: string } | null;
  /** The stages an open commission can be in, in the workshop's order. */
  stages: Array<{ key: string; label: string }>;
  workload: Array<{ builder: OverviewPerson | null; byStage: Record<string, number>; open: number; overdue: number }>;
  /** Per stage: the workshop's median days over finished stays, and the commissions there now. */
  stageTimes: Array<{ stage: string; label: string; medianDays: number | null; finishedStays: number; current: number; currentMedianDays: number | null }>;
  /** Open commissions, the longest past their stage's median first (at most `limit`). */
  inStage: Array<OverviewCommission & { daysInStage: number; stageMedianDays: number | null; overMedianDays: number | null; overdue: boolean }>;
  openTotal: number;
  overdue: Array<OverviewCommission & { daysOverdue: number }>;
  upcoming: Array<OverviewCommission & { daysLeft: number }>;
  upcomingDays: number;
  /** Deposits asked for and not yet paid in full; null for a role that does not see money. */
  depositsOutstanding: {
    totals: Array<{ currency: string; outstandingMinor: number; commissions: number }>;
    items: Array<OverviewCommission & { currency: string; depositMinor: number; paidMinor: number; outstandingMinor: number }>;
  } | null;
  cohorts: CohortOut[];
}

/** The owner gives a commission to another builder (or to nobody: null) from the overview. */
export const builderAssignmentSchema = z.object({ commissionId: idParamSchema, builderId: idParamSchema.nullable() });
