"use client";

// The instrument spec as a form, on react-hook-form with the one zod schema. The parent owns the
// form (useForm) so it can reset it (presets, unit switch) and read its values for live results.
import { useMemo } from "react";
import { useFieldArray, type UseFormReturn } from "react-hook-form";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { Input } from "@/components/ui/input";
import { Select } from "@/components/ui/select";
import type { InstrumentSpec, SpecIssue } from "@/lib/schemas/instrument-spec";
import { CONSTRUCTIONS, type Construction } from "@/lib/schemas/instrument-spec-values";
import { ComputedIssuesContext, fieldId, InputField, issuesByPath, NumberField, useFieldError } from "./spec-form-fields";

export type SpecForm = UseFormReturn<InstrumentSpec>;

/** Short names for the narrow strings table; the schema's CONSTRUCTION_LABELS are the long ones. */
const CONSTRUCTION_SHORT: Record<Construction, string> = {
  "plain-steel": "Plain steel",
  "round-wound-nickel": "Wound, nickel-plated",
  "round-wound-pure-nickel": "Wound, pure nickel",
  "round-wound-stainless": "Wound, stainless",
  "round-wound-phosphor-bronze": "Wound, phosphor bronze",
  "round-wound-80-20-bronze": "Wound, 80/20 bronze",
};

const CONSTANT_FIELDS: { name: keyof NonNullable<InstrumentSpec["constants"]>; label: string; hint: string }[] = [
  { name: "steelDensityKgM3", label: "Steel density (kg/m³)", hint: "7850, handbook" },
  { name: "wrapDensityKgM3", label: "Wrap density (kg/m³)", hint: "by construction; overrides all wraps" },
  { name: "steelYoungModulusGPa", label: "Steel Young's modulus (GPa)", hint: "200, handbook round value" },
  { name: "stressWarningPercent", label: "Stress warning (% of A228)", hint: "70, common practice" },
  { name: "stressErrorPercent", label: "Stress error (% of A228)", hint: "80, common practice" },
  { name: "tensionLowN", label: "Slack below (N)", hint: "55 guitar / 130 bass, common practice" },
  { name: "tensionHighN", label: "High above (N)", hint: "100 guitar / 240 bass, common practice" },
  { name: "tensionJumpPercent", label: "Neighbour jump (%)", hint: "30, common practice" },
  { name: "nearNullWeight", label: "Near-null weight", hint: "0.1" },
  { name: "fretCrownWidthMm", label: "Fret crown width (mm)", hint: "2.5, common practice" },
  { name: "defaultCoreFraction", label: "Default core / gauge", hint: "0.45, from memory" },
];

/** `issues`: the computed result's errors and warnings, shown on the fields they concern. */
export function SpecFormFields({ form, issues }: { form: SpecForm; issues?: readonly SpecIssue[] }) {
  const byPath = useMemo(() => (issues ? issuesByPath(issues) : null), [issues]);
  return (
    <ComputedIssuesContext.Provider value={byPath}>
      <SpecFields form={form} />
    </ComputedIssuesContext.Provider>
  );
}

