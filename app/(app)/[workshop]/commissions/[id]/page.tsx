import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { stagePhotoStrips } from "@/components/photos/stage-photos";
import { requireWorkshopPage } from "@/lib/auth/pages";
import { getSignedSetupSummary } from "@/lib/data/setup-sheets";
import { AppError } from "@/lib/http/errors";
import { idParamSchema } from "@/lib/schemas/ids";
import { OverviewClient } from "./overview-client";

export const metadata: Metadata = { title: "Commission" };

// A commission's overview: the stage line, the moves open to the caller, the timeline, the details
// and the comments, all from the commission routes in the browser; the stage photos in the
// timeline and the signed setup sheet's summary are read here, as the caller may see them. The
// layout has checked access.
export default async function CommissionOverviewPage({ params }: { params: Promise<{ workshop: string; id: string }> }) {
  const { workshop: slug, id: raw } = await params;
  const ctx = await requireWorkshopPage(slug, "commission.read", `/${slug}/commissions/${raw}`);
  const id = idParamSchema.safeParse(raw);
  if (!id.success) notFound();
  const base = `/${slug}/commissions/${id.data}`;
  const tab = (segment: string, allowed: boolean) => (allowed ? `${base}/${segment}` : null);
  const tabs = { spec: tab("spec", ctx.can("spec.read")), payments: tab("payments", ctx.can("payment.read")), photos: tab("photos", ctx.can("photo.read")), setup: tab("setup", ctx.can("setup.read")) };
  const [photos, setup] = await Promise.all([
    tabs.photos ? stagePhotoStrips(ctx, id.data, tabs.photos) : [],
    tabs.setup ? getSignedSetupSummary(ctx.scope, id.data) : null,
  ]).catch((err: unknown) => {
    if (err instanceof AppError && err.code === "not_found") notFound();
    throw err;
  });
  const { user, membership, can } = ctx;
  return (
    <OverviewClient
      slug={slug}
      id={id.data}
      me={user.id}
      isClient={membership.role === "client"}
      isOwner={membership.role === "owner"}
      canWrite={can("commission.write")}
      canSignOff={can("commission.signoff")}
      tabs={tabs}
      photos={photos}
      setup={setup}
    />
  );
}
