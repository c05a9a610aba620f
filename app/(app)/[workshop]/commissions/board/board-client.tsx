"use client";

// One column per stage of the workshop's line (plus on hold), each fetched on its own so a busy
// stage shows its count and its latest cards without loading the whole workshop.
import { useQueries } from "@tanstack/react-query";
import Link from "next/link";
import { commissionKeys, commissionPaths } from "@/components/commissions/api-paths";
import { CommissionCard } from "@/components/commissions/commission-table";
import { DEFAULT_VIEW, listApiQuery, listViewParams, type ListView } from "@/components/commissions/list-view";
import { useCommissionPeople, useStageLine, type StageOption } from "@/components/commissions/queries";
import { Empty, Failed, Loading } from "@/components/commissions/query-states";
import { useListView } from "@/components/commissions/use-list-view";
import { Select } from "@/components/ui/select";
import { apiFetch } from "@/lib/http/api-client";
import type { CommissionPage } from "@/lib/schemas/commission-out";

const PER_COLUMN = 20;

export function BoardClient({ slug, canFilterBuilder }: { slug: string; canFilterBuilder: boolean }) {
  const [view, setView] = useListView();
  const line = useStageLine(slug);
  const people = useCommissionPeople(slug, canFilterBuilder ? "commission-people" : null);
  const columns: StageOption[] = line.data ? [...line.data.stages, line.data.sideStages.find((s) => s.key === "on_hold")!].filter(Boolean) : [];
  const columnView = (stage: string): ListView => ({ ...DEFAULT_VIEW, builder: view.builder, stage, sort: "-updated", pageSize: PER_COLUMN });
  const pages = useQueries({
    queries: columns.map((c) => {
      const query = listApiQuery(columnView(c.key));
      return { queryKey: commissionKeys.list(slug, query), queryFn: ({ signal }: { signal: AbortSignal }) => apiFetch<CommissionPage>(commissionPaths(slug).list(query), { signal }) };
    }),
  });

  if (line.isPending) return <Loading label="Loading the stage line…" />;
  if (line.isError) return <Failed what="The stage line" error={line.error} retry={() => line.refetch()} />;

  return (
    <div className="space-y-3">
      {canFilterBuilder ? (
        <div className="max-w-xs">
          <label htmlFor="board-builder" className="mb-1 block text-xs font-semibold uppercase tracking-wider text-graphite-700">
            Builder
          </label>
          <Select id="board-builder" value={view.builder === null ? "" : String(view.builder)} onChange={(e) => setView({ builder: e.target.value === "" ? null : e.target.value === "none" ? "none" : Number(e.target.value) })}>
            <option value="">Everyone</option>
            <option value="none">Not assigned</option>
            {(people.data?.builders ?? []).map((p) => (
              <option key={p.id} value={p.id}>
                {p.name}
              </option>
            ))}
          </Select>
        </div>
      ) : null}
      <div className="relative -mx-4 overflow-x-auto px-4 pb-3 sm:mx-0 sm:px-0" role="region" aria-label="Stages" tabIndex={0}>
        <ol className="flex min-w-max gap-3">
          {columns.map((c, i) => {
            const q = pages[i]!;
            const tableLink = `/${slug}/commissions?${listViewParams({ ...DEFAULT_VIEW, stage: c.key, builder: view.builder })}`;
            return (
              <li key={c.key} className="flex w-64 shrink-0 flex-col rounded-panel border border-spruce-200 bg-spruce-50" aria-labelledby={`col-${c.key}`}>
                <h3 id={`col-${c.key}`} className="flex items-center justify-between gap-2 border-b border-spruce-200 px-3 py-2 text-sm font-semibold">
                  <span>{c.label}</span>
                  <span className="font-mono text-xs text-graphite-600">{q.data ? q.data.total : "…"}</span>
                </h3>
                <div className="space-y-2 p-2">
                  {q.isPending ? (
                    <Loading rows={2} label={`Loading ${c.label}…`} />
                  ) : q.isError ? (
                    <Failed what={c.label} error={q.error} retry={() => q.refetch()} />
                  ) : q.data.items.length === 0 ? (
                    <p className="px-1 py-2 text-xs text-graphite-500">Nothing here.</p>
                  ) : (
                    <>
                      <ul className="space-y-2">
                        {q.data.items.map((r) => (
                          <li key={r.id}>
                            <CommissionCard slug={slug} row={r} showClient />
                          </li>
                        ))}
                      </ul>
                      {q.data.total > q.data.items.length ? (
                        <Link href={tableLink} className="block px-1 text-xs font-semibold text-rosewood-700 underline">
                          All {q.data.total} in the table
                        </Link>
                      ) : null}
                    </>
                  )}
                </div>
              </li>
            );
          })}
        </ol>
      </div>
      {columns.length === 0 ? <Empty>The workshop has no stages.</Empty> : null}
    </div>
  );
}
