"use client";

// The ledger screen: filters from the address bar, the page and its totals from the API, and the
// CSV export of the same filters.
import { Empty, Failed, Loading, NoSuchPage } from "@/components/commissions/query-states";
import { LedgerFilters } from "@/components/books/ledger-filters";
import { LedgerTable } from "@/components/books/ledger-table";
import { changeLedgerView, isLedgerFiltered, ledgerApiQuery, ledgerFilterParams, ledgerViewParams, readLedgerView } from "@/components/books/ledger-view";
import { booksPaths } from "@/components/books/api-paths";
import { useLedger, useLedgerOptions } from "@/components/books/queries";
import { useUrlView } from "@/components/books/use-url-view";
import { buttonClasses } from "@/components/ui/button";

export function LedgerClient({ slug, currentMonth }: { slug: string; currentMonth: string }) {
  const [view, setView] = useUrlView(readLedgerView, ledgerViewParams, changeLedgerView);
  const ledger = useLedger(slug, ledgerApiQuery(view));
  const options = useLedgerOptions(slug);
  return (
    <div className="space-y-4">
      <LedgerFilters view={view} setView={setView} options={options.data} currentMonth={currentMonth} />
      <div className="flex flex-wrap items-center justify-end gap-3">
        <a href={booksPaths(slug).ledgerExport(ledgerFilterParams(view).toString())} className={buttonClasses("secondary", "sm")} download>
          Export these entries (CSV)
        </a>
      </div>
      {ledger.isPending ? (
        <Loading label="Loading the ledger…" rows={6} />
      ) : ledger.isError && !ledger.data ? (
        <Failed what="The ledger" error={ledger.error} retry={() => ledger.refetch()} />
      ) : ledger.data.total === 0 ? (
        <Empty>{isLedgerFiltered(view) ? "No entry matches these filters." : "No payments recorded yet."}</Empty>
      ) : ledger.data.items.length === 0 ? (
        <NoSuchPage page={view.page} backToFirst={() => setView({ page: 1 })} />
      ) : (
        <>
          {ledger.isError ? <Failed what="The latest entries" error={ledger.error} retry={() => ledger.refetch()} /> : null}
          <LedgerTable slug={slug} rows={ledger.data.items} total={ledger.data.total} totals={ledger.data.totals} view={view} setView={setView} busy={ledger.isPlaceholderData} />
        </>
      )}
    </div>
  );
}
