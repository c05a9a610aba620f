"use client";

// The ledger's filters: month, status, kind, method, client and commission. Each writes the view to
// the address bar (and starts again at page 1).
import { LabelledSelect } from "@/components/ui/select";
import { monthLabel, monthsBetween } from "@/lib/books/months";
import { LEDGER_PAGE_SIZES, type LedgerView } from "./ledger-view";
import type { LedgerOptions } from "./queries";

export function LedgerFilters({ view, setView, options, currentMonth }: { view: LedgerView; setView: (c: Partial<LedgerView>) => void; options: LedgerOptions | undefined; currentMonth: string }) {
  const first = options?.firstMonth && options.firstMonth < currentMonth ? options.firstMonth : currentMonth;
  const last = options?.lastMonth && options.lastMonth > currentMonth ? options.lastMonth : currentMonth;
  const months = monthsBetween(first, last);
  const num = (v: string) => (v === "" ? null : Number(v));
  return (
    <form role="search" aria-label="Filter the ledger" onSubmit={(e) => e.preventDefault()} className="grid grid-cols-2 gap-3 md:grid-cols-4 lg:grid-cols-7">
      <LabelledSelect id="ledger-period" label="Month" value={view.period ?? ""} onChange={(v) => setView({ period: v || null })}>
        <option value="">Every month</option>
        {months.map((m) => (
          <option key={m} value={m}>
            {monthLabel(m)}
          </option>
        ))}
      </LabelledSelect>
      <LabelledSelect id="ledger-status" label="Status" value={view.status} onChange={(v) => setView({ status: v as LedgerView["status"] })}>
        <option value="paid">Settled</option>
        <option value="pending">Pending</option>
        <option value="failed">Failed or declined</option>
        <option value="cancelled">Not completed</option>
        <option value="all">Any status</option>
      </LabelledSelect>
      <LabelledSelect id="ledger-kind" label="Kind" value={view.kind ?? ""} onChange={(v) => setView({ kind: (v || null) as LedgerView["kind"] })}>
        <option value="">Every kind</option>
        <option value="deposit">Deposits</option>
        <option value="balance">Balances</option>
        <option value="refund">Refunds</option>
      </LabelledSelect>
      <LabelledSelect id="ledger-method" label="Taken" value={view.method ?? ""} onChange={(v) => setView({ method: (v || null) as LedgerView["method"] })}>
        <option value="">Any way</option>
        <option value="card">By card (processor)</option>
        <option value="offline">Offline (transfer, cash)</option>
      </LabelledSelect>
      <LabelledSelect id="ledger-client" label="Client" value={view.client === null ? "" : String(view.client)} onChange={(v) => setView({ client: num(v) })}>
        <option value="">Any client</option>
        {options?.clients.map((c) => (
          <option key={c.id} value={c.id}>
            {c.name}
          </option>
        ))}
      </LabelledSelect>
      <LabelledSelect id="ledger-commission" label="Commission" value={view.commission === null ? "" : String(view.commission)} onChange={(v) => setView({ commission: num(v) })}>
        <option value="">Any commission</option>
        {options?.commissions.map((c) => (
          <option key={c.id} value={c.id}>
            {c.number} · {c.title}
          </option>
        ))}
      </LabelledSelect>
      <LabelledSelect id="ledger-page-size" label="Per page" value={String(view.pageSize)} onChange={(v) => setView({ pageSize: Number(v) })}>
        {LEDGER_PAGE_SIZES.map((n) => (
          <option key={n} value={n}>
            {n}
          </option>
        ))}
      </LabelledSelect>
    </form>
  );
}
