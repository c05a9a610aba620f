"use client";

// Small pieces of the spec form: ids from field paths, error lookup, and a number input that turns
// "" into undefined (optional) or NaN (required, so the schema names the field), and accepts 25,5.
import { createContext, useContext } from "react";
import { get, useFormState, type FieldPath } from "react-hook-form";
import { Field } from "@/components/ui/field";
import { Input } from "@/components/ui/input";
import type { InstrumentSpec, SpecIssue } from "@/lib/schemas/instrument-spec";
import type { SpecForm } from "./spec-form";

/** The DOM id of a field, from its path ("strings.2.gaugeIn" → "spec-strings-2-gaugeIn"). */
export function fieldId(path: string): string {
  return `spec-${path.replace(/\./g, "-")}`;
}

/** The message of the error at `name`, if any (array-level errors live on `.message` or `.root`). */
export function useFieldError(form: SpecForm, name: FieldPath<InstrumentSpec>): string | undefined {
  const { errors } = useFormState({ control: form.control, name });
  const e = get(errors, name) as { message?: string; root?: { message?: string } } | undefined;
  return e?.message ?? e?.root?.message;
}

/**
 * The computed result's issues by field path, so a field can show its own warning or error beside
 * the schema's (SpecFormFields provides it when given `issues`; without it fields show none).
 */
export const ComputedIssuesContext = createContext<ReadonlyMap<string, SpecIssue> | null>(null);

/** The most serious computed issue at `path` (errors before warnings), if any. */
export function useComputedIssue(path: string): SpecIssue | undefined {
  return useContext(ComputedIssuesContext)?.get(path);
}

/** Issues by path, the first error (else the first warning) kept for each. */
export function issuesByPath(issues: readonly SpecIssue[]): Map<string, SpecIssue> {
  const out = new Map<string, SpecIssue>();
  for (const i of issues) {
    const had = out.get(i.path);
    if (i.path && (!had || (had.level === "warning" && i.level === "error"))) out.set(i.path, i);
  }
  return out;
}

/** Takes the builder to a field by its path (from an issue's "go to field"), focused and in view. */
export function focusSpecField(form: SpecForm, path: string): void {
  form.setFocus(path as FieldPath<InstrumentSpec>);
  const el = document.getElementById(fieldId(path));
  if (el && document.activeElement !== el) el.focus();
  el?.scrollIntoView({ block: "center", behavior: "smooth" });
}

export function parseNumberInput(v: unknown, optional: boolean): number | undefined {
  if (typeof v === "number") return v;
  const text = String(v ?? "").trim();
  if (text === "") return optional ? undefined : Number.NaN;
  return Number(text.replace(",", "."));
}

interface InputFieldProps {
  form: SpecForm;
  name: FieldPath<InstrumentSpec>;
  label: string;
  hint?: string;
  /** A number input; empty means "not given" when `optional`. */
  number?: boolean;
  optional?: boolean;
  /** In a table row: the label is for screen readers only, and the control is compact. */
  compact?: boolean;
  placeholder?: string;
}

/** A registered input with its label, hint and error. The SSR HTML carries the default value too. */
export function InputField({ form, name, label, hint, number = false, optional = false, compact = false, placeholder }: InputFieldProps) {
  const error = useFieldError(form, name);
  const computed = useComputedIssue(name);
  const id = fieldId(name);
  const issueTone = computed?.level === "error" ? "text-ember-600" : "text-amber-700";
  const initial = get(form.formState.defaultValues, name) as string | number | undefined;
  const input = (
    <Input
      id={id}
      inputMode={number ? "decimal" : undefined}
      autoComplete="off"
      placeholder={placeholder}
      defaultValue={initial ?? ""}
      className={compact ? "h-9 min-w-16 px-2" : undefined}
      aria-invalid={error ? true : undefined}
      aria-describedby={`${id}-hint ${id}-error`}
      {...form.register(name, number ? { setValueAs: (v: unknown) => parseNumberInput(v, optional) } : undefined)}
    />
  );
  if (!compact) {
    return (
      <Field id={id} label={label} hint={computed ? <span className={`font-medium ${issueTone}`} data-issue={computed.level}>{computed.message}</span> : hint} error={error}>
        {input}
      </Field>
    );
  }
  return (
    <div>
      <label htmlFor={id} className="sr-only">
        {label}
      </label>
      {input}
      <p id={`${id}-hint`} className="sr-only">
        {hint}
        {computed ? ` ${computed.message}` : null}
      </p>
      {computed && !error ? (
        <p className={`mt-0.5 text-2xs font-semibold uppercase ${issueTone}`} title={computed.message} data-issue={computed.level} aria-hidden>
          {computed.level}
        </p>
      ) : null}
      <p id={`${id}-error`} role={error ? "alert" : undefined} aria-live="polite" className="mt-0.5 text-2xs font-medium text-ember-600">
        {error}
      </p>
    </div>
  );
}

export function NumberField(props: Omit<InputFieldProps, "number">) {
  return <InputField {...props} number />;
}
