import { Badge } from "@/components/ui/badge";
import { Table, TBody, THead, Td, Th } from "@/components/ui/table";
import type { PaymentOut } from "@/lib/schemas/payment";
import { fmt, paymentStatus, paymentWhat, utc } from "./labels";

/** Every payment and refund, newest first; the processor's fee, net and ids for the workshop's money people. */
export function PaymentHistory({ payments, showProcessor }: { payments: PaymentOut[]; showProcessor: boolean }) {
  if (payments.length === 0) return <p className="px-5 py-4 text-sm text-graphite-600">No payments yet.</p>;
  return (
    <Table caption="Payments and refunds" aria-label="Payments and refunds">
      <THead>
        <tr>
          <Th>#</Th>
          <Th>What</Th>
          <Th className="text-right">Amount</Th>
          <Th>Status</Th>
          <Th>When</Th>
          {showProcessor ? <Th className="text-right">Fee</Th> : null}
          {showProcessor ? <Th className="text-right">Net</Th> : null}
          <Th>Reference</Th>
        </tr>
      </THead>
      <TBody>
        {[...payments].reverse().map((p) => {
          const status = paymentStatus(p);
          const proc = p.processor;
          const ref = p.reference ?? (showProcessor ? proc?.sessionId : null) ?? "—";
          return (
            <tr key={p.id}>
              <Td className="font-mono text-xs">{p.id}</Td>
              <Td>
                {paymentWhat(p)}
                {p.failureMessage && p.status !== "paid" ? <span className="block text-xs text-ember-700">{p.failureMessage}</span> : null}
              </Td>
              <Td numeric>{p.kind === "refund" ? `−${fmt(p.amountMinor, p.currency)}` : fmt(p.amountMinor, p.currency)}</Td>
              <Td>
                <Badge tone={status.tone}>{status.label}</Badge>
              </Td>
              <Td className="whitespace-nowrap text-xs">{utc(p.paidAt ?? p.createdAt)}</Td>
              {showProcessor ? <Td numeric>{proc?.feeMinor != null ? fmt(proc.feeMinor, p.currency) : "—"}</Td> : null}
              {showProcessor ? <Td numeric>{proc?.netMinor != null ? fmt(proc.netMinor, p.currency) : "—"}</Td> : null}
              <Td className="max-w-48 truncate font-mono text-xs" title={ref}>
                {ref}
              </Td>
            </tr>
          );
        })}
      </TBody>
    </Table>
  );
}
