"use client";

// The owner's form for the workshop's common-practice setup ranges, in the workshop's unit.
import { useRouter } from "next/navigation";
import { Fragment, useState } from "react";
import { useForm, type Resolver } from "react-hook-form";
import { parseNumberInput } from "@/components/build-math/spec-form-fields";
import { lazyZodResolver } from "@/components/forms/lazy-schema";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { Input } from "@/components/ui/input";
import { TBody, THead, Table, Td, Th } from "@/components/ui/table";
import type { LengthUnit } from "@/lib/lutherie/units";
import type { WorkshopSetupRanges } from "@/lib/schemas/setup-ranges";
import { RANGE_FIELDS } from "@/lib/schemas/setup-ranges-values";
import { rangesFromDisplay, rangesToDisplay } from "@/lib/setup/range-units";
import { resetSetupRangesAction, saveSetupRangesAction } from "./actions";

const mmResolver = lazyZodResolver(() => import("@/lib/schemas/setup-ranges").then((m) => m.setupRangesSchema));

const FAMILIES = [
  { key: "guitar", label: "Guitar" },
  { key: "bass", label: "Bass" },
] as const;

export function RangesForm({ slug, unit, ranges, customised }: { slug: string; unit: LengthUnit; ranges: WorkshopSetupRanges; customised: boolean }) {
  const router = useRouter();
  const [notice, setNotice] = useState<{ tone: "success" | "error"; text: string } | null>(null);
  // The schema's limits are in mm: validate what will be stored.
  const resolver: Resolver<WorkshopSetupRanges> = (values, ctx, opts) => mmResolver(rangesFromDisplay(values, unit), ctx, opts as never) as never;
  const { register, handleSubmit, formState, reset, setError } = useForm<WorkshopSetupRanges>({ resolver, defaultValues: rangesToDisplay(ranges, unit) });
  const err = (path: string) => path.split(".").reduce<unknown>((o, k) => (o as Record<string, unknown> | undefined)?.[k], formState.errors) as { message?: string } | undefined;

  const onSubmit = handleSubmit(async (mm) => {
    const r = await saveSetupRangesAction(slug, mm);
    if (r.ok) {
      setNotice({ tone: "success", text: "The workshop's ranges are saved; setup sheets check against them from now on." });
      router.refresh();
    } else {
      for (const [path, message] of Object.entries(r.fieldErrors)) setError(path as never, { type: "server", message });
      setNotice({ tone: "error", text: r.message });
    }
  });

  async function restore() {
    const r = await resetSetupRangesAction(slug, {});
    if (r.ok) {
      reset(rangesToDisplay(r.data.ranges, unit));
      setNotice({ tone: "success", text: "Back to the default common-practice ranges." });
      router.refresh();
    } else setNotice({ tone: "error", text: r.message });
  }

  const cell = (path: string, label: string) => {
    const e = err(path)?.message;
    const id = `ranges-${path.replace(/\./g, "-")}`;
    return (
      <Td>
        <label htmlFor={id} className="sr-only">
          {label}
        </label>
        <Input id={id} inputMode="decimal" className="h-9 w-24 px-2 text-right font-mono" aria-invalid={e ? true : undefined} aria-describedby={`${id}-error`} {...register(path as never, { setValueAs: (v: unknown) => parseNumberInput(v, false) })} />
        <p id={`${id}-error`} role={e ? "alert" : undefined} className="mt-0.5 max-w-32 text-2xs text-ember-600">
          {e}
        </p>
      </Td>
    );
  };

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4" aria-label="Common-practice ranges">
      {notice ? <Alert tone={notice.tone}>{notice.text}</Alert> : null}
      <Table caption={`Common-practice ranges (${unit})`}>
        <THead>
          <tr>
            <Th>Measure ({unit})</Th>
            {FAMILIES.flatMap((f) => [<Th key={`${f.key}-min`}>{f.label} from</Th>, <Th key={`${f.key}-max`}>{f.label} to</Th>])}
          </tr>
        </THead>
        <TBody>
          {RANGE_FIELDS.map((r) => (
            <tr key={r.key}>
              <Td className="font-semibold">{r.label}</Td>
              {FAMILIES.flatMap((f) => [
                <Fragment key={`${f.key}-min`}>{cell(`${f.key}.${r.key}.min`, `${f.label}: ${r.label}, from (${unit})`)}</Fragment>,
                <Fragment key={`${f.key}-max`}>{cell(`${f.key}.${r.key}.max`, `${f.label}: ${r.label}, to (${unit})`)}</Fragment>,
              ])}
            </tr>
          ))}
          <tr>
            <Td className="font-semibold">Intonation tolerance at the 12th (± cents)</Td>
            {FAMILIES.map((f) => (
              <Fragment key={f.key}>
                {cell(`${f.key}.intonationToleranceCents`, `${f.label}: intonation tolerance (cents)`)}
                <Td />
              </Fragment>
            ))}
          </tr>
        </TBody>
      </Table>
      <div className="flex flex-wrap gap-3">
        <Button type="submit" busy={formState.isSubmitting}>
          Save ranges
        </Button>
        {customised ? (
          <Button type="button" variant="ghost" onClick={restore}>
            Restore the defaults
          </Button>
        ) : null}
      </div>
    </form>
  );
}

