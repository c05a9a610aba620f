import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { SafetyCaution } from "@/components/build-math/safety-caution";
import { requireWorkshopPage } from "@/lib/auth/pages";
import { idParamSchema } from "@/lib/schemas/ids";
import { SpecClient } from "./spec-client";

export const metadata: Metadata = { title: "Spec" };

// The commission's spec: the workshop drafts versions and sends one to the client; the client
// reads what was sent, sees what changed since their last approval, and approves.
export default async function CommissionSpecPage({ params }: { params: Promise<{ workshop: string; id: string }> }) {
  const { workshop: slug, id: raw } = await params;
  const { workshop, can } = await requireWorkshopPage(slug, "spec.read", `/${slug}/commissions/${raw}/spec`);
  const id = idParamSchema.safeParse(raw);
  if (!id.success) notFound();
  return (
    <div className="space-y-5">
      <SafetyCaution />
      <SpecClient slug={slug} id={id.data} unit={workshop.unitPreference} canDraft={can("spec.draft")} canApprove={can("spec.approve")} />
    </div>
  );
}
