import { forwardRef, type SelectHTMLAttributes } from "react";
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
