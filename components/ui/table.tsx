import type { HTMLAttributes, TdHTMLAttributes, ThHTMLAttributes } from "react";
import { cx } from "@/lib/ui/cx";

/** Scrolls sideways on a phone instead of squeezing columns. */
export function Table({ className, caption, children, ...rest }: HTMLAttributes<HTMLTableElement> & { caption?: string }) {
  return (
    <div className="relative overflow-x-auto rounded-panel border border-spruce-200 bg-white">
      <table className={cx("w-full border-collapse text-sm", className)} {...rest}>
        {caption ? <caption className="sr-only">{caption}</caption> : null}
        {children}
      </table>
    </div>
  );
}

export function THead(props: HTMLAttributes<HTMLTableSectionElement>) {
  return <thead className="bg-spruce-100 text-left text-2xs uppercase tracking-wider text-graphite-700" {...props} />;
}

export function TBody(props: HTMLAttributes<HTMLTableSectionElement>) {
  return <tbody className="divide-y divide-spruce-100" {...props} />;
}

export function Th({ className, ...rest }: ThHTMLAttributes<HTMLTableCellElement>) {
  return <th scope="col" className={cx("px-3 py-2 font-semibold whitespace-nowrap", className)} {...rest} />;
}

export function Td({ className, numeric, ...rest }: TdHTMLAttributes<HTMLTableCellElement> & { numeric?: boolean }) {
  return <td className={cx("px-3 py-2 align-top", numeric && "text-right font-mono tabular", className)} {...rest} />;
}
