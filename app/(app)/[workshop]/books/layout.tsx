import type { ReactNode } from "react";
import { WorkshopNav } from "@/components/workshop-nav";
import { requireWorkshopPage } from "@/lib/auth/pages";

// The books of a workshop (owner and bookkeeper): ledger, reconciliation with the processor, held and
// earned money, the monthly summary. Each page checks its own permission as well.
export default async function BooksLayout({ children, params }: { children: ReactNode; params: Promise<{ workshop: string }> }) {
  const { workshop: slug } = await params;
  await requireWorkshopPage(slug, "ledger.read", `/${slug}/books`);
  const base = `/${slug}/books`;
  const links = [
    { href: base, label: "Ledger" },
    { href: `${base}/reconciliation`, label: "Reconciliation" },
    { href: `${base}/held`, label: "Held and earned" },
    { href: `${base}/summary`, label: "Monthly summary" },
  ];
  return (
    <div className="space-y-5">
      <WorkshopNav links={links} label="Books" />
      {children}
    </div>
  );
}
