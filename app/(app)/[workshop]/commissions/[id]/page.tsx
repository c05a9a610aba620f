import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { requireWorkshopPage } from "@/lib/auth/pages";
import { idParamSchema } from "@/lib/schemas/ids";
import { OverviewClient } from "./overview-client";

export const metadata: Metadata = { title: "Commission" };

// A commission's overview: the stage line, the moves open to the caller, the timeline, the details
// and the comments, all from the commission routes in the browser. The layout has checked access.
export default async function CommissionOverviewPage({ params }: { params: Promise<{ workshop: string; id: string }> }) {
  const { workshop: slug, id: raw } = await params;
  const { user, membership, can } = await requireWorkshopPage(slug, "commission.read", `/${slug}/commissions/${raw}`);
  const id = idParamSchema.safeParse(raw);
  if (!id.success) notFound();
  return (
    <OverviewClient
      slug={slug}
      id={id.data}
      me={user.id}
      isClient={membership.role === "client"}
      isOwner={membership.role === "owner"}
      canWrite={can("commission.write")}
      canSignOff={can("commission.signoff")}
    />
  );
}
