import { Badge } from "@/components/ui/badge";
import { Table, TBody, THead, Td, Th } from "@/components/ui/table";
import type { Invoice } from "@/lib/money/invoices";
import { fmt, INVOICE_LABEL, INVOICE_STATUS } from "./labels";

/** The deposit and balance with what is paid and still due. */
export function InvoiceTable({ invoices, depositPercent }: { invoices: Invoice[]; depositPercent: number }) {
  return (
    <Table caption="Invoices" aria-label="Invoices">
      <THead>
        <tr>
          <Th>Invoice</Th>
          <Th className="text-right">Amount</Th>
          <Th className="text-right">Paid</Th>
          <Th className="text-right">Still due</Th>
          <Th>Status</Th>
        </tr>
      </THead>
      <TBody>
        {invoices.map((i) => {
          const status = INVOICE_STATUS[i.status];
          return (
            <tr key={i.kind}>
              <Td className="min-w-44">
                <span className="font-semibold">{INVOICE_LABEL[i.kind]}</span>
                <span className="block text-xs text-graphite-500">{i.kind === "deposit" ? `${depositPercent} % of the price, before the build starts` : "The rest of the price, before delivery"}</span>
              </Td>
              <Td numeric>{fmt(i.amountMinor, i.currency)}</Td>
              <Td numeric>{fmt(i.paidMinor, i.currency)}</Td>
              <Td numeric>{fmt(i.outstandingMinor, i.currency)}</Td>
              <Td>
                <Badge tone={status.tone}>{status.label}</Badge>
                {i.checkoutOpen && i.status !== "paid" ? <span className="mt-1 block text-xs text-graphite-500">A card checkout is open</span> : null}
              </Td>
            </tr>
          );
        })}
      </TBody>
    </Table>
  );
}
