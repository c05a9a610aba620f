"use client";

// Inputs of the setup form: ids from field paths, and a number input in a table cell whose label
// is for screen readers (the column header says it for the eye).
import { get, useFormState, type Control, type FieldPath, type UseFormRegister } from "react-hook-form";
import { parseNumberInput } from "@/components/build-math/spec-form-fields";
import { Input } from "@/components/ui/input";
import type { SetupSheet } from "@/lib/schemas/setup-sheet";

/** The DOM id of a field ("strings.2.actionAt12Mm" → "setup-strings-2-actionAt12Mm"); the checks link to it. */
export const setupFieldId = (path: string) => `setup-${path.replace(/\./g, "-")}`;

export function useSetupError(control: Control<SetupSheet>, name: FieldPath<SetupSheet>): string | undefined {
  const { errors } = useFormState({ control, name });
  return (get(errors, name) as { message?: string } | undefined)?.message;
}

interface NumberCellProps {
  control: Control<SetupSheet>;
  register: UseFormRegister<SetupSheet>;
  name: FieldPath<SetupSheet>;
  label: string;
  optional?: boolean;
  /** Show the label above the input (outside a table). */
  visibleLabel?: boolean;
  /** A warning from the common-practice checks for this field. */
  warning?: string;
}

export function NumberCell({ control, register, name, label, optional = false, visibleLabel = false, warning }: NumberCellProps) {
  const error = useSetupError(control, name);
  const id = setupFieldId(name);
  return (
    <div>
      <label htmlFor={id} className={visibleLabel ? "mb-1 block text-xs font-semibold uppercase tracking-wider text-graphite-700" : "sr-only"}>
        {label}
      </label>
      <Input
        id={id}
        inputMode="decimal"
        autoComplete="off"
        className={`h-9 min-w-16 max-w-24 px-2 text-right font-mono ${warning && !error ? "border-amber-500 bg-amber-50" : ""}`}
        aria-invalid={error ? true : undefined}
        aria-describedby={`${id}-error`}
        {...register(name, { setValueAs: (v: unknown) => parseNumberInput(v, optional) })}
      />
      <p id={`${id}-error`} role={error ? "alert" : undefined} aria-live="polite" className="mt-0.5 max-w-40 text-2xs font-medium text-ember-600">
        {error}
      </p>
    </div>
  );
}
