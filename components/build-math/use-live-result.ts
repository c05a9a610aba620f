"use client";

// Live figures for a spec form: every valid edit is computed at once with the same pure code as
// POST /api/compute; while a field is invalid, the last valid result stays on screen. The initial
// spec comes validated from the server, so the schema (and zod) load only with the first edit.
import { useEffect, useMemo, useRef, useState } from "react";
import { useWatch } from "react-hook-form";
import { lazySchema, lazyZodResolver } from "@/components/forms/lazy-schema";
import { useLazySchema } from "@/components/forms/use-lazy-schema";
import { computeSpec } from "@/lib/lutherie/compute-spec";
import type { InstrumentSpec, instrumentSpecSchema } from "@/lib/schemas/instrument-spec";
import type { SpecForm } from "./spec-form";

type Schema = typeof instrumentSpecSchema;

const specSchema = lazySchema<Schema>(() => import("@/lib/schemas/instrument-spec").then((m) => m.instrumentSpecSchema));
/** The spec form's resolver (the calculator and the commission spec editor). */
export const specResolver = lazyZodResolver<Schema>(specSchema.load);

export function useLiveResult(form: SpecForm, initialSpec: InstrumentSpec) {
  const values = useWatch({ control: form.control });
  // Any change after the first render (typing, a preset, a unit switch) needs the schema.
  const first = useRef(values);
  const edited = values !== first.current;
  const schema = useLazySchema(specSchema, edited);
  // null: edited, and the schema is still on its way (the last valid figures stay, marked stale).
  const parsed = useMemo(() => (schema ? schema.safeParse(values) : edited ? null : ({ success: true, data: initialSpec } as const)), [schema, values, edited, initialSpec]);
  const result = useMemo(() => (parsed?.success ? computeSpec(parsed.data) : null), [parsed]);
  const [lastGood, setLastGood] = useState(() => computeSpec(initialSpec));
  useEffect(() => {
    if (result) setLastGood(result);
  }, [result]);
  /** `result` is null while the form is invalid; `shown` is what to display meanwhile. */
  return { values, parsed, result, shown: result ?? lastGood };
}
