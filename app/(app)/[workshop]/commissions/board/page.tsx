import type { Metadata } from "next";
import { Suspense } from "react";
import { Loading } from "@/components/commissions/query-states";
import { requireWorkshopPage } from "@/lib/auth/pages";
import { BoardClient } from "./board-client";

export const metadata: Metadata = { title: "Board" };

// Commissions by stage, for the people who move them: the owner sees every one, a builder theirs
// (the API narrows by role).
export default async function BoardPage({ params }: { params: Promise<{ workshop: string }> }) {
  const { workshop: slug } = await params;
  const { membership } = await requireWorkshopPage(slug, "commission.advance", `/${slug}/commissions/board`);
  return (
    <div className="space-y-4">
      <div>
        <h2 className="text-xl font-semibold">Board</h2>
        <p className="text-sm text-graphite-600">
          {membership.role === "owner" ? "Every open commission by stage, along the workshop's stage line." : "Your commissions by stage, along the workshop's stage line."}
        </p>
      </div>
      <Suspense fallback={<Loading label="Loading the board…" />}>
        <BoardClient slug={slug} canFilterBuilder={membership.role === "owner"} />
      </Suspense>
    </div>
  );
}
