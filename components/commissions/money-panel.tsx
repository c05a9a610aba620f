// The overview's money panel for those who may see money (the owner, the bookkeeper, the client;
// never builders, whose detail answer carries no money): price, the deposit and the balance with
// what each still needs, what has been paid, and the way to the payments tab.
import Link from "next/link";
import { INVOICE_STATUS } from "@/components/payments/labels";
import { Badge } from "@/components/ui/badge";
import { buttonClasses } from "@/components/ui/button";
import { Card, CardBody, CardHeader } from "@/components/ui/card";
import type { CommissionDetail } from "@/lib/schemas/commission-out";
import { formatMinor } from "./format";
import { overviewInvoices } from "./money-summary";

export function MoneyPanel({ c, paymentsHref, isClient }: { c: CommissionDetail; paymentsHref: string | null; isClient: boolean }) {
  const m = c.money!;
  const fmt = (minor: number) => formatMinor(minor, m.currency);
  const summary = c.payments ? overviewInvoices(m, c.payments, c.stage) : null;
  const [deposit, balance] = summary?.invoices ?? [];
  const payNow = isClient && summary?.invoices.find((i) => i.payable);
  return (
    <Card>
      <CardHeader title="Payments" />
      <CardBody className="space-y-3">
        <dl className="grid grid-cols-[1fr_auto] gap-x-3 gap-y-2 text-sm" data-testid="money">
          <dt className="text-graphite-500">Price</dt>
          <dd className="text-right font-mono" data-testid="price">
            {m.priceMinor > 0 ? fmt(m.priceMinor) : "Not set yet"}
          </dd>
          {deposit && balance ? (
            <>
              <dt className="text-graphite-500">Deposit ({m.depositPercent} %)</dt>
              <dd className="text-right font-mono">{fmt(deposit.amountMinor)}</dd>
              <dd className="col-span-2 -mt-1 text-right" data-testid="deposit-status">
                <Badge tone={INVOICE_STATUS[deposit.status].tone}>{INVOICE_STATUS[deposit.status].label}</Badge>
                {deposit.status === "due" || deposit.status === "part_paid" ? <span className="ml-2 font-mono text-xs">{fmt(deposit.outstandingMinor)} to pay</span> : null}
              </dd>
              <dt className="text-graphite-500">Balance</dt>
              <dd className="text-right font-mono">{fmt(balance.amountMinor)}</dd>
              <dd className="col-span-2 -mt-1 text-right" data-testid="balance-status">
                <Badge tone={INVOICE_STATUS[balance.status].tone}>{INVOICE_STATUS[balance.status].label}</Badge>
                {balance.status === "due" || balance.status === "part_paid" ? <span className="ml-2 font-mono text-xs">{fmt(balance.outstandingMinor)} to pay</span> : null}
              </dd>
              <dt className="border-t border-spruce-100 pt-2 text-graphite-500">Paid so far</dt>
              <dd className="border-t border-spruce-100 pt-2 text-right font-mono" data-testid="paid-so-far">
                {fmt(summary!.paidMinor)}
              </dd>
              <dt className="text-graphite-500">Still to pay</dt>
              <dd className="text-right font-mono font-semibold">{fmt(summary!.outstandingMinor)}</dd>
            </>
          ) : (
            <>
              <dt className="text-graphite-500">Deposit ({m.depositPercent} %)</dt>
              <dd className="text-right font-mono">{fmt(m.depositMinor)}</dd>
            </>
          )}
        </dl>
        {paymentsHref ? (
          payNow ? (
            <Link href={paymentsHref} className={buttonClasses("primary", "sm")}>
              Pay the {payNow.kind} on the Payments tab
            </Link>
          ) : (
            <Link href={paymentsHref} className="inline-block text-sm font-semibold text-rosewood-700 underline">
              {isClient ? "See your payments" : "Open the Payments tab"}
            </Link>
          )
        ) : null}
      </CardBody>
    </Card>
  );
}
