"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { applyActionErrors } from "@/components/forms/action-errors";
import { lazyZodResolver } from "@/components/forms/lazy-schema";
import { TextField } from "@/components/forms/text-field";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { describedBy, Field } from "@/components/ui/field";
import { Select } from "@/components/ui/select";
import { COMMON_CURRENCIES } from "@/lib/schemas/workshop-values";
import type { WorkshopSettingsOut, WorkshopSettingsPatchInput } from "@/lib/schemas/workshop-settings";
import { updateSettingsAction } from "./actions";

const workshopSettingsPatchResolver = lazyZodResolver(() => import("@/lib/schemas/workshop-settings").then((m) => m.workshopSettingsPatchSchema));

const FIELDS = ["name", "unitPreference", "currency", "depositPercent", "requireStageSignoff", "emailSenderName"] as const;

/** Name, units, currency, deposit percentage, stage sign-off and the e-mail sender name. */
export function SettingsForm({ slug, settings }: { slug: string; settings: WorkshopSettingsOut }) {
  const router = useRouter();
  const [notice, setNotice] = useState<{ tone: "success" | "error"; text: string } | null>(null);
  const currencies = COMMON_CURRENCIES.includes(settings.currency as (typeof COMMON_CURRENCIES)[number]) ? [...COMMON_CURRENCIES] : [settings.currency, ...COMMON_CURRENCIES];
  const { register, handleSubmit, setError, formState } = useForm<WorkshopSettingsPatchInput>({
    resolver: workshopSettingsPatchResolver,
    defaultValues: {
      name: settings.name,
      unitPreference: settings.unitPreference,
      currency: settings.currency,
      depositPercent: settings.depositPercent,
      requireStageSignoff: settings.requireStageSignoff,
      emailSenderName: settings.emailSenderName ?? "",
    },
  });
  const { errors, isSubmitting } = formState;

  const onSubmit = handleSubmit(async (values) => {
    setNotice(null);
    const r = await updateSettingsAction(slug, values);
    if (r.ok) {
      setNotice({ tone: "success", text: "Settings saved." });
      router.refresh();
    } else {
      const message = applyActionErrors(r, setError, FIELDS);
      setNotice({ tone: "error", text: message ?? "Some settings need another look." });
    }
  });

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4" aria-label="Workshop settings">
      {notice ? <Alert tone={notice.tone}>{notice.text}</Alert> : null}
      <TextField id="settings-name" label="Workshop name" error={errors.name?.message} {...register("name")} />
      <div className="grid gap-4 sm:grid-cols-2">
        <Field id="settings-units" label="Lengths in" error={errors.unitPreference?.message}>
          <Select id="settings-units" {...describedBy("settings-units", errors.unitPreference?.message)} {...register("unitPreference")}>
            <option value="mm">Millimetres</option>
            <option value="in">Inches</option>
          </Select>
        </Field>
        <Field id="settings-currency" label="Currency" hint="For commissions opened from now on; each commission keeps its own." error={errors.currency?.message}>
          <Select id="settings-currency" {...describedBy("settings-currency", errors.currency?.message)} {...register("currency")}>
            {currencies.map((c) => (
              <option key={c} value={c}>
                {c}
              </option>
            ))}
          </Select>
        </Field>
      </div>
      <TextField
        id="settings-deposit"
        label="Deposit (% of the price)"
        type="number"
        inputMode="decimal"
        step="0.01"
        min={0}
        max={100}
        hint="The default for new commissions; the owner can change it on each one before the spec is approved."
        error={errors.depositPercent?.message}
        {...register("depositPercent", { valueAsNumber: true })}
      />
      <TextField
        id="settings-sender"
        label="E-mail sender name"
        hint="Shown as the sender of the e-mails clients get; empty uses the workshop's name."
        error={errors.emailSenderName?.message}
        {...register("emailSenderName")}
      />
      <label className="flex items-start gap-2 text-sm">
        <input type="checkbox" className="mt-1 size-4 accent-rosewood-700" {...register("requireStageSignoff")} />
        <span>
          <span className="font-semibold">Owner signs off build stages</span>
          <span className="block text-xs text-graphite-500">A builder&apos;s move between build stages reaches the client only after your sign-off.</span>
        </span>
      </label>
      <Button type="submit" busy={isSubmitting}>
        Save settings
      </Button>
    </form>
  );
}
