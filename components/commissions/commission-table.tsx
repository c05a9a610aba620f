"use client";

// The commissions table on TanStack Table v9. The server sorts and pages (manualSorting,
// manualPagination); the table's sorting and pagination state are derived from the URL view and
// every change goes back to it. Below md the same rows render as cards, so a phone never scrolls
// sideways.
import { createColumnHelper } from "@tanstack/react-table";
import Link from "next/link";
import { useMemo } from "react";
import { Badge } from "@/components/ui/badge";
import { BodyRows, Pager, SortableHead, useServerTable, type ServerTableColumns, type ServerTableFeatures } from "@/components/ui/server-table";
import { Table } from "@/components/ui/table";
import type { CommissionSummary } from "@/lib/schemas/commission-out";
import { cx } from "@/lib/ui/cx";
import { formatDay, formatPrice } from "./format";
import { sortingToSort, sortToSorting, type ListView } from "./list-view";
import { StageBadge } from "./stage-badge";

const helper = createColumnHelper<ServerTableFeatures, CommissionSummary>();

export interface CommissionTableProps {
  slug: string;
  rows: CommissionSummary[];
  total: number;
  view: ListView;
  setView: (change: Partial<ListView>) => void;
  /** Hidden for a client: every row is theirs. */
  showClient: boolean;
  busy: boolean;
}

const dateSort = { sortDescFirst: false };

function buildColumns(slug: string, showClient: boolean, showMoney: boolean) {
  const cols: ServerTableColumns<CommissionSummary> = [
    helper.accessor("number", {
      header: "Number",
      cell: (info) => (
        <Link href={`/${slug}/commissions/${info.row.original.id}`} className="whitespace-nowrap font-mono font-semibold text-rosewood-700 underline-offset-2 hover:underline">
          {info.getValue()}
        </Link>
      ),
    }),
    helper.accessor("title", { header: "Title" }),
    helper.accessor("stage", {
      header: "Stage",
      cell: (info) => <StageCell row={info.row.original} />,
    }),
  ];
  if (showClient) cols.push(helper.accessor((r) => r.client.name, { id: "client", header: "Client", enableSorting: false }));
  cols.push(helper.accessor((r) => r.builder?.name ?? "", { id: "builder", header: "Builder", enableSorting: false, cell: (info) => info.getValue() || <span className="text-graphite-500">Not assigned</span> }));
  cols.push(
    helper.accessor("targetDate", {
      header: "Target date",
      ...dateSort,
      cell: (info) => (
        <span className="whitespace-nowrap">
          {formatDay(info.getValue())} {info.row.original.overdue ? <Badge tone="danger">overdue</Badge> : null}
        </span>
      ),
    }),
  );
  if (showMoney) {
    // A price of 0 is a request the workshop has not priced yet.
    const amount = (r: CommissionSummary, f: "priceMinor" | "depositMinor") => (r.money && r.money.priceMinor > 0 ? formatPrice(r.money, f) : "—");
    cols.push(helper.accessor((r) => amount(r, "priceMinor"), { id: "price", header: "Price", enableSorting: false }));
    cols.push(helper.accessor((r) => amount(r, "depositMinor"), { id: "deposit", header: "Deposit", enableSorting: false }));
  }
  cols.push(helper.accessor((r) => r.updatedAt.slice(0, 10), { id: "updated", header: "Changed", cell: (info) => <span className="whitespace-nowrap">{formatDay(info.getValue())}</span> }));
  return cols;
}

const NUMERIC = new Set(["price", "deposit"]);

export function CommissionTable({ slug, rows, total, view, setView, showClient, busy }: CommissionTableProps) {
  // Money columns only when the API sent money (a builder's rows carry none).
  const showMoney = rows.some((r) => r.money !== null);
  const columns = useMemo(() => buildColumns(slug, showClient, showMoney), [slug, showClient, showMoney]);
  const sorting = useMemo(() => sortToSorting(view.sort), [view.sort]);
  const table = useServerTable({
    columns,
    rows,
    total,
    sorting,
    page: view.page,
    pageSize: view.pageSize,
    onSort: (next) => setView({ sort: sortingToSort(next) }),
    onPage: setView,
  });

  return (
    <div className="space-y-3" aria-busy={busy || undefined}>
      <div className={cx("hidden md:block", busy && "opacity-60")}>
        <Table caption="Commissions" aria-label="Commissions">
          <SortableHead table={table} numeric={NUMERIC} />
          <BodyRows table={table} numeric={NUMERIC} />
        </Table>
      </div>

      <ul className={cx("space-y-3 md:hidden", busy && "opacity-60")} aria-label="Commissions">
        {rows.map((r) => (
          <li key={r.id}>
            <CommissionCard slug={slug} row={r} showClient={showClient} />
          </li>
        ))}
      </ul>

      <Pager table={table} page={view.page} pageSize={view.pageSize} total={total} empty="No commissions" />
    </div>
  );
}

function StageCell({ row }: { row: CommissionSummary }) {
  return (
    <span className="inline-flex flex-wrap items-center gap-1">
      <StageBadge stage={row.stage} label={row.stageLabel} />
      {row.awaitingSignoff ? <Badge tone="warning">sign-off pending</Badge> : null}
    </span>
  );
}

/** One commission as a card, for narrow screens and the board. */
export function CommissionCard({ slug, row, showClient }: { slug: string; row: CommissionSummary; showClient: boolean }) {
  return (
    <Link href={`/${slug}/commissions/${row.id}`} className="block rounded-panel border border-spruce-200 bg-white p-3 shadow-panel hover:border-rosewood-300">
      <div className="flex flex-wrap items-start justify-between gap-2">
        <span className="font-mono text-xs font-semibold text-rosewood-700">{row.number}</span>
        <StageCell row={row} />
      </div>
      <p className="mt-1 break-words font-semibold">{row.title}</p>
      <dl className="mt-2 grid grid-cols-[auto_1fr] gap-x-3 gap-y-0.5 text-xs text-graphite-700">
        {showClient ? (
          <>
            <dt className="text-graphite-500">Client</dt>
            <dd className="break-words">{row.client.name}</dd>
          </>
        ) : null}
        <dt className="text-graphite-500">Builder</dt>
        <dd className="break-words">{row.builder?.name ?? "Not assigned"}</dd>
        <dt className="text-graphite-500">Target</dt>
        <dd>
          {formatDay(row.targetDate)} {row.overdue ? <Badge tone="danger">overdue</Badge> : null}
        </dd>
        {row.money && row.money.priceMinor > 0 ? (
          <>
            <dt className="text-graphite-500">Price</dt>
            <dd className="font-mono">{formatPrice(row.money, "priceMinor")}</dd>
          </>
        ) : null}
      </dl>
    </Link>
  );
}
