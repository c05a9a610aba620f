// Links from the overview into the commissions table with the same filters. The query names are
// the list API's own (commissionListQuerySchema in lib/schemas/commission.ts), so the table page
// and GET /api/workshops/[workshop]/commissions read them unchanged.
import type { CommissionListQuery } from "@/lib/schemas/commission";

export type DrillDownFilters = Partial<Pick<CommissionListQuery, "builder" | "stage" | "overdue" | "cohort">>;

/** `/[workshop]/commissions?builder=…&stage=…&overdue=true&cohort=…`, leaving out unset filters. */
export function commissionsListHref(slug: string, filters: DrillDownFilters = {}): string {
  const q = new URLSearchParams();
  if (filters.builder !== undefined) q.set("builder", String(filters.builder));
  if (filters.stage) q.set("stage", filters.stage);
  if (filters.overdue !== undefined) q.set("overdue", String(filters.overdue));
  if (filters.cohort !== undefined) q.set("cohort", String(filters.cohort));
  const s = q.toString();
  return `/${slug}/commissions${s ? `?${s}` : ""}`;
}
