import Link from "next/link";
import type { Role } from "@/lib/auth/permissions";
import { buttonClasses } from "@/components/ui/button";
import { BrandMark } from "./brand-mark";
import { SignOutButton } from "./sign-out-button";
import { WorkshopSwitcher } from "./workshop-switcher";

/** The signed-in header: the mark, the workshop switcher, the account and sign-out. */
export function AppHeader({ user, memberships }: { user: { name: string }; memberships: Array<{ workshop: { slug: string; name: string }; role: Role }> }) {
  return (
    <header className="border-b border-spruce-200 bg-spruce-50/90 backdrop-blur">
      <div className="mx-auto flex max-w-6xl flex-wrap items-center justify-between gap-3 px-4 py-3 sm:px-6">
        <div className="flex min-w-0 items-center gap-3">
          <Link href="/workshops" className="flex items-center gap-2 rounded-chip" aria-label="Scalewright: your workshops">
            <BrandMark />
            <span className="hidden font-display text-xl font-semibold tracking-tight text-graphite-900 sm:inline">Scalewright</span>
          </Link>
          <WorkshopSwitcher memberships={memberships} />
        </div>
        <nav aria-label="Account" className="flex items-center gap-1 text-sm sm:gap-2">
          <Link href="/account" className={buttonClasses("ghost", "sm")}>
            {user.name}
          </Link>
          <SignOutButton />
        </nav>
      </div>
    </header>
  );
}
