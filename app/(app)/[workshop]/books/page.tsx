import type { Metadata } from "next";
import { Suspense } from "react";
import { Loading } from "@/components/commissions/query-states";
import { requireWorkshopPage } from "@/lib/auth/pages";
import { monthOf } from "@/lib/books/months";
import { LedgerClient } from "./ledger-client";

export const metadata: Metadata = { title: "Ledger" };

// The payments ledger: rows from GET /api/workshops/[workshop]/books/ledger in the browser; the
// filters, sort and page live in the address bar.
export default async function LedgerPage({ params }: { params: Promise<{ workshop: string }> }) {
  const { workshop: slug } = await params;
  await requireWorkshopPage(slug, "ledger.read", `/${slug}/books`);
  return (
    <div className="space-y-4">
      <div>
        <h2 className="text-xl font-semibold">Payments ledger</h2>
        <p className="text-sm text-graphite-600">
          Every deposit, balance and refund with its gross amount, the processor&apos;s fee and the net, dated when the money moved (UTC). Refunds count negative; the
          totals add up the settled entries of every page.
        </p>
      </div>
      <Suspense fallback={<Loading label="Loading the ledger…" />}>
        <LedgerClient slug={slug} currentMonth={monthOf(new Date())} />
      </Suspense>
    </div>
  );
}
