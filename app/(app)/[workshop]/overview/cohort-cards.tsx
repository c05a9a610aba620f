import Link from "next/link";
import { CohortHeading } from "@/components/overview/cohort-heading";
import { CohortProgressBar } from "@/components/overview/cohort-progress-bar";
import { cx } from "@/lib/ui/cx";
import { commissionsListHref } from "@/lib/overview/drill-down";
import type { Overview } from "@/lib/schemas/overview";

const link = "text-xs font-semibold text-rosewood-700 underline-offset-2 hover:underline";

/** Each cohort's progress; the one the overview is filtered by is marked. */
export function CohortCards({ slug, overview }: { slug: string; overview: Overview }) {
  if (overview.cohorts.length === 0) {
    return (
      <p className="text-sm text-graphite-500">
        No cohorts yet. <Link className={link} href={`/${slug}/cohorts`}>Create one</Link> for a course whose students build commissions.
      </p>
    );
  }
  const stageKeys = overview.stages.map((s) => s.key);
  return (
    <ul className="grid gap-3 md:grid-cols-2">
      {overview.cohorts.map((c) => {
        const current = overview.cohort?.id === c.id;
        return (
          <li key={c.id} aria-label={`Cohort ${c.name}`} aria-current={current ? "true" : undefined} className={cx("rounded-panel border p-3", current ? "border-rosewood-400 bg-rosewood-50" : "border-spruce-200")}>
            <div className="mb-2">
              <CohortHeading slug={slug} cohort={c} />
            </div>
            <CohortProgressBar progress={c.progress} stageKeys={stageKeys} />
            <div className="mt-2 flex gap-3">
              {current ? (
                <Link className={link} href={`/${slug}/overview`}>
                  Show all commissions
                </Link>
              ) : (
                <Link className={link} href={`/${slug}/overview?cohort=${c.id}`}>
                  Filter the overview
                </Link>
              )}
              <Link className={link} href={commissionsListHref(slug, { cohort: c.id })}>
                Its commissions
              </Link>
            </div>
          </li>
        );
      })}
    </ul>
  );
}
