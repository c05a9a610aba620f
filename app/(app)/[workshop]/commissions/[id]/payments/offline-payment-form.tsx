"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { applyActionErrors } from "@/components/forms/action-errors";
import { lazySchema } from "@/components/forms/lazy-schema";
import { TextField } from "@/components/forms/text-field";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { describedBy, Field } from "@/components/ui/field";
import { Select } from "@/components/ui/select";
import { parseMajor } from "@/lib/money/money";
import { recordPaymentAction } from "./actions";

const offlinePaymentSchema = lazySchema(() => import("@/lib/schemas/commission").then((m) => m.offlinePaymentSchema));

interface Values {
  kind: "deposit" | "balance";
  amount: string;
  reference: string;
  paidOn: string;
}

/** The owner or bookkeeper records money taken outside the processor (bank transfer, cash). */
export function OfflinePaymentForm({ slug, commissionId, currency, suggested }: { slug: string; commissionId: number; currency: string; suggested: "deposit" | "balance" }) {
  const router = useRouter();
  const [notice, setNotice] = useState<{ tone: "success" | "error"; text: string } | null>(null);
  const { register, handleSubmit, setError, reset, formState } = useForm<Values>({ defaultValues: { kind: suggested, amount: "", reference: "", paidOn: "" } });
  const { errors, isSubmitting } = formState;

  const onSubmit = handleSubmit(async (values) => {
    setNotice(null);
    const amount = parseMajor(values.amount, currency);
    if (!amount || amount.amountMinor <= 0) {
      setError("amount", { message: `Enter an amount in ${currency}, like 900 or 900.50.` });
      return;
    }
    const input = { kind: values.kind, amountMinor: amount.amountMinor, reference: values.reference, paidOn: values.paidOn || undefined };
    const parsed = await offlinePaymentSchema.safeParse(input);
    if (!parsed.success) {
      for (const issue of parsed.error.issues) {
        const field = issue.path[0] === "amountMinor" ? "amount" : (issue.path[0] as keyof Values);
        setError(field, { message: issue.message });
      }
      return;
    }
    const r = await recordPaymentAction(slug, { commissionId, ...parsed.data });
    if (r.ok) {
      setNotice({ tone: "success", text: r.data.advanced ? "Payment recorded. The deposit is covered and the build has started." : "Payment recorded." });
      reset({ kind: values.kind, amount: "", reference: "", paidOn: "" });
      router.refresh();
      return;
    }
    const fieldErrors = Object.fromEntries(Object.entries(r.fieldErrors).map(([k, v]) => [k === "amountMinor" ? "amount" : k, v]));
    const message = applyActionErrors({ ...r, fieldErrors }, setError, ["kind", "amount", "reference", "paidOn"]);
    if (message) setNotice({ tone: "error", text: message });
  });

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-3" aria-label="Record a payment">
      {notice ? <Alert tone={notice.tone}>{notice.text}</Alert> : null}
      <div className="grid gap-3 sm:grid-cols-2">
        <Field id="offline-kind" label="For" error={errors.kind?.message}>
          <Select id="offline-kind" {...describedBy("offline-kind", errors.kind?.message)} options={[{ value: "deposit", label: "Deposit" }, { value: "balance", label: "Balance" }]} {...register("kind")} />
        </Field>
        <TextField id="offline-amount" label={`Amount (${currency})`} inputMode="decimal" autoComplete="off" error={errors.amount?.message} {...register("amount")} />
        <TextField id="offline-reference" label="Reference" hint="Bank transfer or receipt number" autoComplete="off" error={errors.reference?.message} {...register("reference")} />
        <TextField id="offline-paid-on" label="Paid on" type="date" hint="Leave empty for today" error={errors.paidOn?.message} {...register("paidOn")} />
      </div>
      <Button type="submit" busy={isSubmitting}>
        Record payment
      </Button>
    </form>
  );
}
