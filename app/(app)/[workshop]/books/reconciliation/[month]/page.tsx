import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { ExceptionCard } from "@/components/books/exception-card";
import { PERIOD_STATUS } from "@/components/books/labels";
import { PayoutBreakdown } from "@/components/books/payout-breakdown";
import { booksPaths } from "@/components/books/api-paths";
import { formatMinor, formatWhen } from "@/components/commissions/format";
import { Alert } from "@/components/ui/alert";
import { Badge } from "@/components/ui/badge";
import { buttonClasses } from "@/components/ui/button";
import { Card, CardBody, CardHeader } from "@/components/ui/card";
import { Table, TBody, Td, Th, THead } from "@/components/ui/table";
import { requireWorkshopPage } from "@/lib/auth/pages";
import { isMonth } from "@/lib/books/months";
import { getReconciliationPeriod } from "@/lib/data/reconciliation-view";
import { NoteForm, RunButton } from "./period-actions";

export const metadata: Metadata = { title: "Reconcile a month" };

// One month's reconciliation: compare, resolve each exception with a note, lock; the payouts broken
// down; changes that reached the month after it was locked (the owner reviews them).
export default async function PeriodPage({ params }: { params: Promise<{ workshop: string; month: string }> }) {
  const { workshop: slug, month } = await params;
  const ctx = await requireWorkshopPage(slug, "reconciliation.manage", `/${slug}/books/reconciliation/${month}`);
  if (!isMonth(month)) notFound();
  const p = await getReconciliationPeriod(ctx.scope, month);
  const paths = booksPaths(slug);
  const locked = p.status === "locked";
  const mayChange = !locked || ctx.can("reconciliation.override");
  const open = p.exceptions.filter((e) => e.status === "open" && !e.cleared);
  const toReview = p.lockedChanges.filter((c) => c.source === "processor" && !c.reviewedAt);

  return (
    <div className="space-y-6">
      <div className="flex flex-wrap items-start justify-between gap-4">
        <div>
          <h2 className="text-xl font-semibold">{`Reconciliation: ${p.label}`}</h2>
          <p className="mt-1 flex flex-wrap items-center gap-2 text-sm text-graphite-600">
            <Badge tone={PERIOD_STATUS[p.status].tone}>{PERIOD_STATUS[p.status].label}</Badge>
            {p.lastRunAt ? (
              <span>
                Last compared {formatWhen(p.lastRunAt)} by {p.lastRunBy}
              </span>
            ) : null}
            {p.lockedAt ? (
              <span>
                · locked {formatWhen(p.lockedAt)} by {p.lockedBy}
                {p.lockNote ? ` (“${p.lockNote}”)` : ""}
              </span>
            ) : null}
          </p>
        </div>
        <div className="flex flex-wrap items-start gap-2">
          {mayChange ? <RunButton slug={slug} month={month} again={!!p.lastRunAt} /> : null}
          {p.lastRunAt ? (
            <a href={paths.periodExport(month)} download className={buttonClasses("secondary")}>
              Export the reconciliation (CSV)
            </a>
          ) : null}
        </div>
      </div>
      {!p.monthOver && !locked ? <Alert tone="warning">This month is not over yet: payments still to come this month will need comparing, and once it is locked only the owner can change them.</Alert> : null}
      {locked ? <Alert tone="info">This month is reconciled and locked. Only the owner can change payments dated in it; each change is logged below, and processor events that reach it are applied and flagged for the owner.</Alert> : null}

      {p.lastRunAt ? (
        <p className="text-sm text-graphite-700">
          {p.ledgerEntries} ledger entries ({p.offlineEntries} taken offline, which the processor never sees) · {p.processorTransactions} processor transactions of this workshop ·{" "}
          {p.matches.length} pairs · {p.exceptions.filter((e) => !e.cleared).length} exceptions, {open.length} open
        </p>
      ) : (
        <Alert tone="info">This month has not been compared with the processor yet.</Alert>
      )}

      {p.exceptions.length ? (
        <section aria-labelledby="exceptions-heading" className="space-y-3">
          <h3 id="exceptions-heading" className="text-lg font-semibold">
            Exceptions
          </h3>
          <div className="grid gap-3 lg:grid-cols-2">
            {p.exceptions.map((e) => (
              <ExceptionCard
                key={e.id}
                e={e}
                resolveForm={mayChange && !e.cleared ? <NoteForm id={`resolve-${e.id}`} path={paths.resolve(month, e.id)} label="How it was resolved" action="Resolve" required /> : null}
              />
            ))}
          </div>
        </section>
      ) : null}

      {p.status === "open" ? (
        <Card>
          <CardHeader title="Lock the month" subtitle="Once locked, only the owner can change payments dated in it." />
          <CardBody>
            {p.canLock ? (
              <NoteForm id="lock-note" path={paths.lock(month)} label="Note (optional)" action="Lock the month" required={false} hint="For example, which statement it was agreed with." />
            ) : (
              <p className="text-sm text-graphite-700">{p.lockBlocker}</p>
            )}
          </CardBody>
        </Card>
      ) : null}

      {p.lockedChanges.length ? (
        <section aria-labelledby="changes-heading" className="space-y-3">
          <h3 id="changes-heading" className="text-lg font-semibold">
            Changes after locking {toReview.length ? <Badge tone="warning">{toReview.length} to review</Badge> : null}
          </h3>
          <ul className="space-y-2">
            {p.lockedChanges.map((c) => (
              <li key={c.id} className="space-y-2 rounded-panel border border-spruce-200 bg-white p-3 text-sm">
                <p>
                  <strong>{c.source === "owner" ? `Changed by ${c.actor}` : "Processor event applied"}</strong>: {c.action} on payment #{c.paymentId ?? "—"}
                  {c.eventId ? <span className="font-mono text-xs"> ({c.eventId})</span> : null}, {formatWhen(c.createdAt)}
                </p>
                {c.reviewedAt ? (
                  <p className="text-xs text-graphite-600">
                    Reviewed by {c.reviewedBy}: {c.reviewNote}
                  </p>
                ) : c.source === "processor" && ctx.can("reconciliation.override") ? (
                  <NoteForm id={`review-${c.id}`} path={paths.review(month, c.id)} label="Review note" action="Mark reviewed" required />
                ) : c.source === "processor" ? (
                  <p className="text-xs text-amber-700">Waiting for the owner&apos;s review.</p>
                ) : null}
              </li>
            ))}
          </ul>
        </section>
      ) : null}

      {p.payouts.length ? (
        <section aria-labelledby="payouts-heading" className="space-y-4">
          <h3 id="payouts-heading" className="text-lg font-semibold">
            Payouts of the month
          </h3>
          {p.payouts.map((po) => (
            <PayoutBreakdown key={po.payoutId} payout={po} />
          ))}
        </section>
      ) : null}

      {p.matches.length ? (
        <section aria-labelledby="matches-heading" className="space-y-3">
          <h3 id="matches-heading" className="text-lg font-semibold">
            Pairs: ledger entry and processor transaction
          </h3>
          <Table caption="Pairs" aria-label="Pairs">
            <THead>
              <tr>
                <Th>Date</Th>
                <Th>Ledger entry</Th>
                <Th>Transaction</Th>
                <Th className="text-right">Ledger</Th>
                <Th className="text-right">Processor</Th>
                <Th className="text-right">Fee</Th>
                <Th className="text-right">Net</Th>
                <Th>Payout</Th>
              </tr>
            </THead>
            <TBody>
              {p.matches.map((m) => (
                <tr key={`${m.paymentId}-${m.txnId}`}>
                  <Td>
                    {formatWhen(m.txnCreatedAt)}
                    {m.otherMonth ? <Badge tone="accent">other side in {m.otherMonth}</Badge> : null}
                  </Td>
                  <Td>
                    #{m.paymentId} · {m.commissionNumber}
                  </Td>
                  <Td>
                    {m.txnType} <span className="font-mono text-xs">{m.txnId}</span>
                  </Td>
                  <Td numeric>{formatMinor(m.ledgerAmountMinor, m.ledgerCurrency)}</Td>
                  <Td numeric>{formatMinor(m.processorAmountMinor, m.processorCurrency)}</Td>
                  <Td numeric>{formatMinor(m.processorFeeMinor, m.processorCurrency)}</Td>
                  <Td numeric>{formatMinor(m.processorNetMinor, m.processorCurrency)}</Td>
                  <Td>
                    <span className="font-mono text-xs">{m.payoutId ?? "—"}</span>
                  </Td>
                </tr>
              ))}
            </TBody>
          </Table>
        </section>
      ) : null}
    </div>
  );
}
