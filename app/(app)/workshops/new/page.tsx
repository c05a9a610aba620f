import type { Metadata } from "next";
import { Card, CardBody, CardHeader } from "@/components/ui/card";
import { requireUserPage } from "@/lib/auth/pages";
import { WorkshopForm } from "./workshop-form";

export const metadata: Metadata = { title: "Create a workshop" };

export default async function NewWorkshopPage() {
  await requireUserPage("/workshops/new");
  return (
    <div className="mx-auto max-w-xl px-4 py-10 sm:px-6">
      <Card>
        <CardHeader title="Create a workshop" subtitle="You become its owner and can invite builders, a bookkeeper and clients." />
        <CardBody>
          <WorkshopForm />
        </CardBody>
      </Card>
    </div>
  );
}
