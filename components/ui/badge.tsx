import type { HTMLAttributes } from "react";
import { cx } from "@/lib/ui/cx";

export type BadgeTone = "neutral" | "primary" | "accent" | "success" | "warning" | "danger";

const TONES: Record<BadgeTone, string> = {
  neutral: "bg-graphite-100 text-graphite-800 ring-graphite-200",
  primary: "bg-rosewood-50 text-rosewood-800 ring-rosewood-200",
  accent: "bg-brass-50 text-brass-800 ring-brass-200",
  success: "bg-moss-50 text-moss-700 ring-moss-100",
  warning: "bg-amber-50 text-amber-700 ring-amber-100",
  danger: "bg-ember-50 text-ember-700 ring-ember-100",
};

export function Badge({ tone = "neutral", className, ...rest }: HTMLAttributes<HTMLSpanElement> & { tone?: BadgeTone }) {
  return (
    <span
      className={cx("inline-flex items-center gap-1 rounded-chip px-2 py-0.5 text-2xs font-semibold uppercase tracking-wider ring-1 ring-inset", TONES[tone], className)}
      {...rest}
    />
  );
}
