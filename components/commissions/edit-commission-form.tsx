"use client";

// Change a commission: title and target date (owner and builder); price, deposit and builder
// (owner only, and money only until the client approves a spec — the same rule updateCommission
// enforces). Only changed fields are sent, checked first with the shared commissionPatchSchema.
import { useForm } from "react-hook-form";
import { useState } from "react";
import { lazySchema } from "@/components/forms/lazy-schema";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { describedBy, Field } from "@/components/ui/field";
import { Input } from "@/components/ui/input";
import { Select } from "@/components/ui/select";
import { ApiError } from "@/lib/http/api-client";
import { parseMajor, toMajorString, money } from "@/lib/money/money";
import type { CommissionPatch } from "@/lib/schemas/commission";
import type { CommissionDetail } from "@/lib/schemas/commission-out";
import { commissionPaths } from "./api-paths";
import { applyApiErrors } from "./api-errors";
import { formatPrice } from "./format";
import { useCommissionPeople } from "./queries";
import { useCommissionChange } from "./use-commission-change";

const commissionPatchSchema = lazySchema(() => import("@/lib/schemas/commission").then((m) => m.commissionPatchSchema));

interface EditValues {
  title: string;
  targetDate: string;
  price: string;
  depositPercent: string;
  builderId: string;
}

const FIELDS = ["title", "targetDate", "price", "depositPercent", "builderId"] as const;

function initialValues(c: CommissionDetail): EditValues {
  return {
    title: c.title,
    targetDate: c.targetDate ?? "",
    price: c.money ? toMajorString(money(c.money.priceMinor, c.money.currency)) : "",
    depositPercent: c.money ? String(c.money.depositPercent) : "",
    builderId: c.builder ? String(c.builder.id) : "",
  };
}

export function EditCommissionForm({ slug, commission, isOwner, onDone }: { slug: string; commission: CommissionDetail; isOwner: boolean; onDone: () => void }) {
  const form = useForm<EditValues>({ defaultValues: initialValues(commission) });
  const [formError, setFormError] = useState<string | null>(null);
  const people = useCommissionPeople(slug, isOwner ? "commission-people" : null);
  const save = useCommissionChange<CommissionPatch>(slug, (patch) => ({ path: commissionPaths(slug).one(commission.id), method: "PATCH", json: patch }));
  const moneyOpen = isOwner && commission.money !== null && commission.stage === "spec" && commission.approvedSpecVersion === null;
  const { errors, dirtyFields } = form.formState;

  const submit = form.handleSubmit(async (v) => {
    setFormError(null);
    const patch: Record<string, unknown> = {};
    if (dirtyFields.title) patch.title = v.title;
    if (dirtyFields.targetDate) patch.targetDate = v.targetDate === "" ? null : v.targetDate;
    if (isOwner && dirtyFields.builderId) patch.builderId = v.builderId === "" ? null : Number(v.builderId);
    if (moneyOpen && commission.money && dirtyFields.price) {
      const m = parseMajor(v.price, commission.money.currency);
      if (!m || m.amountMinor < 0) return form.setError("price", { message: "Enter an amount such as 3200 or 3200.50." });
      patch.priceMinor = m.amountMinor;
    }
    if (moneyOpen && dirtyFields.depositPercent) patch.depositPercent = v.depositPercent.trim() === "" ? Number.NaN : Number(v.depositPercent);
    if (Object.keys(patch).length === 0) return onDone();
    const checked = await commissionPatchSchema.safeParse(patch);
    if (!checked.success) {
      for (const i of checked.error.issues) {
        const field = i.path[0] === "priceMinor" ? "price" : String(i.path[0] ?? "");
        if ((FIELDS as readonly string[]).includes(field)) form.setError(field as keyof EditValues, { message: i.message });
        else setFormError(i.message);
      }
      return;
    }
    try {
      await save.mutateAsync(checked.data);
      onDone();
    } catch (err) {
      // The API names priceMinor/depositMinor; the form shows both on its own fields.
      const renamed = err instanceof ApiError ? new ApiError(err.status, err.code, err.message, err.issues.map((i) => ({ ...i, path: i.path === "priceMinor" ? "price" : i.path === "depositMinor" ? "depositPercent" : i.path }))) : err;
      setFormError(applyApiErrors(renamed, form.setError, FIELDS));
    }
  });

  return (
    <form onSubmit={submit} noValidate aria-label="Change the commission" className="grid gap-3 sm:grid-cols-2">
      <Field id="edit-title" label="Title" error={errors.title?.message} className="sm:col-span-2">
        <Input id="edit-title" {...describedBy("edit-title", errors.title?.message)} {...form.register("title")} />
      </Field>
      <Field id="edit-target" label="Target date" hint="Empty for none" error={errors.targetDate?.message}>
        <Input id="edit-target" type="date" {...describedBy("edit-target", errors.targetDate?.message)} {...form.register("targetDate")} />
      </Field>
      {isOwner ? (
        <Field id="edit-builder" label="Builder" error={errors.builderId?.message}>
          <Select id="edit-builder" {...describedBy("edit-builder", errors.builderId?.message)} {...form.register("builderId")}>
            <option value="">Not assigned</option>
            {(people.data?.builders ?? (commission.builder ? [commission.builder] : [])).map((p) => (
              <option key={p.id} value={p.id}>
                {p.name}
              </option>
            ))}
          </Select>
        </Field>
      ) : null}
      {moneyOpen && commission.money ? (
        <>
          <Field id="edit-price" label={`Price (${commission.money.currency})`} error={errors.price?.message}>
            <Input id="edit-price" inputMode="decimal" {...describedBy("edit-price", errors.price?.message)} {...form.register("price")} />
          </Field>
          <Field id="edit-deposit" label="Deposit (% of the price)" hint={`Now ${formatPrice(commission.money, "depositMinor")}`} error={errors.depositPercent?.message}>
            <Input id="edit-deposit" inputMode="decimal" {...describedBy("edit-deposit", errors.depositPercent?.message)} {...form.register("depositPercent")} />
          </Field>
        </>
      ) : isOwner && commission.money ? (
        <p className="text-xs text-graphite-600 sm:col-span-2">The price and deposit are fixed once the client has approved a spec; record a change in a comment instead.</p>
      ) : null}
      {formError ? (
        <Alert tone="error" className="sm:col-span-2">
          {formError}
        </Alert>
      ) : null}
      <div className="flex gap-2 sm:col-span-2">
        <Button type="submit" busy={form.formState.isSubmitting}>
          Save changes
        </Button>
        <Button variant="secondary" onClick={onDone}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
