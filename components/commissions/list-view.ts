// The commissions table's view (filters, search, sort, page) and its address-bar form. The URL is
// the one source of truth, so a copied link reopens the same view; anything unreadable in it falls
// back to the default rather than failing the page. Pure: no React.
import { COMMISSION_SORTS } from "@/lib/schemas/commission-values";

export type CommissionSort = (typeof COMMISSION_SORTS)[number];
export const PAGE_SIZES = [10, 25, 50, 100] as const;

export interface ListView {
  stage: string | null;
  /** A builder's user id, or "none" for unassigned commissions. */
  builder: number | "none" | null;
  client: number | null;
  overdue: boolean | null;
  q: string;
  sort: CommissionSort;
  page: number;
  pageSize: number;
}

export const DEFAULT_VIEW: ListView = { stage: null, builder: null, client: null, overdue: null, q: "", sort: "-updated", page: 1, pageSize: 25 };

const STAGE_KEY = /^[a-z0-9_]{1,40}$/;

function positiveInt(v: string | null): number | null {
  if (v === null || !/^\d{1,10}$/.test(v)) return null;
  const n = Number(v);
  return n >= 1 && n <= 2_147_483_647 ? n : null;
}

/** Reads a view from the address bar's query. */
export function readListView(params: URLSearchParams): ListView {
  const stage = params.get("stage");
  const builder = params.get("builder");
  const overdue = params.get("overdue");
  const sort = params.get("sort");
  const size = positiveInt(params.get("pageSize"));
  return {
    stage: stage && STAGE_KEY.test(stage) ? stage : null,
    builder: builder === "none" ? "none" : positiveInt(builder),
    client: positiveInt(params.get("client")),
    overdue: overdue === "true" ? true : overdue === "false" ? false : null,
    q: (params.get("q") ?? "").trim().slice(0, 80),
    sort: (COMMISSION_SORTS as readonly string[]).includes(sort ?? "") ? (sort as CommissionSort) : DEFAULT_VIEW.sort,
    page: Math.min(positiveInt(params.get("page")) ?? 1, 100_000),
    pageSize: size !== null && (PAGE_SIZES as readonly number[]).includes(size) ? size : DEFAULT_VIEW.pageSize,
  };
}

/** The view as query parameters, defaults left out (the same names the API takes). */
export function listViewParams(view: ListView): URLSearchParams {
  const p = new URLSearchParams();
  if (view.stage) p.set("stage", view.stage);
  if (view.builder !== null) p.set("builder", String(view.builder));
  if (view.client !== null) p.set("client", String(view.client));
  if (view.overdue !== null) p.set("overdue", String(view.overdue));
  if (view.q) p.set("q", view.q);
  if (view.sort !== DEFAULT_VIEW.sort) p.set("sort", view.sort);
  if (view.page !== 1) p.set("page", String(view.page));
  if (view.pageSize !== DEFAULT_VIEW.pageSize) p.set("pageSize", String(view.pageSize));
  return p;
}

/** The API query for a view: every parameter spelled out, so the cache key is unambiguous. */
export function listApiQuery(view: ListView): string {
  const p = listViewParams(view);
  p.set("sort", view.sort);
  p.set("page", String(view.page));
  p.set("pageSize", String(view.pageSize));
  p.sort();
  return p.toString();
}

/** A change of filter, search or page size starts again at page 1; a page change keeps the rest. */
export function changeView(view: ListView, change: Partial<ListView>): ListView {
  const next = { ...view, ...change };
  if (!("page" in change)) next.page = 1;
  return next;
}

/** TanStack Table's sorting state ↔ our single sort key. */
export function sortToSorting(sort: CommissionSort): Array<{ id: string; desc: boolean }> {
  return [{ id: sort.replace(/^-/, ""), desc: sort.startsWith("-") }];
}

export function sortingToSort(sorting: ReadonlyArray<{ id: string; desc: boolean }>): CommissionSort {
  const first = sorting[0];
  if (!first) return DEFAULT_VIEW.sort;
  const key = `${first.desc ? "-" : ""}${first.id}`;
  return (COMMISSION_SORTS as readonly string[]).includes(key) ? (key as CommissionSort) : DEFAULT_VIEW.sort;
}

/** True when any filter or search narrows the list (for the empty state's wording). */
export function isFiltered(view: ListView): boolean {
  return view.stage !== null || view.builder !== null || view.client !== null || view.overdue !== null || view.q !== "";
}
