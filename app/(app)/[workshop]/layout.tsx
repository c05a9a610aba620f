import type { ReactNode } from "react";
import { QueryProvider } from "@/components/query-provider";
import { Badge } from "@/components/ui/badge";
import { WorkshopNav } from "@/components/workshop-nav";
import { requireWorkshopPage } from "@/lib/auth/pages";
import { ROLE_LABELS } from "@/lib/auth/permissions";
import { getWorkshopLogoPath } from "@/lib/data/workshop-logo";

// Every page of one workshop. Membership is checked here once per request (cached for the pages
// below, which still check their own permission: layouts are not re-run on every navigation).
export default async function WorkshopLayout({ children, params }: { children: ReactNode; params: Promise<{ workshop: string }> }) {
  const { workshop: slug } = await params;
  const { workshop, membership, can, scope } = await requireWorkshopPage(slug);
  const logoUrl = await getWorkshopLogoPath(scope, workshop.slug);
  const links = [
    { href: `/${workshop.slug}`, label: "Home" },
    ...(can("commission.read") ? [{ href: `/${workshop.slug}/commissions`, label: "Commissions" }] : []),
    ...(can("commission.advance") ? [{ href: `/${workshop.slug}/commissions/board`, label: "Board" }] : []),
    ...(can("member.names") ? [{ href: `/${workshop.slug}/members`, label: "Members" }] : []),
    // A client reads their sheet on the commission's Setup tab; the workshop-wide queue is for staff.
    ...(can("setup.read") && scope.role !== "client" ? [{ href: `/${workshop.slug}/setup`, label: "Final setup" }] : []),
    ...(can("overview.read") ? [{ href: `/${workshop.slug}/overview`, label: "Overview" }] : []),
    ...(can("ledger.read") ? [{ href: `/${workshop.slug}/books`, label: "Books" }] : []),
    ...(can("cohort.read") ? [{ href: `/${workshop.slug}/cohorts`, label: "Cohorts" }] : []),
    ...(can("settings.manage") ? [{ href: `/${workshop.slug}/settings`, label: "Settings" }] : []),
  ];
  return (
    <div className="mx-auto max-w-6xl px-4 py-6 sm:px-6">
      <div className="flex flex-wrap items-end justify-between gap-3 border-b border-spruce-200 pb-3">
        <div className="flex min-w-0 items-center gap-3">
          {logoUrl ? (
            // A plain img: the bytes come from the authorised logo route, which image optimisation would bypass.
            <img src={logoUrl} alt="" data-testid="workshop-logo" className="size-12 shrink-0 rounded-chip border border-spruce-200 bg-white object-contain p-1 sm:size-14" />
          ) : null}
          <div className="min-w-0">
            <p className="text-xs font-semibold uppercase tracking-[0.2em] text-rosewood-700">Workshop</p>
            <h1 className="text-2xl font-semibold sm:text-3xl">{workshop.name}</h1>
          </div>
        </div>
        <Badge tone={membership.role === "owner" ? "primary" : "neutral"}>You: {ROLE_LABELS[membership.role]}</Badge>
      </div>
      <WorkshopNav links={links} />
      <div className="pt-6">
        <QueryProvider>{children}</QueryProvider>
      </div>
    </div>
  );
}
