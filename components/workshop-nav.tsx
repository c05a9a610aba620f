"use client";

import Link from "next/link";
import { usePathname } from "next/navigation";
import { cx } from "@/lib/ui/cx";

/** The workshop's section links (or another named set, e.g. a commission's tabs); the current one is marked for the eye and for screen readers. */
export function WorkshopNav({ links, label = "Workshop" }: { links: Array<{ href: string; label: string }>; label?: string }) {
  const pathname = usePathname();
  return (
    <nav aria-label={label} className="-mb-px flex gap-1 overflow-x-auto pt-2">
      {links.map((l) => {
        const current = pathname === l.href;
        return (
          <Link
            key={l.href}
            href={l.href}
            aria-current={current ? "page" : undefined}
            className={cx(
              "whitespace-nowrap border-b-2 px-3 py-2 text-sm font-semibold",
              current ? "border-rosewood-700 text-rosewood-800" : "border-transparent text-graphite-600 hover:text-graphite-900",
            )}
          >
            {l.label}
          </Link>
        );
      })}
    </nav>
  );
}
