// The ledger's view (filters, sort, page) and its address-bar form. The URL is the one source of
// truth, so a copied link reopens the same view; anything unreadable falls back to the default.
// Pure: no React. The query names are the API's (GET …/books/ledger).
import { isMonth } from "@/lib/books/months";
import { LEDGER_KINDS, LEDGER_SORTS, LEDGER_STATUSES } from "@/lib/schemas/books-values";

export type LedgerSort = (typeof LEDGER_SORTS)[number];
export const LEDGER_PAGE_SIZES = [25, 50, 100, 200] as const;

export interface LedgerView {
  period: string | null;
  status: (typeof LEDGER_STATUSES)[number];
  kind: (typeof LEDGER_KINDS)[number] | null;
  method: "offline" | "card" | null;
  commission: number | null;
  client: number | null;
  sort: LedgerSort;
  page: number;
  pageSize: number;
}

export const DEFAULT_LEDGER_VIEW: LedgerView = { period: null, status: "paid", kind: null, method: null, commission: null, client: null, sort: "-date", page: 1, pageSize: 25 };

function positiveInt(v: string | null): number | null {
  if (v === null || !/^\d{1,10}$/.test(v)) return null;
  const n = Number(v);
  return n >= 1 && n <= 2_147_483_647 ? n : null;
}

const oneOf = <T extends string>(list: readonly T[], v: string | null): T | null => (v !== null && (list as readonly string[]).includes(v) ? (v as T) : null);

export function readLedgerView(params: URLSearchParams): LedgerView {
  const period = params.get("period");
  const size = positiveInt(params.get("pageSize"));
  return {
    period: isMonth(period) ? period : null,
    status: oneOf(LEDGER_STATUSES, params.get("status")) ?? DEFAULT_LEDGER_VIEW.status,
    kind: oneOf(LEDGER_KINDS, params.get("kind")),
    method: oneOf(["offline", "card"] as const, params.get("method")),
    commission: positiveInt(params.get("commission")),
    client: positiveInt(params.get("client")),
    sort: oneOf(LEDGER_SORTS, params.get("sort")) ?? DEFAULT_LEDGER_VIEW.sort,
    page: Math.min(positiveInt(params.get("page")) ?? 1, 100_000),
    pageSize: size !== null && (LEDGER_PAGE_SIZES as readonly number[]).includes(size) ? size : DEFAULT_LEDGER_VIEW.pageSize,
  };
}

/** The filters alone (no page), defaults left out: the address bar and the CSV export use them. */
export function ledgerFilterParams(view: LedgerView): URLSearchParams {
  const p = new URLSearchParams();
  if (view.period) p.set("period", view.period);
  if (view.status !== DEFAULT_LEDGER_VIEW.status) p.set("status", view.status);
  if (view.kind) p.set("kind", view.kind);
  if (view.method) p.set("method", view.method);
  if (view.commission !== null) p.set("commission", String(view.commission));
  if (view.client !== null) p.set("client", String(view.client));
  if (view.sort !== DEFAULT_LEDGER_VIEW.sort) p.set("sort", view.sort);
  return p;
}

export function ledgerViewParams(view: LedgerView): URLSearchParams {
  const p = ledgerFilterParams(view);
  if (view.page !== 1) p.set("page", String(view.page));
  if (view.pageSize !== DEFAULT_LEDGER_VIEW.pageSize) p.set("pageSize", String(view.pageSize));
  return p;
}

/** The API query for a view: every parameter spelled out, sorted, so the cache key is unambiguous. */
export function ledgerApiQuery(view: LedgerView): string {
  const p = ledgerViewParams(view);
  p.set("status", view.status);
  p.set("sort", view.sort);
  p.set("page", String(view.page));
  p.set("pageSize", String(view.pageSize));
  p.sort();
  return p.toString();
}

/** A change of filter or page size starts again at page 1; a page change keeps the rest. */
export function changeLedgerView(view: LedgerView, change: Partial<LedgerView>): LedgerView {
  const next = { ...view, ...change };
  if (!("page" in change)) next.page = 1;
  return next;
}

/** TanStack Table's sorting state ↔ our single sort key. */
export function ledgerSortToSorting(sort: LedgerSort): Array<{ id: string; desc: boolean }> {
  return [{ id: sort.replace(/^-/, ""), desc: sort.startsWith("-") }];
}

export function sortingToLedgerSort(sorting: ReadonlyArray<{ id: string; desc: boolean }>): LedgerSort {
  const first = sorting[0];
  if (!first) return DEFAULT_LEDGER_VIEW.sort;
  return oneOf(LEDGER_SORTS, `${first.desc ? "-" : ""}${first.id}`) ?? DEFAULT_LEDGER_VIEW.sort;
}

export function isLedgerFiltered(view: LedgerView): boolean {
  return view.period !== null || view.status !== DEFAULT_LEDGER_VIEW.status || view.kind !== null || view.method !== null || view.commission !== null || view.client !== null;
}
