"use client";

import Link from "next/link";
import { useSelectedLayoutSegment } from "next/navigation";
import { useEffect, useRef } from "react";
import { ROLE_LABELS, type Role } from "@/lib/auth/permissions";
import { cx } from "@/lib/ui/cx";

/**
 * The workshop switcher: the current workshop's name, opening a list of every workshop the person
 * belongs to (with their role there) and a way to create one. A native <details>, so it works
 * with the keyboard and before any script has loaded.
 */
export function WorkshopSwitcher({ memberships }: { memberships: Array<{ workshop: { slug: string; name: string }; role: Role }> }) {
  const segment = useSelectedLayoutSegment();
  const current = memberships.find((m) => m.workshop.slug === segment);
  const ref = useRef<HTMLDetailsElement>(null);

  // Close after navigating.
  useEffect(() => {
    if (ref.current) ref.current.open = false;
  }, [segment]);

  return (
    <details ref={ref} className="relative">
      <summary
        className="flex max-w-[14rem] cursor-pointer list-none items-center gap-2 rounded-chip border border-spruce-300 bg-white px-3 py-1.5 text-sm font-semibold hover:bg-spruce-100 sm:max-w-xs"
        aria-label="Switch workshop"
      >
        <span className="truncate">{current ? current.workshop.name : "Your workshops"}</span>
        <span aria-hidden className="text-graphite-500">
          ▾
        </span>
      </summary>
      <div className="absolute left-0 z-40 mt-1 w-72 rounded-panel border border-spruce-200 bg-white p-1 shadow-lift">
        <ul>
          {memberships.map((m) => (
            <li key={m.workshop.slug}>
              <Link
                href={`/${m.workshop.slug}`}
                aria-current={m === current ? "page" : undefined}
                className={cx("flex items-center justify-between gap-2 rounded-chip px-3 py-2 text-sm hover:bg-spruce-100", m === current && "bg-spruce-100 font-semibold")}
              >
                <span className="truncate">{m.workshop.name}</span>
                <span className="shrink-0 text-2xs uppercase tracking-wider text-graphite-500">{ROLE_LABELS[m.role]}</span>
              </Link>
            </li>
          ))}
        </ul>
        <div className="mt-1 border-t border-spruce-100 pt-1">
          <Link href="/workshops/new" className="block rounded-chip px-3 py-2 text-sm text-rosewood-700 hover:bg-rosewood-50">
            + Create a workshop
          </Link>
        </div>
      </div>
    </details>
  );
}
