"use client";

// Live figures for a spec form: every valid edit is computed at once with the same pure code as
// POST /api/compute; while a field is invalid, the last valid result stays on screen.
import { useEffect, useMemo, useState } from "react";
import { useWatch } from "react-hook-form";
import { computeSpec } from "@/lib/lutherie/compute-spec";
import { instrumentSpecSchema, type InstrumentSpec } from "@/lib/schemas/instrument-spec";
import type { SpecForm } from "./spec-form";

export function useLiveResult(form: SpecForm, initialSpec: InstrumentSpec) {
  const values = useWatch({ control: form.control });
  const parsed = useMemo(() => instrumentSpecSchema.safeParse(values), [values]);
  const result = useMemo(() => (parsed.success ? computeSpec(parsed.data) : null), [parsed]);
  const [lastGood, setLastGood] = useState(() => computeSpec(initialSpec));
  useEffect(() => {
    if (result) setLastGood(result);
  }, [result]);
  /** `result` is null while the form is invalid; `shown` is what to display meanwhile. */
  return { values, parsed, result, shown: result ?? lastGood };
}
