"use client";

// The workshop home's panel: the caller's most recently changed commissions.
import Link from "next/link";
import { Card, CardBody, CardHeader } from "@/components/ui/card";
import { DEFAULT_VIEW, listApiQuery } from "./list-view";
import { useCommissionList } from "./queries";
import { Empty, Failed, Loading } from "./query-states";
import { StageBadge } from "./stage-badge";

const RECENT = listApiQuery({ ...DEFAULT_VIEW, pageSize: 5 });

export function RecentCommissions({ slug, title, canCreate }: { slug: string; title: string; canCreate: boolean }) {
  const list = useCommissionList(slug, RECENT, { keepPrevious: false });
  return (
    <Card className="md:col-span-2">
      <CardHeader
        title={title}
        subtitle="Most recently changed first"
        action={
          <Link href={`/${slug}/commissions`} className="text-sm font-semibold text-rosewood-700 underline-offset-2 hover:underline">
            All commissions
          </Link>
        }
      />
      <CardBody>
        {list.isPending ? (
          <Loading label="Loading commissions…" />
        ) : list.isError ? (
          <Failed what="Your commissions" error={list.error} retry={() => list.refetch()} />
        ) : list.data.items.length === 0 ? (
          <Empty>
            No commissions yet.{" "}
            {canCreate ? (
              <Link href={`/${slug}/commissions/new`} className="font-semibold text-rosewood-700 underline">
                Start one
              </Link>
            ) : null}
          </Empty>
        ) : (
          <ul className="divide-y divide-spruce-100" aria-label="Recent commissions">
            {list.data.items.map((c) => (
              <li key={c.id} className="flex flex-wrap items-center justify-between gap-2 py-2">
                <Link href={`/${slug}/commissions/${c.id}`} className="min-w-0 break-words font-semibold text-graphite-900 hover:text-rosewood-700">
                  <span className="mr-2 font-mono text-xs text-rosewood-700">{c.number}</span>
                  {c.title}
                </Link>
                <StageBadge stage={c.stage} label={c.stageLabel} />
              </li>
            ))}
          </ul>
        )}
      </CardBody>
    </Card>
  );
}
