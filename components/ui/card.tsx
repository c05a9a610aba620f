import type { HTMLAttributes, ReactNode } from "react";
import { cx } from "@/lib/ui/cx";

export function Card({ className, ...rest }: HTMLAttributes<HTMLElement>) {
  return <section className={cx("rounded-panel border border-spruce-200 bg-white shadow-panel", className)} {...rest} />;
}

export function CardHeader({ title, action, subtitle }: { title: ReactNode; subtitle?: ReactNode; action?: ReactNode }) {
  return (
    <header className="flex flex-wrap items-start justify-between gap-3 border-b border-spruce-100 px-5 py-4">
      <div>
        <h2 className="text-lg font-semibold">{title}</h2>
        {subtitle ? <p className="mt-0.5 text-xs text-graphite-500">{subtitle}</p> : null}
      </div>
      {action}
    </header>
  );
}

export function CardBody({ className, ...rest }: HTMLAttributes<HTMLDivElement>) {
  return <div className={cx("px-5 py-4", className)} {...rest} />;
}
