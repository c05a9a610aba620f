import type { ReactNode } from "react";
import { AppHeader } from "@/components/app-header";
import { SiteFooter } from "@/components/site-footer";
import { requireUserPage } from "@/lib/auth/pages";
import { listMembershipsForUser } from "@/lib/data/memberships";

// Signed-in pages: the header with the workshop switcher. Each page below checks its own access.
export default async function AppLayout({ children }: { children: ReactNode }) {
  const user = await requireUserPage("/workshops");
  const memberships = await listMembershipsForUser(user.id);
  return (
    <div className="flex min-h-dvh flex-col">
      <AppHeader user={user} memberships={memberships} />
      <main id="main" className="flex-1">
        {children}
      </main>
      <SiteFooter />
    </div>
  );
}
