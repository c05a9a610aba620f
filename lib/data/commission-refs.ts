// The short form of a commission the overview and cohort pages list (number, title, stage,
// builder, target date), read with one set of columns and mapped in one place.
import type { Knex } from "knex";
import { utcDate } from "@/lib/overview/stats";
import type { OverviewCommission } from "@/lib/schemas/overview";
import { stageLabel, type BuildStage } from "@/lib/workflow/stages";

export interface CommissionRefRow {
  id: number;
  number: string;
  title: string;
  stage: string;
  builder_user_id: number | null;
  builder_name: string | null;
  target_date: Date | string | null;
}

/** Adds the builder's name and selects the columns of a CommissionRefRow (commissions as `c`). */
export function selectCommissionRefs(q: Knex.QueryBuilder, ...more: Array<string | Knex.Raw>): Knex.QueryBuilder {
  return q
    .leftJoin("users as bu", "bu.id", "c.builder_user_id")
    .select("c.id", "c.number", "c.title", "c.stage", "c.builder_user_id", "bu.name as builder_name", "c.target_date", ...more);
}

export function toCommissionRef(r: CommissionRefRow, template: readonly BuildStage[]): OverviewCommission {
  return {
    id: r.id,
    number: r.number,
    title: r.title,
    stage: r.stage,
    stageLabel: stageLabel(r.stage, template),
    builder: r.builder_user_id ? { id: r.builder_user_id, name: r.builder_name ?? "" } : null,
    targetDate: r.target_date === null ? null : utcDate(r.target_date),
  };
}
