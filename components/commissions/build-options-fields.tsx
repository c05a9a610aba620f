"use client";

// The structured build options of a spec version (woods, finish, bridge, hardware, electronics),
// as form fields on react-hook-form with buildOptionsSchema, and as a read-only list.
import type { UseFormReturn } from "react-hook-form";
import type { z } from "zod";
import { describedBy, Field } from "@/components/ui/field";
import { Input, Textarea } from "@/components/ui/input";
import { Select } from "@/components/ui/select";
import type { BuildOptions, buildOptionsSchema } from "@/lib/schemas/build-options";
import { BRIDGE_LABELS, BRIDGE_TYPES, NECK_JOINT_LABELS, NECK_JOINTS } from "@/lib/schemas/build-options-values";
import { OPTION_LABELS, optionText } from "./build-options-labels";

export type BuildOptionsForm = UseFormReturn<z.input<typeof buildOptionsSchema>, unknown, BuildOptions>;

type TextKey = Exclude<keyof BuildOptions, "neckJoint" | "bridge">;

const SHORT_TEXT: TextKey[] = ["bodyWood", "topWood", "neckWood", "fretboardWood", "fretWire", "finish", "colour"];
const LONG_TEXT: TextKey[] = ["hardware", "electronics", "notes"];

export function BuildOptionsFields({ form }: { form: BuildOptionsForm }) {
  const errors = form.formState.errors as Partial<Record<keyof BuildOptions, { message?: string }>>;
  const id = (k: keyof BuildOptions) => `options-${k}`;
  const err = (k: keyof BuildOptions) => errors[k]?.message;
  return (
    <div className="grid gap-3 sm:grid-cols-2">
      {SHORT_TEXT.map((k) => (
        <Field key={k} id={id(k)} label={OPTION_LABELS[k]} error={err(k)}>
          <Input id={id(k)} {...describedBy(id(k), err(k))} {...form.register(k)} />
        </Field>
      ))}
      <Field id={id("neckJoint")} label={OPTION_LABELS.neckJoint} error={err("neckJoint")}>
        <Select id={id("neckJoint")} {...form.register("neckJoint")}>
          {NECK_JOINTS.map((j) => (
            <option key={j} value={j}>
              {NECK_JOINT_LABELS[j]}
            </option>
          ))}
        </Select>
      </Field>
      <Field id={id("bridge")} label={OPTION_LABELS.bridge} hint="A floating tremolo's springs balance the total string tension" error={err("bridge")}>
        <Select id={id("bridge")} {...form.register("bridge")}>
          {BRIDGE_TYPES.map((b) => (
            <option key={b} value={b}>
              {BRIDGE_LABELS[b]}
            </option>
          ))}
        </Select>
      </Field>
      {LONG_TEXT.map((k) => (
        <Field key={k} id={id(k)} label={OPTION_LABELS[k]} error={err(k)} className="sm:col-span-2">
          <Textarea id={id(k)} className="min-h-16" {...describedBy(id(k), err(k))} {...form.register(k)} />
        </Field>
      ))}
    </div>
  );
}

export function BuildOptionsList({ options }: { options: BuildOptions }) {
  return (
    <dl className="grid grid-cols-1 gap-x-4 gap-y-2 text-sm sm:grid-cols-[auto_1fr]">
      {(Object.keys(OPTION_LABELS) as Array<keyof BuildOptions>).map((k) => (
        <div key={k} className="contents">
          <dt className="text-graphite-500">{OPTION_LABELS[k]}</dt>
          <dd className="whitespace-pre-wrap break-words">{optionText(k, options[k])}</dd>
        </div>
      ))}
    </dl>
  );
}
