import Link from "next/link";
import type { ReactNode } from "react";
import { BrandMark } from "./brand-mark";

/** The signed-out header: the mark, the product name and whatever links the layout passes. */
export function SiteHeader({ children }: { children?: ReactNode }) {
  return (
    <header className="border-b border-spruce-200 bg-spruce-50/90 backdrop-blur">
      <div className="mx-auto flex max-w-6xl items-center justify-between gap-4 px-4 py-3 sm:px-6">
        <Link href="/" className="flex items-center gap-2 rounded-chip">
          <BrandMark />
          <span className="font-display text-xl font-semibold tracking-tight text-graphite-900">Scalewright</span>
        </Link>
        <nav aria-label="Main" className="flex items-center gap-1 text-sm sm:gap-3">
          {children}
        </nav>
      </div>
    </header>
  );
}
