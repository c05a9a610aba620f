import type { Metadata } from "next";
import { redirect } from "next/navigation";
import { Card, CardBody, CardHeader } from "@/components/ui/card";
import { currentUser } from "@/lib/auth/session";
import { callbackPathSchema } from "@/lib/schemas/auth";
import { SignUpForm } from "./sign-up-form";

export const metadata: Metadata = { title: "Create an account" };

export default async function SignUpPage({ searchParams }: { searchParams: Promise<{ callbackUrl?: string }> }) {
  const callbackUrl = callbackPathSchema.parse((await searchParams).callbackUrl);
  if (await currentUser()) redirect(callbackUrl);
  return (
    <Card>
      <CardHeader title="Create an account" subtitle="Then create your workshop, or accept an invitation to one." />
      <CardBody>
        <SignUpForm callbackUrl={callbackUrl} />
      </CardBody>
    </Card>
  );
}
