import { notFound } from "next/navigation";
import type { ReactNode } from "react";
import { CommissionHeader } from "@/components/commissions/commission-header";
import { COMMISSION_TABS } from "@/components/commissions/commission-tabs";
import { WorkshopNav } from "@/components/workshop-nav";
import { requireWorkshopPage } from "@/lib/auth/pages";
import { getCommissionSummary } from "@/lib/data/commissions";
import { AppError } from "@/lib/http/errors";
import { idParamSchema } from "@/lib/schemas/ids";

// One commission: its header and its tabs (components/commissions/commission-tabs.ts). A
// commission the caller may not see is the 404 page, the same as one that does not exist.
export default async function CommissionLayout({ children, params }: { children: ReactNode; params: Promise<{ workshop: string; id: string }> }) {
  const { workshop: slug, id: raw } = await params;
  const ctx = await requireWorkshopPage(slug, "commission.read", `/${slug}/commissions/${raw}`);
  const parsed = idParamSchema.safeParse(raw);
  if (!parsed.success) notFound();
  const summary = await getCommissionSummary(ctx.scope, parsed.data).catch((err: unknown) => {
    if (err instanceof AppError && err.code === "not_found") notFound();
    throw err;
  });
  const base = `/${slug}/commissions/${summary.id}`;
  const tabs = COMMISSION_TABS.filter((t) => ctx.can(t.permission)).map((t) => ({ href: t.segment ? `${base}/${t.segment}` : base, label: t.label }));
  return (
    <div className="space-y-4">
      <CommissionHeader slug={slug} initial={summary} showClient={ctx.membership.role !== "client"} />
      <WorkshopNav links={tabs} label="Commission" />
      <div className="pt-2">{children}</div>
    </div>
  );
}
