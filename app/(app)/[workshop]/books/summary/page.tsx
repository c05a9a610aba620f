import type { Metadata } from "next";
import Link from "next/link";
import { PERIOD_STATUS } from "@/components/books/labels";
import { booksPaths } from "@/components/books/api-paths";
import { formatMinor } from "@/components/commissions/format";
import { Badge } from "@/components/ui/badge";
import { Table, TBody, Td, Th, THead } from "@/components/ui/table";
import { requireWorkshopPage } from "@/lib/auth/pages";
import { getMonthlySummary } from "@/lib/data/ledger-holdings";

export const metadata: Metadata = { title: "Monthly summary" };

// Month by month (UTC): money received, refunded, the processor's fees, net, earned income, money
// held at the month's end, and whether the month is reconciled.
export default async function SummaryPage({ params }: { params: Promise<{ workshop: string }> }) {
  const { workshop: slug } = await params;
  const ctx = await requireWorkshopPage(slug, "ledger.read", `/${slug}/books/summary`);
  const months = await getMonthlySummary(ctx.scope);
  const paths = booksPaths(slug);
  return (
    <div className="space-y-4">
      <div>
        <h2 className="text-xl font-semibold">Monthly summary</h2>
        <p className="text-sm text-graphite-600">
          Settled entries by the month the money moved (UTC). Net is received less refunds and processor fees; earned and held follow the rule on{" "}
          <Link href={`/${slug}/books/held`} className="font-semibold text-rosewood-700 underline">
            Held and earned
          </Link>
          .
        </p>
      </div>
      <Table caption="Monthly summary" aria-label="Monthly summary">
        <THead>
          <tr>
            <Th>Month</Th>
            <Th>Currency</Th>
            <Th className="text-right">Received</Th>
            <Th className="text-right">Refunded</Th>
            <Th className="text-right">Fees</Th>
            <Th className="text-right">Net</Th>
            <Th className="text-right">Earned</Th>
            <Th className="text-right">Held at month end</Th>
            <Th>Reconciliation</Th>
            <Th>Export</Th>
          </tr>
        </THead>
        <TBody>
          {months.flatMap((m) => {
            const rows = m.figures.length ? m.figures : [null];
            return rows.map((f, i) => (
              <tr key={`${m.month}-${f?.currency ?? "none"}`} aria-label={i === 0 ? m.label : undefined}>
                <Td className="whitespace-nowrap font-semibold">{i === 0 ? m.label : ""}</Td>
                <Td>{f?.currency ?? "—"}</Td>
                <Td numeric>{f ? formatMinor(f.receivedMinor, f.currency) : "—"}</Td>
                <Td numeric>{f ? formatMinor(f.refundedMinor, f.currency) : "—"}</Td>
                <Td numeric>{f ? formatMinor(f.feeMinor, f.currency) : "—"}</Td>
                <Td numeric>{f ? formatMinor(f.netMinor, f.currency) : "—"}</Td>
                <Td numeric>{f ? formatMinor(f.earnedMinor, f.currency) : "—"}</Td>
                <Td numeric>{f ? formatMinor(f.heldAtEndMinor, f.currency) : "—"}</Td>
                <Td>
                  {i === 0 ? (
                    <Link href={`/${slug}/books/reconciliation/${m.month}`} className="inline-flex items-center gap-1">
                      <Badge tone={PERIOD_STATUS[m.reconciliation].tone}>{PERIOD_STATUS[m.reconciliation].label}</Badge>
                      {m.openExceptions ? <Badge tone="danger">{m.openExceptions} open</Badge> : null}
                    </Link>
                  ) : null}
                </Td>
                <Td>
                  {i === 0 ? (
                    <a href={paths.ledgerExport(new URLSearchParams({ period: m.month }).toString())} download className="text-sm font-semibold text-rosewood-700 underline">
                      Ledger CSV
                    </a>
                  ) : null}
                </Td>
              </tr>
            ));
          })}
        </TBody>
      </Table>
    </div>
  );
}
