import type { Metadata } from "next";
import { Card, CardBody, CardHeader } from "@/components/ui/card";
import { requireWorkshopPage } from "@/lib/auth/pages";
import { NewCommissionForm } from "./new-commission-form";

export const metadata: Metadata = { title: "New commission" };

// Open a commission: the owner or a builder for a client of the workshop; a client asks for an
// instrument for themselves (a request: the workshop sets the price).
export default async function NewCommissionPage({ params }: { params: Promise<{ workshop: string }> }) {
  const { workshop: slug } = await params;
  const { membership, workshop } = await requireWorkshopPage(slug, "commission.create", `/${slug}/commissions/new`);
  const mode = membership.role === "client" ? "request" : membership.role === "owner" ? "owner" : "builder";
  return (
    <div className="mx-auto max-w-2xl">
      <Card>
        <CardHeader
          title={mode === "request" ? "Ask for a new instrument" : "Open a commission"}
          subtitle={
            mode === "request"
              ? "Tell the workshop what you have in mind. They will draft a spec with you and quote a price before anything is built."
              : "It starts in the spec stage; draft the spec next and send it to the client for approval."
          }
        />
        <CardBody>
          <NewCommissionForm slug={slug} mode={mode} currency={workshop.currency} />
        </CardBody>
      </Card>
    </div>
  );
}
