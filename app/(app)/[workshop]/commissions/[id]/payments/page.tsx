import type { Metadata } from "next";
import { forbidden, notFound } from "next/navigation";
import { InvoiceTable } from "@/components/payments/invoice-table";
import { fmt, INVOICE_LABEL } from "@/components/payments/labels";
import { PaymentHistory } from "@/components/payments/payment-history";
import { Card, CardBody, CardHeader } from "@/components/ui/card";
import { requireWorkshopPage } from "@/lib/auth/pages";
import { getCommissionPayments } from "@/lib/data/card-payments";
import { AppError } from "@/lib/http/errors";
import { idParamSchema } from "@/lib/schemas/ids";
import { CheckoutReturn } from "./checkout-return";
import { OfflinePaymentForm } from "./offline-payment-form";
import { PayButton } from "./pay-button";
import { RefundForm, type RefundablePayment } from "./refund-form";

export const metadata: Metadata = { title: "Payments" };

type Params = Promise<{ workshop: string; id: string }>;
type Search = Promise<Record<string, string | string[] | undefined>>;

async function load(slug: string, id: string) {
  const ctx = await requireWorkshopPage(slug, "payment.read", `/${slug}/commissions/${id}/payments`);
  const commissionId = idParamSchema.safeParse(id);
  if (!commissionId.success) notFound();
  try {
    return { ctx, data: await getCommissionPayments(ctx.scope, commissionId.data) };
  } catch (err) {
    if (err instanceof AppError && err.code === "not_found") notFound();
    if (err instanceof AppError && err.code === "forbidden") forbidden();
    throw err;
  }
}

// The commission's money: its deposit and balance, every payment and refund. The client pays here
// by card; the owner and the bookkeeper record other payments and refund; builders see no money (403).
// The commission's header and tabs come from the layout.
export default async function CommissionPaymentsPage({ params, searchParams }: { params: Params; searchParams: Search }) {
  const { workshop: slug, id } = await params;
  const { ctx, data } = await load(slug, id);
  const sp = await searchParams;
  const returned = sp.checkout === "success" || sp.checkout === "cancelled" ? sp.checkout : null;
  const { commission: c, invoices, totals, payments, can } = data;
  const confirming = payments.some((p) => p.method === "card" && p.kind !== "refund" && p.status === "pending");
  const refundable: RefundablePayment[] = payments.flatMap((p) =>
    p.kind !== "refund" && p.refundableMinor > 0 ? [{ id: p.id, kind: p.kind, method: p.method, amountMinor: p.amountMinor, refundableMinor: p.refundableMinor, currency: p.currency }] : [],
  );
  const nextDue = invoices.find((i) => i.outstandingMinor > 0)?.kind ?? "balance";
  // The client's Pay buttons sit above the table, where a phone shows them without scrolling sideways.
  const payable = can.pay ? invoices.filter((i) => i.payable) : [];

  return (
    <div className="space-y-6">
      {returned && can.pay ? <CheckoutReturn outcome={returned} confirming={confirming} /> : null}
      <Card>
        <CardHeader title="Invoices" subtitle={`Price ${fmt(c.priceMinor, c.currency)}, deposit ${c.depositPercent} % of it`} />
        <CardBody className="space-y-4">
          {payable.length ? (
            <div className="flex flex-wrap items-start gap-3" data-testid="pay-now">
              {payable.map((i) => (
                <PayButton key={i.kind} slug={slug} commissionId={c.id} kind={i.kind} label={`Pay ${INVOICE_LABEL[i.kind].toLowerCase()} ${fmt(i.outstandingMinor, i.currency)}`} />
              ))}
            </div>
          ) : null}
          <InvoiceTable invoices={invoices} depositPercent={c.depositPercent} />
          <dl className="grid gap-2 text-sm sm:grid-cols-4">
            <div>
              <dt className="text-graphite-500">Paid</dt>
              <dd className="font-mono font-semibold tabular">{fmt(totals.paidMinor, c.currency)}</dd>
            </div>
            <div>
              <dt className="text-graphite-500">Refunded</dt>
              <dd className="font-mono tabular">
                {fmt(totals.refundedMinor, c.currency)}
                {totals.refundPendingMinor > 0 ? <span className="block text-xs text-amber-700">{fmt(totals.refundPendingMinor, c.currency)} pending</span> : null}
              </dd>
            </div>
            <div>
              <dt className="text-graphite-500">Still due</dt>
              <dd className="font-mono font-semibold tabular">{fmt(totals.outstandingMinor, c.currency)}</dd>
            </div>
            {totals.overpaidMinor > 0 ? (
              <div>
                <dt className="text-graphite-500">Paid over the price</dt>
                <dd className="font-mono font-semibold text-ember-700 tabular">{fmt(totals.overpaidMinor, c.currency)}</dd>
              </div>
            ) : null}
          </dl>
          {can.pay ? (
            <p className="text-xs text-graphite-500">Card payments open the payment service&apos;s secure page; we never see your card number. A receipt follows by e-mail.</p>
          ) : null}
        </CardBody>
      </Card>

      <Card>
        <CardHeader title="Payments and refunds" subtitle="Times in UTC" />
        <PaymentHistory payments={payments} showProcessor={ctx.can("payment.refund")} />
      </Card>

      {can.record || can.refund ? (
        <div className="grid gap-6 lg:grid-cols-2">
          {can.record ? (
            <Card className="min-w-0">
              <CardHeader title="Record a payment" subtitle="Money taken outside the card checkout: bank transfer, cash" />
              <CardBody>
                <OfflinePaymentForm slug={slug} commissionId={c.id} currency={c.currency} suggested={nextDue} />
              </CardBody>
            </Card>
          ) : null}
          {can.refund ? (
            <Card className="min-w-0">
              <CardHeader title="Refund" subtitle="Card refunds go back through the payment service and show as pending until it confirms them" />
              <CardBody>
                <RefundForm slug={slug} commissionId={c.id} payments={refundable} />
              </CardBody>
            </Card>
          ) : null}
        </div>
      ) : null}
    </div>
  );
}
