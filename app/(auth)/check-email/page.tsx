import type { Metadata } from "next";
import Link from "next/link";
import { Card, CardBody, CardHeader } from "@/components/ui/card";

export const metadata: Metadata = { title: "Check your e-mail" };

// Where Auth.js sends a browser that asked for a sign-in link without our form's script.
export default function CheckEmailPage() {
  return (
    <Card>
      <CardHeader title="Check your e-mail" />
      <CardBody className="space-y-3 text-sm">
        <p>If an account exists for that address, a sign-in link is on its way. It works once, for 15 minutes.</p>
        <Link href="/sign-in" className="font-semibold text-rosewood-700 hover:underline">
          Back to sign-in
        </Link>
      </CardBody>
    </Card>
  );
}
