import type { Metadata } from "next";
import Link from "next/link";
import { Suspense } from "react";
import { Loading } from "@/components/commissions/query-states";
import { buttonClasses } from "@/components/ui/button";
import { requireWorkshopPage } from "@/lib/auth/pages";
import { CommissionsClient } from "./commissions-client";

export const metadata: Metadata = { title: "Commissions" };

// The commissions table: the rows come from GET /api/workshops/[workshop]/commissions in the
// browser; the view (filters, search, sort, page) lives in the address bar.
export default async function CommissionsPage({ params }: { params: Promise<{ workshop: string }> }) {
  const { workshop: slug } = await params;
  const { membership, can } = await requireWorkshopPage(slug, "commission.read", `/${slug}/commissions`);
  const isClient = membership.role === "client";
  return (
    <div className="space-y-5">
      <div className="flex flex-wrap items-center justify-between gap-3">
        <div>
          <h2 className="text-xl font-semibold">{isClient ? "Your commissions" : "Commissions"}</h2>
          <p className="text-sm text-graphite-600">
            {isClient
              ? "Every instrument you have asked this workshop to build, and where each one stands."
              : membership.role === "builder"
                ? "The commissions assigned to you."
                : "Every commission of the workshop."}
          </p>
        </div>
        {can("commission.create") ? (
          <Link href={`/${slug}/commissions/new`} className={buttonClasses("primary")}>
            {isClient ? "Ask for a new instrument" : "Open a commission"}
          </Link>
        ) : null}
      </div>
      <Suspense fallback={<Loading label="Loading commissions…" />}>
        <CommissionsClient
          slug={slug}
          showClient={!isClient}
          showBuilderFilter={membership.role === "owner" || membership.role === "bookkeeper"}
          peopleSource={can("commission.write") ? "commission-people" : can("member.read") ? "members" : null}
        />
      </Suspense>
    </div>
  );
}
