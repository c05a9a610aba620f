import { CommissionCell } from "@/components/overview/commission-cell";
import { Table, TBody, Td, Th, THead } from "@/components/ui/table";
import { formatMoney, money } from "@/lib/money/money";
import type { Overview } from "@/lib/schemas/overview";

/** Deposits asked for and not yet paid in full, with a total per currency. */
export function DepositsTable({ slug, deposits }: { slug: string; deposits: NonNullable<Overview["depositsOutstanding"]> }) {
  if (deposits.items.length === 0) return <p className="px-5 py-4 text-sm text-graphite-500">Every deposit asked for has been paid.</p>;
  const fmt = (minor: number, currency: string) => formatMoney(money(minor, currency));
  const all = deposits.totals.reduce((n, t) => n + t.commissions, 0);
  return (
    <>
      {all > deposits.items.length ? <p className="px-2 pb-2 text-sm text-graphite-600">The first {deposits.items.length} of {all} by number; the totals count all of them.</p> : null}
      <Table caption="Deposits outstanding" className="min-w-[36rem]">
        <THead>
          <tr>
            <Th>Commission</Th>
            <Th>Stage</Th>
            <Th className="text-right">Deposit</Th>
            <Th className="text-right">Paid</Th>
            <Th className="text-right">Outstanding</Th>
          </tr>
        </THead>
        <TBody>
          {deposits.items.map((d) => (
            <tr key={d.id}>
              <Td>
                <CommissionCell slug={slug} commission={d} />
              </Td>
              <Td>{d.stageLabel}</Td>
              <Td numeric>{fmt(d.depositMinor, d.currency)}</Td>
              <Td numeric>{fmt(d.paidMinor, d.currency)}</Td>
              <Td numeric className="font-semibold">
                {fmt(d.outstandingMinor, d.currency)}
              </Td>
            </tr>
          ))}
          {deposits.totals.map((t) => (
            <tr key={t.currency} className="bg-spruce-50">
              <Td colSpan={4} className="font-semibold">
                Total in {t.currency} ({t.commissions} commission{t.commissions === 1 ? "" : "s"})
              </Td>
              <Td numeric className="font-semibold">
                {fmt(t.outstandingMinor, t.currency)}
              </Td>
            </tr>
          ))}
        </TBody>
      </Table>
    </>
  );
}
