import type { ReactNode } from "react";

export interface FieldProps {
  id: string;
  label: ReactNode;
  hint?: ReactNode;
  error?: string;
  children: ReactNode;
  className?: string;
}

/** A label, the control, an optional hint and an error announced to screen readers. */
export function Field({ id, label, hint, error, children, className }: FieldProps) {
  return (
    <div className={className}>
      <label htmlFor={id} className="mb-1 block text-xs font-semibold uppercase tracking-wider text-graphite-700">
        {label}
      </label>
      {children}
      {hint && !error ? (
        <p id={`${id}-hint`} className="mt-1 text-xs text-graphite-500">
          {hint}
        </p>
      ) : null}
      <p id={`${id}-error`} role={error ? "alert" : undefined} aria-live="polite" className="mt-1 min-h-0 text-xs font-medium text-ember-600">
        {error}
      </p>
    </div>
  );
}

/** aria-* props linking a control to its Field's hint and error. */
export function describedBy(id: string, error?: string) {
  return { "aria-invalid": error ? true : undefined, "aria-describedby": `${id}-hint ${id}-error` } as const;
}
