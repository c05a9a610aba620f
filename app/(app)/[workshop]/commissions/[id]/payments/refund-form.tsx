"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { applyActionErrors } from "@/components/forms/action-errors";
import { lazySchema } from "@/components/forms/lazy-schema";
import { TextField } from "@/components/forms/text-field";
import { fmt, INVOICE_LABEL } from "@/components/payments/labels";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { describedBy, Field } from "@/components/ui/field";
import { Select } from "@/components/ui/select";
import { parseMajor } from "@/lib/money/money";
import { refundAction } from "./actions";

const refundRequestSchema = lazySchema(() => import("@/lib/schemas/payment").then((m) => m.refundRequestSchema));

export interface RefundablePayment {
  id: number;
  kind: "deposit" | "balance";
  method: "card" | "offline";
  amountMinor: number;
  refundableMinor: number;
  currency: string;
}

interface Values {
  paymentId: string;
  amount: string;
  reason: string;
}

/** Refund all or part of a payment; asks once more, with the amount, before anything is sent. */
export function RefundForm({ slug, commissionId, payments }: { slug: string; commissionId: number; payments: RefundablePayment[] }) {
  const router = useRouter();
  const [notice, setNotice] = useState<{ tone: "success" | "error"; text: string } | null>(null);
  const [confirming, setConfirming] = useState<{ input: { paymentId: number; amountMinor?: number; reason?: string }; text: string } | null>(null);
  const { register, handleSubmit, setError, reset, watch, formState } = useForm<Values>({ defaultValues: { paymentId: String(payments[0]?.id ?? ""), amount: "", reason: "" } });
  const { errors, isSubmitting } = formState;
  const chosen = payments.find((p) => String(p.id) === watch("paymentId"));

  const onSubmit = handleSubmit(async (values) => {
    setNotice(null);
    const payment = payments.find((p) => String(p.id) === values.paymentId);
    if (!payment) return setError("paymentId", { message: "Choose the payment to refund." });
    let amountMinor: number | undefined;
    if (values.amount.trim()) {
      const m = parseMajor(values.amount, payment.currency);
      if (!m || m.amountMinor <= 0) return setError("amount", { message: `Enter an amount in ${payment.currency}, like 150 or 150.50, or leave it empty for all of it.` });
      if (m.amountMinor > payment.refundableMinor) return setError("amount", { message: `At most ${fmt(payment.refundableMinor, payment.currency)} can be refunded of this payment.` });
      amountMinor = m.amountMinor;
    }
    const parsed = await refundRequestSchema.safeParse({ paymentId: payment.id, amountMinor, reason: values.reason || undefined });
    if (!parsed.success) return setError("reason", { message: parsed.error.issues[0]?.message ?? "Check the form." });
    if (!confirming) {
      const amountText = fmt(amountMinor ?? payment.refundableMinor, payment.currency);
      const how = payment.method === "card" ? "to the client's card" : "as returned by the workshop (bank transfer or cash)";
      setConfirming({ input: parsed.data, text: `Refund ${amountText} of payment #${payment.id} ${how}?` });
      return;
    }
    const r = await refundAction(slug, { commissionId, ...confirming.input });
    setConfirming(null);
    if (r.ok) {
      setNotice({
        tone: "success",
        text: r.data.status === "pending" ? "Refund sent to the payment service. It shows as pending until the service confirms it." : "Refund recorded.",
      });
      reset({ paymentId: values.paymentId, amount: "", reason: "" });
      router.refresh();
      return;
    }
    const fieldErrors = Object.fromEntries(Object.entries(r.fieldErrors).map(([k, v]) => [k === "amountMinor" ? "amount" : k, v]));
    const message = applyActionErrors({ ...r, fieldErrors }, setError, ["paymentId", "amount", "reason"]);
    if (message) setNotice({ tone: "error", text: message });
  });

  if (payments.length === 0) return <p className="text-sm text-graphite-600">Nothing to refund: no payment has gone through, or all of it has been refunded.</p>;

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-3" aria-label="Refund a payment">
      {notice ? <Alert tone={notice.tone}>{notice.text}</Alert> : null}
      <div className="grid gap-3 sm:grid-cols-2">
        <Field id="refund-payment" label="Payment" error={errors.paymentId?.message}>
          <Select
            id="refund-payment"
            {...describedBy("refund-payment", errors.paymentId?.message)}
            options={payments.map((p) => ({
              value: String(p.id),
              label: `#${p.id} ${INVOICE_LABEL[p.kind]} ${p.method === "card" ? "by card" : "offline"}, ${fmt(p.amountMinor, p.currency)}`,
            }))}
            {...register("paymentId", { onChange: () => setConfirming(null) })}
          />
        </Field>
        <TextField
          id="refund-amount"
          label="Amount"
          inputMode="decimal"
          autoComplete="off"
          hint={chosen ? `Empty: all that is left, ${fmt(chosen.refundableMinor, chosen.currency)}` : undefined}
          error={errors.amount?.message}
          {...register("amount", { onChange: () => setConfirming(null) })}
        />
        <TextField id="refund-reason" label="Reason" hint="For example: commission cancelled" className="sm:col-span-2" autoComplete="off" error={errors.reason?.message} {...register("reason")} />
      </div>
      {confirming ? <Alert tone="warning">{confirming.text}</Alert> : null}
      <div className="flex flex-wrap gap-2">
        <Button type="submit" variant={confirming ? "danger" : "secondary"} busy={isSubmitting}>
          {confirming ? "Confirm refund" : "Refund…"}
        </Button>
        {confirming ? (
          <Button variant="ghost" onClick={() => setConfirming(null)}>
            Keep the money
          </Button>
        ) : null}
      </div>
    </form>
  );
}
