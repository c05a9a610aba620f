import { forwardRef, type ReactNode, type SelectHTMLAttributes } from "react";
import { cx } from "@/lib/ui/cx";
import { controlClasses } from "./input";

export interface SelectOption {
  value: string;
  label: string;
}

export interface SelectProps extends SelectHTMLAttributes<HTMLSelectElement> {
  options?: SelectOption[];
}

/** A native select (accessible and phone-friendly) in the shop's look. */
export const Select = forwardRef<HTMLSelectElement, SelectProps>(function Select({ className, options, children, ...rest }, ref) {
  return (
    <select ref={ref} className={cx(controlClasses, "h-10 pr-8", className)} {...rest}>
      {options?.map((o) => (
        <option key={o.value} value={o.value}>
          {o.label}
        </option>
      ))}
      {children}
    </select>
  );
});

/** A select with its label above, for filter bars: each change is reported as the new value. */
export function LabelledSelect({ id, label, value, onChange, children }: { id: string; label: string; value: string; onChange: (v: string) => void; children: ReactNode }) {
  return (
    <div>
      <label htmlFor={id} className="mb-1 block text-xs font-semibold uppercase tracking-wider text-graphite-700">
        {label}
      </label>
      <Select id={id} value={value} onChange={(e) => onChange(e.target.value)}>
        {children}
      </Select>
    </div>
  );
}
