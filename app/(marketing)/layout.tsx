import Link from "next/link";
import type { ReactNode } from "react";
import { buttonClasses } from "@/components/ui/button";
import { SiteFooter } from "@/components/site-footer";
import { SiteHeader } from "@/components/site-header";

export default function MarketingLayout({ children }: { children: ReactNode }) {
  return (
    <div className="flex min-h-dvh flex-col">
      <SiteHeader>
        <Link href="/calculator" className={buttonClasses("ghost", "sm")}>
          Calculator
        </Link>
        <Link href="/sign-in" className={buttonClasses("secondary", "sm")}>
          Sign in
        </Link>
      </SiteHeader>
      <main id="main" className="flex-1">
        {children}
      </main>
      <SiteFooter />
    </div>
  );
}
