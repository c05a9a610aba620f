"use client";

import { useState } from "react";
import { useForm } from "react-hook-form";
import { applyActionErrors } from "@/components/forms/action-errors";
import { lazyZodResolver } from "@/components/forms/lazy-schema";
import { TextField } from "@/components/forms/text-field";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { describedBy, Field } from "@/components/ui/field";
import { Select } from "@/components/ui/select";
import type { WorkshopCreateInput } from "@/lib/schemas/workshop";
import { COMMON_CURRENCIES, slugFromName } from "@/lib/schemas/workshop-values";
import { createWorkshopAction } from "./actions";

const workshopCreateResolver = lazyZodResolver(() => import("@/lib/schemas/workshop").then((m) => m.workshopCreateSchema));

const FIELDS = ["name", "slug", "unitPreference", "currency"] as const;

export function WorkshopForm() {
  const [message, setMessage] = useState<string | null>(null);
  const [slugTouched, setSlugTouched] = useState(false);
  const form = useForm<WorkshopCreateInput>({
    resolver: workshopCreateResolver,
    defaultValues: { name: "", slug: "", unitPreference: "mm", currency: "EUR" },
  });
  const { register, handleSubmit, setValue, setError, formState } = form;
  const { errors, isSubmitting } = formState;

  const onSubmit = handleSubmit(async (values) => {
    setMessage(null);
    const result = await createWorkshopAction(values);
    if (result.ok) window.location.assign(`/${result.data.slug}`);
    else setMessage(applyActionErrors(result, setError, FIELDS));
  });

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4">
      {message ? <Alert tone="error">{message}</Alert> : null}
      <TextField
        id="name"
        label="Workshop name"
        autoComplete="organization"
        error={errors.name?.message}
        {...register("name", {
          onChange: (e) => {
            if (!slugTouched) setValue("slug", slugFromName(e.target.value));
          },
        })}
      />
      <TextField
        id="slug"
        label="Address"
        hint="Lower-case letters, digits and hyphens: your pages live at /your-address."
        error={errors.slug?.message}
        {...register("slug", { onChange: () => setSlugTouched(true) })}
      />
      <div className="grid gap-4 sm:grid-cols-2">
        <Field id="unitPreference" label="Lengths shown in" error={errors.unitPreference?.message}>
          <Select
            id="unitPreference"
            {...describedBy("unitPreference", errors.unitPreference?.message)}
            options={[
              { value: "mm", label: "Millimetres" },
              { value: "in", label: "Inches" },
            ]}
            {...register("unitPreference")}
          />
        </Field>
        <Field id="currency" label="Currency" error={errors.currency?.message}>
          <Select id="currency" {...describedBy("currency", errors.currency?.message)} options={COMMON_CURRENCIES.map((c) => ({ value: c, label: c }))} {...register("currency")} />
        </Field>
      </div>
      <Button type="submit" busy={isSubmitting}>
        Create the workshop
      </Button>
    </form>
  );
}
