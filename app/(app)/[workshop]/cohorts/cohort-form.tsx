"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { Controller, useForm } from "react-hook-form";
import { applyActionErrors } from "@/components/forms/action-errors";
import { lazyZodResolver } from "@/components/forms/lazy-schema";
import { TextField } from "@/components/forms/text-field";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import type { CohortCreateInput } from "@/lib/schemas/cohort";
import { createCohortAction, updateCohortAction } from "./actions";

const cohortCreateResolver = lazyZodResolver(() => import("@/lib/schemas/cohort").then((m) => m.cohortCreateSchema));

type Values = { name: string; startsOn: string; endsOn: string; builderIds: number[] };
const FIELDS = ["name", "startsOn", "endsOn", "builderIds"] as const;

/** Create a cohort, or (with `cohortId`) change one: name, dates and its builders. */
export function CohortForm({ slug, builders, cohortId, initial }: { slug: string; builders: Array<{ id: number; name: string }>; cohortId?: number; initial?: Values }) {
  const router = useRouter();
  const [notice, setNotice] = useState<{ tone: "success" | "error"; text: string } | null>(null);
  const prefix = cohortId ? `cohort-${cohortId}` : "cohort-new";
  const empty: Values = { name: "", startsOn: "", endsOn: "", builderIds: [] };
  const { register, handleSubmit, setError, reset, control, formState } = useForm<CohortCreateInput>({
    resolver: cohortCreateResolver,
    defaultValues: initial ?? empty,
  });
  const { errors, isSubmitting } = formState;

  const onSubmit = handleSubmit(async (values) => {
    setNotice(null);
    const r = cohortId ? await updateCohortAction(slug, { cohortId, ...values }) : await createCohortAction(slug, values);
    if (r.ok) {
      setNotice({ tone: "success", text: cohortId ? "Saved." : `Cohort “${r.data.name}” created.` });
      if (!cohortId) reset(empty);
      router.refresh();
    } else {
      const message = applyActionErrors(r, setError, FIELDS);
      if (message) setNotice({ tone: "error", text: message });
    }
  });

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4" aria-label={cohortId ? "Change the cohort" : "New cohort"}>
      {notice ? <Alert tone={notice.tone}>{notice.text}</Alert> : null}
      <TextField id={`${prefix}-name`} label="Name" placeholder="Autumn production course 2027" error={errors.name?.message} {...register("name")} />
      <div className="grid gap-4 sm:grid-cols-2">
        <TextField id={`${prefix}-start`} label="Starts" type="date" error={errors.startsOn?.message} {...register("startsOn")} />
        <TextField id={`${prefix}-end`} label="Ends" type="date" error={errors.endsOn?.message} {...register("endsOn")} />
      </div>
      <fieldset>
        <legend className="mb-1 text-xs font-semibold uppercase tracking-wider text-graphite-700">Builders</legend>
        {builders.length === 0 ? <p className="text-sm text-graphite-500">No builders in the workshop yet: invite them on the members page.</p> : null}
        <Controller
          control={control}
          name="builderIds"
          render={({ field }) => {
            const chosen = new Set((field.value ?? []).map(Number));
            const toggle = (id: number) => field.onChange(chosen.has(id) ? [...chosen].filter((x) => x !== id) : [...chosen, id]);
            return (
              <div className="grid gap-1 sm:grid-cols-2">
                {builders.map((b) => (
                  <label key={b.id} className="flex items-center gap-2 text-sm">
                    <input type="checkbox" checked={chosen.has(b.id)} onChange={() => toggle(b.id)} className="size-4 accent-rosewood-700" />
                    {b.name}
                  </label>
                ))}
              </div>
            );
          }}
        />
        {errors.builderIds ? (
          <p role="alert" className="mt-1 text-xs font-medium text-ember-600">
            {errors.builderIds.message ?? "Choose builders of this workshop."}
          </p>
        ) : null}
      </fieldset>
      <Button type="submit" busy={isSubmitting}>
        {cohortId ? "Save the cohort" : "Create the cohort"}
      </Button>
    </form>
  );
}
