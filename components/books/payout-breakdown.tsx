// One payout broken down into the transactions it pays out: this workshop's with their ledger
// entries, everyone else's as one line. Presentational.
import { formatMinor, formatWhen } from "@/components/commissions/format";
import { Table, TBody, Td, Th, THead } from "@/components/ui/table";
import type { PayoutOut } from "@/lib/schemas/books";

const TYPE: Record<string, string> = { charge: "Payment", refund: "Refund", refund_failure: "Refund returned", adjustment: "Adjustment" };

export function PayoutBreakdown({ payout }: { payout: PayoutOut }) {
  const c = payout.currency;
  return (
    <div className="space-y-2">
      <h4 className="font-semibold">
        Payout <span className="font-mono text-sm">{payout.payoutId}</span>: {formatMinor(payout.amountMinor, c)}, arriving {formatWhen(payout.arrivalAt)} ({payout.status})
      </h4>
      <Table caption={`Payout ${payout.payoutId}`} aria-label={`Payout ${payout.payoutId}`}>
        <THead>
          <tr>
            <Th>Date</Th>
            <Th>Transaction</Th>
            <Th>Ledger entry</Th>
            <Th className="text-right">Gross</Th>
            <Th className="text-right">Fee</Th>
            <Th className="text-right">Net</Th>
          </tr>
        </THead>
        <TBody>
          {payout.lines.map((l) => (
            <tr key={l.txnId}>
              <Td>{formatWhen(l.createdAt)}</Td>
              <Td>
                {TYPE[l.txnType] ?? l.txnType} <span className="font-mono text-xs">{l.txnId}</span>
              </Td>
              <Td>{l.paymentId ? `#${l.paymentId} · ${l.commissionNumber ?? ""} ${l.kind ?? ""}` : <span className="text-ember-700">not in the ledger</span>}</Td>
              <Td numeric>{formatMinor(l.amountMinor, l.currency)}</Td>
              <Td numeric>{formatMinor(l.feeMinor, l.currency)}</Td>
              <Td numeric>{formatMinor(l.netMinor, l.currency)}</Td>
            </tr>
          ))}
          {payout.otherCount > 0 ? (
            <tr>
              <Td colSpan={5}>Other transactions in this payout, not this workshop&apos;s ({payout.otherCount})</Td>
              <Td numeric>{formatMinor(payout.otherNetMinor, c)}</Td>
            </tr>
          ) : null}
        </TBody>
        <tfoot className="border-t-2 border-spruce-300 bg-spruce-50 font-semibold">
          <tr>
            <Td colSpan={5}>This workshop&apos;s share ({payout.workshopCount} transactions)</Td>
            <Td numeric>{formatMinor(payout.workshopNetMinor, c)}</Td>
          </tr>
        </tfoot>
      </Table>
    </div>
  );
}
