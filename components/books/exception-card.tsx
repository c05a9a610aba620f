// One reconciliation exception: its kind, what differs, and its resolution (or the form for it).
import type { ReactNode } from "react";
import { formatMinor, formatWhen } from "@/components/commissions/format";
import { Badge } from "@/components/ui/badge";
import { EXCEPTION_HELP } from "@/lib/books/exception-kinds";
import type { ExceptionOut } from "@/lib/schemas/books";

export function ExceptionCard({ e, resolveForm }: { e: ExceptionOut; resolveForm: ReactNode }) {
  const state = e.cleared ? { label: "Put right since", tone: "neutral" as const } : e.status === "resolved" ? { label: "Resolved", tone: "success" as const } : { label: "Open", tone: "danger" as const };
  return (
    <article aria-label={`${e.label}: ${e.commissionNumber ?? e.processorRef ?? e.id}`} className="space-y-2 rounded-panel border border-spruce-200 bg-white p-4 shadow-panel">
      <div className="flex flex-wrap items-center justify-between gap-2">
        <h4 className="font-semibold">{e.label}</h4>
        <Badge tone={state.tone}>{state.label}</Badge>
      </div>
      <p className="text-sm">{e.detail}</p>
      <p className="text-xs text-graphite-500">{EXCEPTION_HELP[e.kind]}</p>
      <dl className="grid grid-cols-[auto_1fr] gap-x-3 gap-y-0.5 text-xs text-graphite-700">
        {e.commissionNumber ? (
          <>
            <dt className="text-graphite-500">Commission</dt>
            <dd>{e.commissionNumber}</dd>
          </>
        ) : null}
        <dt className="text-graphite-500">Ledger</dt>
        <dd className="font-mono">{e.ledgerAmountMinor !== null && e.ledgerCurrency ? formatMinor(e.ledgerAmountMinor, e.ledgerCurrency) : "—"}</dd>
        <dt className="text-graphite-500">Processor</dt>
        <dd className="font-mono">
          {e.processorAmountMinor !== null && e.processorCurrency ? formatMinor(e.processorAmountMinor, e.processorCurrency) : "—"} {e.processorRef ? <span className="break-all">({e.processorRef})</span> : null}
        </dd>
      </dl>
      {e.status === "resolved" ? (
        <p className="rounded-chip bg-moss-50 px-3 py-2 text-sm text-moss-700">
          <strong>Resolution:</strong> {e.resolutionNote} <span className="text-xs">— {e.resolvedBy}, {e.resolvedAt ? formatWhen(e.resolvedAt) : ""}</span>
        </p>
      ) : (
        resolveForm
      )}
    </article>
  );
}
