import type { HTMLAttributes } from "react";
import { cx } from "@/lib/ui/cx";

export type AlertTone = "info" | "success" | "warning" | "error";

const TONES: Record<AlertTone, string> = {
  info: "border-graphite-300 bg-white text-graphite-800",
  success: "border-moss-500 bg-moss-50 text-moss-700",
  warning: "border-amber-500 bg-amber-50 text-amber-700",
  error: "border-ember-500 bg-ember-50 text-ember-700",
};

/** A message block inside a page or form; errors are announced at once, others politely. */
export function Alert({ tone = "info", className, children, ...rest }: HTMLAttributes<HTMLDivElement> & { tone?: AlertTone }) {
  return (
    <div
      role={tone === "error" ? "alert" : "status"}
      className={cx("rounded-chip border-l-4 px-3 py-2 text-sm", TONES[tone], className)}
      {...rest}
    >
      {children}
    </div>
  );
}
