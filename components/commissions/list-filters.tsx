"use client";

// Filters, search, sort and page size above the commissions table. Every control writes the view
// to the address bar; the search box waits for a pause in typing.
import { useEffect, useState } from "react";
import { Input } from "@/components/ui/input";
import { LabelledSelect } from "@/components/ui/select";
import { COMMISSION_SORTS } from "@/lib/schemas/commission-values";
import { DEFAULT_VIEW, isFiltered, PAGE_SIZES, type CommissionSort, type ListView } from "./list-view";
import type { PersonOption, StageOption } from "./queries";

const SORT_LABELS: Record<CommissionSort, string> = {
  number: "Number, oldest first",
  "-number": "Number, newest first",
  title: "Title, A–Z",
  "-title": "Title, Z–A",
  stage: "Stage, earliest first",
  "-stage": "Stage, latest first",
  targetDate: "Target date, soonest first",
  "-targetDate": "Target date, latest first",
  updated: "Least recently changed",
  "-updated": "Recently changed",
};

export interface ListFiltersProps {
  view: ListView;
  setView: (change: Partial<ListView>, opts?: { replace?: boolean }) => void;
  stages: StageOption[];
  /** Null when the caller's role has no choice of people (a client sees only their own). */
  people: { clients: PersonOption[]; builders: PersonOption[] } | null;
  showBuilderFilter: boolean;
}

export function ListFilters({ view, setView, stages, people, showBuilderFilter }: ListFiltersProps) {
  const [q, setQ] = useState(view.q);
  const [more, setMore] = useState(false);
  // Back/Forward (or a link) may change the search in the address bar: follow it.
  useEffect(() => setQ(view.q), [view.q]);
  useEffect(() => {
    if (q.trim() === view.q) return;
    const t = setTimeout(() => setView({ q: q.trim() }, { replace: true }), 300);
    return () => clearTimeout(t);
  }, [q, view.q, setView]);

  const num = (v: string) => (v === "" ? null : Number(v));
  return (
    <form role="search" aria-label="Filter commissions" onSubmit={(e) => e.preventDefault()} className="grid grid-cols-1 gap-3 sm:grid-cols-2 lg:grid-cols-4">
      <div className="sm:col-span-2">
        <label htmlFor="commission-q" className="mb-1 block text-xs font-semibold uppercase tracking-wider text-graphite-700">
          Search
        </label>
        <Input id="commission-q" type="search" placeholder="Title or number" value={q} maxLength={80} onChange={(e) => setQ(e.target.value)} />
      </div>
      <div className="flex items-end md:hidden">
        <button type="button" aria-expanded={more} aria-controls="commission-more-filters" className="h-10 text-sm font-semibold text-rosewood-700" onClick={() => setMore((m) => !m)}>
          {more ? "Fewer choices" : "Filters and sort"}
        </button>
      </div>
      {/* On a phone the selects fold away under one button; from md up they sit in the grid. */}
      <div id="commission-more-filters" className={more ? "contents" : "hidden md:contents"}>
        <LabelledSelect id="commission-stage" label="Stage" value={view.stage ?? ""} onChange={(v) => setView({ stage: v || null })}>
          <option value="">Every stage</option>
          {stages.map((s) => (
            <option key={s.key} value={s.key}>
              {s.label}
            </option>
          ))}
        </LabelledSelect>
        <LabelledSelect id="commission-overdue" label="Target date" value={view.overdue === null ? "" : String(view.overdue)} onChange={(v) => setView({ overdue: v === "" ? null : v === "true" })}>
          <option value="">Any</option>
          <option value="true">Overdue only</option>
          <option value="false">Not overdue</option>
        </LabelledSelect>
        {people && showBuilderFilter ? (
          <LabelledSelect id="commission-builder" label="Builder" value={view.builder === null ? "" : String(view.builder)} onChange={(v) => setView({ builder: v === "none" ? "none" : num(v) })}>
            <option value="">Any builder</option>
            <option value="none">Not assigned</option>
            {people.builders.map((p) => (
              <option key={p.id} value={p.id}>
                {p.name}
              </option>
            ))}
          </LabelledSelect>
        ) : null}
        {people ? (
          <LabelledSelect id="commission-client" label="Client" value={view.client === null ? "" : String(view.client)} onChange={(v) => setView({ client: num(v) })}>
            <option value="">Any client</option>
            {people.clients.map((p) => (
              <option key={p.id} value={p.id}>
                {p.name}
              </option>
            ))}
          </LabelledSelect>
        ) : null}
        <LabelledSelect id="commission-sort" label="Sort by" value={view.sort} onChange={(v) => setView({ sort: v as CommissionSort })}>
          {COMMISSION_SORTS.map((s) => (
            <option key={s} value={s}>
              {SORT_LABELS[s]}
            </option>
          ))}
        </LabelledSelect>
        <LabelledSelect id="commission-page-size" label="Per page" value={String(view.pageSize)} onChange={(v) => setView({ pageSize: Number(v) })}>
          {PAGE_SIZES.map((n) => (
            <option key={n} value={n}>
              {n}
            </option>
          ))}
        </LabelledSelect>
      </div>
      {isFiltered(view) ? (
        <div className="flex items-end">
          <button
            type="button"
            className="h-10 text-sm font-semibold text-rosewood-700 underline-offset-2 hover:underline"
            onClick={() => {
              setQ("");
              setView({ stage: null, builder: null, client: null, overdue: null, q: DEFAULT_VIEW.q });
            }}
          >
            Clear filters
          </button>
        </div>
      ) : null}
    </form>
  );
}
