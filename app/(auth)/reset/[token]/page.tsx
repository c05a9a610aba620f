import type { Metadata } from "next";
import Link from "next/link";
import { Alert } from "@/components/ui/alert";
import { Card, CardBody, CardHeader } from "@/components/ui/card";
import { passwordResetUsable } from "@/lib/accounts/accounts";
import { ResetPasswordForm } from "../reset-forms";

export const metadata: Metadata = { title: "Choose a new password" };

export default async function ResetPasswordPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const usable = token.length >= 20 && token.length <= 200 && (await passwordResetUsable(token));
  return (
    <Card>
      <CardHeader title="Choose a new password" />
      <CardBody>
        {usable ? (
          <ResetPasswordForm token={token} />
        ) : (
          <div className="space-y-3">
            <Alert tone="error">This reset link has expired or was already used.</Alert>
            <Link href="/reset" className="font-semibold text-rosewood-700 hover:underline">
              Ask for a new link
            </Link>
          </div>
        )}
      </CardBody>
    </Card>
  );
}
