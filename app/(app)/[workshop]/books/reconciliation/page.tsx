import type { Metadata } from "next";
import Link from "next/link";
import { formatWhen } from "@/components/commissions/format";
import { PERIOD_STATUS } from "@/components/books/labels";
import { Badge } from "@/components/ui/badge";
import { Table, TBody, Td, Th, THead } from "@/components/ui/table";
import { requireWorkshopPage } from "@/lib/auth/pages";
import { monthLabel } from "@/lib/books/months";
import { listReconciliationPeriods } from "@/lib/data/reconciliation-view";

export const metadata: Metadata = { title: "Reconciliation" };

// Every month with ledger entries (and the current one), newest first, with its reconciliation state.
export default async function ReconciliationPage({ params }: { params: Promise<{ workshop: string }> }) {
  const { workshop: slug } = await params;
  const ctx = await requireWorkshopPage(slug, "reconciliation.manage", `/${slug}/books/reconciliation`);
  const periods = await listReconciliationPeriods(ctx.scope);
  return (
    <div className="space-y-4">
      <div>
        <h2 className="text-xl font-semibold">Reconciliation with the processor</h2>
        <p className="text-sm text-graphite-600">
          Month by month (UTC), the ledger&apos;s card payments and refunds are compared with the processor&apos;s balance transactions and payouts. Resolve each
          difference with a note, then lock the month: after that, only the owner can change payments dated in it.
        </p>
      </div>
      <Table caption="Months" aria-label="Months">
        <THead>
          <tr>
            <Th>Month</Th>
            <Th className="text-right">Entries</Th>
            <Th>State</Th>
            <Th className="text-right">Open exceptions</Th>
            <Th className="text-right">Changes after locking</Th>
            <Th>Last compared</Th>
          </tr>
        </THead>
        <TBody>
          {periods.map((p) => (
            <tr key={p.month} className="hover:bg-spruce-50">
              <Td>
                <Link href={`/${slug}/books/reconciliation/${p.month}`} className="font-semibold text-rosewood-700 underline-offset-2 hover:underline">
                  {monthLabel(p.month)}
                </Link>
              </Td>
              <Td numeric>{p.ledgerEntries}</Td>
              <Td>
                <Badge tone={PERIOD_STATUS[p.status].tone}>{PERIOD_STATUS[p.status].label}</Badge>
              </Td>
              <Td numeric>{p.openExceptions}</Td>
              <Td numeric>{p.flaggedChanges ? <Badge tone="warning">{p.flaggedChanges} to review</Badge> : 0}</Td>
              <Td>{p.lastRunAt ? formatWhen(p.lastRunAt) : "—"}</Td>
            </tr>
          ))}
        </TBody>
      </Table>
    </div>
  );
}
