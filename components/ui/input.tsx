import { forwardRef, type InputHTMLAttributes } from "react";
import { cx } from "@/lib/ui/cx";

export const controlClasses =
  "block w-full rounded-chip border border-spruce-300 bg-white px-3 text-sm text-graphite-900 placeholder:text-graphite-400 " +
  "focus:border-brass-500 aria-[invalid=true]:border-ember-500 aria-[invalid=true]:bg-ember-50 disabled:bg-spruce-100";

export const Input = forwardRef<HTMLInputElement, InputHTMLAttributes<HTMLInputElement>>(function Input(
  { className, ...rest },
  ref,
) {
  return <input ref={ref} className={cx(controlClasses, "h-10", className)} {...rest} />;
});

export const Textarea = forwardRef<HTMLTextAreaElement, React.TextareaHTMLAttributes<HTMLTextAreaElement>>(
  function Textarea({ className, ...rest }, ref) {
    return <textarea ref={ref} className={cx(controlClasses, "min-h-24 py-2", className)} {...rest} />;
  },
);
