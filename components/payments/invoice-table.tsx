import type { ReactNode } from "react";
import { Badge } from "@/components/ui/badge";
import { Table, TBody, THead, Td, Th } from "@/components/ui/table";
import type { Invoice } from "@/lib/money/invoices";
import { fmt, INVOICE_LABEL, INVOICE_STATUS } from "./labels";

/** The deposit and balance with what is paid and still due; `action` adds a cell (the client's Pay button). */
export function InvoiceTable({ invoices, depositPercent, action }: { invoices: Invoice[]; depositPercent: number; action?: (invoice: Invoice) => ReactNode }) {
  return (
    <Table caption="Invoices" aria-label="Invoices">
      <THead>
        <tr>
          <Th>Invoice</Th>
          <Th className="text-right">Amount</Th>
          <Th className="text-right">Paid</Th>
          <Th className="text-right">Still due</Th>
          <Th>Status</Th>
          {action ? <Th><span className="sr-only">Pay</span></Th> : null}
        </tr>
      </THead>
      <TBody>
        {invoices.map((i) => {
          const status = INVOICE_STATUS[i.status];
          return (
            <tr key={i.kind}>
              <Td>
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
              {action ? <Td className="text-right">{action(i)}</Td> : null}
            </tr>
          );
        })}
      </TBody>
    </Table>
  );
}