function SpecFields({ form }: { form: SpecForm }) {
  const { register, control, watch } = form;
  const strings = useFieldArray({ control, name: "strings" });
  const pickups = useFieldArray({ control, name: "pickups" });
  const units = watch("units");
  const constructions = watch("strings");
  const nameError = useFieldError(form, "name");
  const stringsError = useFieldError(form, "strings");

  return (
    <div className="space-y-6">
      <fieldset className="grid min-w-0 gap-4 sm:grid-cols-2">
        <legend className="mb-2 text-sm font-semibold text-graphite-900">Neck</legend>
        <Field id={fieldId("name")} label="Name (optional)" error={nameError} className="sm:col-span-2">
          <Input id={fieldId("name")} defaultValue={form.formState.defaultValues?.name ?? ""} {...register("name", { setValueAs: (v: string) => (v.trim() === "" ? undefined : v) })} />
        </Field>
        <NumberField form={form} name="scale.bass" label={`Bass scale (${units})`} hint="Equal scales make a single-scale neck" />
        <NumberField form={form} name="scale.treble" label={`Treble scale (${units})`} />
        <NumberField form={form} name="scale.perpendicularFret" label="Perpendicular fret" hint="0 = nut; may be fractional" />
        <NumberField form={form} name="frets" label="Frets" hint="1 to 36" />
        <NumberField form={form} name="nutWidth" label={`Nut width (${units})`} optional hint="Between the edge lines; for fanned angles" />
        <NumberField form={form} name="lastFretWidth" label={`Width at last fret (${units})`} optional />
        <NumberField form={form} name="referencePitchHz" label="Reference A4 (Hz)" hint="440 is ISO 16" />
        <Field id={fieldId("family")} label="Instrument" hint="Sets the common-practice tension range">
          <Select id={fieldId("family")} defaultValue={form.formState.defaultValues?.family ?? ""} {...register("family", { setValueAs: (v: string) => (v === "" ? undefined : v) })}>
            <option value="">From string 1&apos;s pitch</option>
            <option value="guitar">Guitar</option>
            <option value="bass">Bass</option>
          </Select>
        </Field>
      </fieldset>

      <fieldset className="min-w-0 space-y-3">
        <legend className="text-sm font-semibold text-graphite-900">Strings, from string 1 (highest) down</legend>
        <p className="text-xs text-graphite-500">
          Gauges in inches. For round-wound strings the core defaults to a hex core of 45 % of the gauge; enter the real core or a measured
          unit weight when you have it.
        </p>
        {stringsError ? (
          <p role="alert" className="text-xs font-medium text-ember-600">
            {stringsError}
          </p>
        ) : null}
        <div className="relative overflow-x-auto rounded-panel border border-spruce-200 bg-white">
          <table className="w-full min-w-[44rem] table-fixed border-collapse text-sm">
            <caption className="sr-only">Strings</caption>
            <colgroup>
              {["w-8", "w-[4.5rem]", "w-[5.5rem]", "w-44", "w-20", "w-24", "w-24", "w-10"].map((w, k) => (
                <col key={k} className={w} />
              ))}
            </colgroup>
            <thead className="bg-spruce-100 text-left text-2xs uppercase tracking-wider text-graphite-700">
              <tr>
                <th scope="col" className="px-2 py-2">#</th>
                <th scope="col" className="px-1 py-2">Note</th>
                <th scope="col" className="px-1 py-2">Gauge (in)</th>
                <th scope="col" className="px-1 py-2">Construction</th>
                <th scope="col" className="px-1 py-2" title="Round-wound only; a hex core is measured across corners">Core (in)</th>
                <th scope="col" className="px-1 py-2">Core</th>
                <th scope="col" className="px-1 py-2" title="A measured unit weight overrides the model">Measured kg/m</th>
                <th scope="col" className="px-1 py-2"><span className="sr-only">Remove</span></th>
              </tr>
            </thead>
            <tbody className="divide-y divide-spruce-100">
              {strings.fields.map((f, i) => {
                const plain = constructions?.[i]?.construction === "plain-steel";
                const n = i + 1;
                return (
                  <tr key={f.id} className="align-top">
                    <td className="px-2 py-2 font-mono text-xs font-semibold text-brass-700">{n}</td>
                    <td className="px-1 py-1.5">
                      <InputField compact form={form} name={`strings.${i}.note`} label={`String ${n} note`} />
                    </td>
                    <td className="px-1 py-1.5">
                      <NumberField compact form={form} name={`strings.${i}.gaugeIn`} label={`String ${n} gauge (in)`} />
                    </td>
                    <td className="px-1 py-1.5">
                      <label htmlFor={fieldId(`strings.${i}.construction`)} className="sr-only">{`String ${n} construction`}</label>
                      <Select
                        id={fieldId(`strings.${i}.construction`)}
                        className="h-9 px-2"
                        defaultValue={form.formState.defaultValues?.strings?.[i]?.construction}
                        {...register(`strings.${i}.construction`)}
                      >
                        {CONSTRUCTIONS.map((c) => (
                          <option key={c} value={c}>
                            {CONSTRUCTION_SHORT[c]}
                          </option>
                        ))}
                      </Select>
                    </td>
                    <td className="px-1 py-1.5">
                      {plain ? <span className="block px-2 py-2 text-xs text-graphite-400">—</span> : <NumberField compact optional form={form} name={`strings.${i}.coreIn`} label={`String ${n} core (in)`} placeholder="45 %" />}
                    </td>
                    <td className="px-1 py-1.5">
                      {plain ? null : (
                        <>
                          <label htmlFor={fieldId(`strings.${i}.coreShape`)} className="sr-only">{`String ${n} core shape`}</label>
                          <Select
                            id={fieldId(`strings.${i}.coreShape`)}
                            className="h-9 px-2"
                            defaultValue={form.formState.defaultValues?.strings?.[i]?.coreShape ?? ""}
                            {...register(`strings.${i}.coreShape`, { setValueAs: (v: string) => (v === "" ? undefined : v) })}
                          >
                            <option value="">hex</option>
                            <option value="round">round</option>
                          </Select>
                        </>
                      )}
                    </td>
                    <td className="px-1 py-1.5">
                      <NumberField compact optional form={form} name={`strings.${i}.unitWeightKgPerM`} label={`String ${n} measured unit weight (kg/m)`} placeholder="model" />
                    </td>
                    <td className="px-1 py-1.5">
                      <Button variant="ghost" size="sm" onClick={() => strings.remove(i)} disabled={strings.fields.length <= 1} aria-label={`Remove string ${n}`}>
                        ✕
                      </Button>
                    </td>
                  </tr>
                );
              })}
            </tbody>
          </table>
        </div>
        <Button
          variant="secondary"
          size="sm"
          disabled={strings.fields.length >= 12}
          onClick={() => {
            const last = form.getValues(`strings.${strings.fields.length - 1}`);
            strings.append({ note: last?.note ?? "E2", gaugeIn: last?.gaugeIn ?? 0.046, construction: last?.construction ?? "round-wound-nickel" });
          }}
        >
          Add a string
        </Button>
      </fieldset>

      <fieldset className="min-w-0 space-y-3">
        <legend className="text-sm font-semibold text-graphite-900">Pickups</legend>
        <p className="text-xs text-graphite-500">
          Distance from the saddle along the string. For a slanted pickup give the treble-side distance too: the first figure is then the
          bass side, and strings between are interpolated.
        </p>
        <ol className="space-y-3">
          {pickups.fields.map((f, j) => (
            <li key={f.id} className="grid grid-cols-2 items-start gap-3 rounded-panel border border-spruce-200 bg-white p-3 sm:grid-cols-[1fr_1fr_1fr_auto]">
              <InputField form={form} name={`pickups.${j}.label`} label="Label" />
              <NumberField form={form} name={`pickups.${j}.fromBridge`} label={`From bridge (${units})`} />
              <NumberField form={form} name={`pickups.${j}.fromBridgeTreble`} label={`Treble side (${units})`} optional />
              <Button variant="ghost" size="sm" className="mt-5" onClick={() => pickups.remove(j)} aria-label={`Remove pickup ${j + 1}`}>
                Remove
              </Button>
            </li>
          ))}
        </ol>
        <Button
          variant="secondary"
          size="sm"
          disabled={pickups.fields.length >= 6}
          onClick={() => pickups.append({ label: `Pickup ${pickups.fields.length + 1}`, fromBridge: units === "in" ? 4 : 100 })}
        >
          Add a pickup
        </Button>
      </fieldset>

      <details className="rounded-panel border border-spruce-200 bg-white p-3">
        <summary className="cursor-pointer text-sm font-semibold">Constants and thresholds</summary>
        <p className="mt-2 text-xs text-graphite-500">Leave empty for the defaults shown; every result records the values it used.</p>
        <div className="mt-3 grid gap-3 sm:grid-cols-2">
          {CONSTANT_FIELDS.map((c) => (
            <NumberField key={c.name} form={form} name={`constants.${c.name}`} label={c.label} hint={c.hint} optional />
          ))}
        </div>
      </details>
    </div>
  );
}
