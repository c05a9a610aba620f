import Link from "next/link";
import type { ReactNode } from "react";
import { buttonClasses } from "@/components/ui/button";
import { SiteFooter } from "@/components/site-footer";
import { SiteHeader } from "@/components/site-header";

// Signing in, signing up, resetting a password, accepting an invitation: one narrow column.
export default function AuthLayout({ children }: { children: ReactNode }) {
  return (
    <div className="flex min-h-dvh flex-col">
      <SiteHeader>
        <Link href="/" className={buttonClasses("ghost", "sm")}>
          Home
        </Link>
      </SiteHeader>
      <main id="main" className="flex-1 px-4 py-10 sm:py-16">
        <div className="mx-auto w-full max-w-md">{children}</div>
      </main>
      <SiteFooter />
    </div>
  );
}
