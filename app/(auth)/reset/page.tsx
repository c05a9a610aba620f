import type { Metadata } from "next";
import { Card, CardBody, CardHeader } from "@/components/ui/card";
import { ResetRequestForm } from "./reset-forms";

export const metadata: Metadata = { title: "Reset your password" };

export default function ResetRequestPage() {
  return (
    <Card>
      <CardHeader title="Reset your password" subtitle="We e-mail you a link to choose a new one." />
      <CardBody>
        <ResetRequestForm />
      </CardBody>
    </Card>
  );
}
