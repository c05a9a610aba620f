import Link from "next/link";

/** A cohort's name (linking to its page) and its dates. */
export function CohortHeading({ slug, cohort, className = "font-semibold underline-offset-2 hover:underline" }: { slug: string; cohort: { id: number; name: string; startsOn: string; endsOn: string }; className?: string }) {
  return (
    <div className="flex flex-wrap items-baseline justify-between gap-2">
      <Link href={`/${slug}/cohorts/${cohort.id}`} className={className}>
        {cohort.name}
      </Link>
      <span className="font-mono text-xs text-graphite-500">
        {cohort.startsOn} – {cohort.endsOn}
      </span>
    </div>
  );
}
