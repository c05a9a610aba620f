import Link from "next/link";
import type { Overview } from "@/lib/schemas/overview";

type Row = { id: number; number: string; title: string; stageLabel: string; builder: { name: string } | null; targetDate: string | null; note: string };

function DateList({ slug, rows, empty, label }: { slug: string; rows: Row[]; empty: string; label: string }) {
  if (rows.length === 0) return <p className="text-sm text-graphite-500">{empty}</p>;
  return (
    <ul aria-label={label} className="divide-y divide-spruce-100 text-sm">
      {rows.map((r) => (
        <li key={r.id} className="flex flex-wrap items-baseline justify-between gap-2 py-2">
          <span>
            <Link href={`/${slug}/commissions/${r.id}`} className="font-mono font-semibold text-rosewood-700 underline-offset-2 hover:underline">
              {r.number}
            </Link>{" "}
            {r.title}
            <span className="block text-xs text-graphite-500">
              {r.stageLabel} · {r.builder?.name ?? "nobody yet"}
            </span>
          </span>
          <span className="font-mono text-xs">
            {r.targetDate} <span className="font-sans font-semibold">{r.note}</span>
          </span>
        </li>
      ))}
    </ul>
  );
}

export function OverdueList({ slug, overview }: { slug: string; overview: Overview }) {
  const rows = overview.overdue.map((c) => ({ ...c, note: `${c.daysOverdue} d late` }));
  return <DateList slug={slug} rows={rows} label="Overdue commissions" empty="Nothing is overdue." />;
}

export function UpcomingList({ slug, overview }: { slug: string; overview: Overview }) {
  const rows = overview.upcoming.map((c) => ({ ...c, note: c.daysLeft === 0 ? "today" : `in ${c.daysLeft} d` }));
  return <DateList slug={slug} rows={rows} label="Upcoming target dates" empty={`No target dates in the next ${overview.upcomingDays} days.`} />;
}
