import { forwardRef, type InputHTMLAttributes, type ReactNode } from "react";
import { describedBy, Field } from "@/components/ui/field";
import { Input } from "@/components/ui/input";

export interface TextFieldProps extends InputHTMLAttributes<HTMLInputElement> {
  id: string;
  label: ReactNode;
  hint?: ReactNode;
  error?: string;
}

/** A labelled input with its hint and error wired for screen readers (for react-hook-form's register()). */
export const TextField = forwardRef<HTMLInputElement, TextFieldProps>(function TextField({ id, label, hint, error, className, ...rest }, ref) {
  return (
    <Field id={id} label={label} hint={hint} error={error} className={className}>
      <Input ref={ref} id={id} {...describedBy(id, error)} {...rest} />
    </Field>
  );
});
