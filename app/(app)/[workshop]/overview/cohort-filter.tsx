import { Button } from "@/components/ui/button";
import { Select } from "@/components/ui/select";
import type { Overview } from "@/lib/schemas/overview";

/** A plain GET form: the filter lives in the address (?cohort=), so it can be shared and works without script. */
export function CohortFilter({ slug, overview }: { slug: string; overview: Overview }) {
  if (overview.cohorts.length === 0) return null;
  return (
    <form method="get" action={`/${slug}/overview`} className="flex items-end gap-2" aria-label="Filter by cohort">
      <div>
        <label htmlFor="overview-cohort" className="mb-1 block text-xs font-semibold uppercase tracking-wider text-graphite-700">
          Cohort
        </label>
        <Select id="overview-cohort" name="cohort" defaultValue={overview.cohort ? String(overview.cohort.id) : ""} className="min-w-48">
          <option value="">All commissions</option>
          {overview.cohorts.map((c) => (
            <option key={c.id} value={c.id}>
              {c.name}
            </option>
          ))}
        </Select>
      </div>
      <Button type="submit" variant="secondary">
        Show
      </Button>
    </form>
  );
}
