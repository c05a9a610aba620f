"use client";

import Link from "next/link";
import { usePathname } from "next/navigation";
import { currentLink } from "@/lib/ui/current-link";
import { cx } from "@/lib/ui/cx";

/**
 * The workshop's section links (or another named set, e.g. a commission's tabs). The section the
 * page sits in is marked for the eye; the link to the page itself also for screen readers.
 */
export function WorkshopNav({ links, label = "Workshop" }: { links: Array<{ href: string; label: string }>; label?: string }) {
  const pathname = usePathname();
  const current = currentLink(pathname, links.map((l) => l.href));
  return (
    <nav aria-label={label} className="-mb-px flex gap-0.5 overflow-x-auto pt-2 sm:gap-1">
      {links.map((l) => {
        const marked = l.href === current;
        return (
          <Link
            key={l.href}
            href={l.href}
            aria-current={marked ? (pathname === l.href ? "page" : "true") : undefined}
            className={cx(
              "whitespace-nowrap border-b-2 px-2 py-2 text-sm font-semibold sm:px-3",
              marked ? "border-rosewood-700 text-rosewood-800" : "border-transparent text-graphite-600 hover:text-graphite-900",
            )}
          >
            {l.label}
          </Link>
        );
      })}
    </nav>
  );
}
