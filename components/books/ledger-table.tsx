"use client";

// The payments ledger on TanStack Table v9. The server filters, sorts and pages (manualSorting,
// manualPagination); the table's state comes from the URL view and every change goes back to it.
// The footer holds the totals per currency over every page. Below md the rows render as cards.
import { createColumnHelper } from "@tanstack/react-table";
import Link from "next/link";
import { useMemo } from "react";
import { formatMinor, formatWhen } from "@/components/commissions/format";
import { Badge } from "@/components/ui/badge";
import { BodyRows, Pager, SortableHead, useServerTable, type ServerTableColumns, type ServerTableFeatures } from "@/components/ui/server-table";
import { Table, Td } from "@/components/ui/table";
import type { CurrencyTotals } from "@/lib/books/entries";
import type { LedgerEntryOut } from "@/lib/schemas/books";
import { cx } from "@/lib/ui/cx";
import { entryKindLabel, entryStatus } from "./labels";
import { ledgerSortToSorting, sortingToLedgerSort, type LedgerView } from "./ledger-view";

const helper = createColumnHelper<ServerTableFeatures, LedgerEntryOut>();
const NUMERIC = new Set(["amount", "fee", "net"]);

function buildColumns(slug: string) {
  const cols: ServerTableColumns<LedgerEntryOut> = [
    helper.accessor("date", { id: "date", header: "Date (UTC)", sortDescFirst: true, cell: (info) => <span className="whitespace-nowrap">{formatWhen(info.getValue())}</span> }),
    helper.accessor((r) => r.commission.number, {
      id: "commission",
      header: "Commission",
      cell: (info) => (
        <Link href={`/${slug}/commissions/${info.row.original.commission.id}/payments`} className="font-mono font-semibold text-rosewood-700 underline-offset-2 hover:underline">
          {info.getValue()}
        </Link>
      ),
    }),
    helper.accessor((r) => r.commission.title, { id: "title", header: "Title", enableSorting: false }),
    helper.accessor((r) => r.client.name, { id: "client", header: "Client", enableSorting: false }),
    helper.accessor((r) => entryKindLabel(r), { id: "kind", header: "Entry", enableSorting: false }),
    helper.accessor("status", {
      header: "Status",
      enableSorting: false,
      cell: (info) => {
        const s = entryStatus(info.row.original);
        return (
          <span className="inline-flex flex-wrap gap-1">
            <Badge tone={s.tone}>{s.label}</Badge>
            {info.row.original.monthLocked ? <Badge tone="neutral">locked month</Badge> : null}
          </span>
        );
      },
    }),
    helper.accessor("grossMinor", { id: "amount", header: "Gross", sortDescFirst: true, cell: (info) => formatMinor(info.getValue(), info.row.original.currency) }),
    helper.accessor("feeMinor", { id: "fee", header: "Fee", enableSorting: false, cell: (info) => (info.row.original.method === "card" ? formatMinor(info.getValue(), info.row.original.currency) : "—") }),
    helper.accessor("netMinor", { id: "net", header: "Net", enableSorting: false, cell: (info) => formatMinor(info.getValue(), info.row.original.currency) }),
    helper.accessor((r) => r.reference ?? r.processor?.refundId ?? r.processor?.chargeId ?? "", {
      id: "reference",
      header: "Reference",
      enableSorting: false,
      cell: (info) => <span className="break-all font-mono text-xs">{info.getValue() || "—"}</span>,
    }),
  ];
  return cols;
}

export interface LedgerTableProps {
  slug: string;
  rows: LedgerEntryOut[];
  total: number;
  totals: CurrencyTotals[];
  view: LedgerView;
  setView: (change: Partial<LedgerView>) => void;
  busy: boolean;
}

export function LedgerTable({ slug, rows, total, totals, view, setView, busy }: LedgerTableProps) {
  const columns = useMemo(() => buildColumns(slug), [slug]);
  const sorting = useMemo(() => ledgerSortToSorting(view.sort), [view.sort]);
  const table = useServerTable({
    columns,
    rows,
    total,
    sorting,
    page: view.page,
    pageSize: view.pageSize,
    onSort: (next) => setView({ sort: sortingToLedgerSort(next) }),
    onPage: setView,
  });
  const width = columns.length;

  return (
    <div className="space-y-3" aria-busy={busy || undefined}>
      <div className={cx("hidden md:block", busy && "opacity-60")}>
        <Table caption="Payments ledger" aria-label="Payments ledger">
          <SortableHead table={table} numeric={NUMERIC} />
          <BodyRows table={table} numeric={NUMERIC} />
          <tfoot className="border-t-2 border-spruce-300 bg-spruce-50 font-semibold">
            {totals.map((t) => (
              <tr key={t.currency} aria-label={`Totals in ${t.currency}`}>
                <Td colSpan={width - 4}>
                  Totals, {t.currency}: {t.count} settled {t.count === 1 ? "entry" : "entries"} (all pages)
                </Td>
                <Td numeric>{formatMinor(t.grossMinor, t.currency)}</Td>
                <Td numeric>{formatMinor(t.feeMinor, t.currency)}</Td>
                <Td numeric>{formatMinor(t.netMinor, t.currency)}</Td>
                <Td />
              </tr>
            ))}
          </tfoot>
        </Table>
      </div>

      <ul className={cx("space-y-3 md:hidden", busy && "opacity-60")} aria-label="Payments ledger">
        {rows.map((r) => {
          const s = entryStatus(r);
          return (
            <li key={r.id} className="rounded-panel border border-spruce-200 bg-white p-3 shadow-panel">
              <div className="flex flex-wrap items-start justify-between gap-2">
                <Link href={`/${slug}/commissions/${r.commission.id}/payments`} className="font-mono text-xs font-semibold text-rosewood-700">
                  {r.commission.number}
                </Link>
                <Badge tone={s.tone}>{s.label}</Badge>
              </div>
              <p className="mt-1 break-words font-semibold">
                {entryKindLabel(r)} · {formatMinor(r.grossMinor, r.currency)}
              </p>
              <p className="text-xs text-graphite-600">
                {r.client.name} · {formatWhen(r.date)} · fee {formatMinor(r.feeMinor, r.currency)} · net {formatMinor(r.netMinor, r.currency)}
              </p>
            </li>
          );
        })}
        {totals.map((t) => (
          <li key={t.currency} className="rounded-panel border border-spruce-300 bg-spruce-50 p-3 text-sm font-semibold">
            Totals, {t.currency} ({t.count} settled): {formatMinor(t.grossMinor, t.currency)} gross, {formatMinor(t.feeMinor, t.currency)} fees, {formatMinor(t.netMinor, t.currency)} net
          </li>
        ))}
      </ul>

      <Pager table={table} page={view.page} pageSize={view.pageSize} total={total} empty="No entries" />
    </div>
  );
}
