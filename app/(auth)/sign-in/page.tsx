import type { Metadata } from "next";
import { redirect } from "next/navigation";
import { Card, CardBody, CardHeader } from "@/components/ui/card";
import { parseSignInCode } from "@/lib/auth/errors";
import { describeRetry } from "@/lib/auth/rate-limit";
import { currentUser } from "@/lib/auth/session";
import { callbackPathSchema } from "@/lib/schemas/auth";
import { SignInForm } from "./sign-in-form";

export const metadata: Metadata = { title: "Sign in" };

type Search = { callbackUrl?: string; error?: string; code?: string; email?: string; reset?: string };

/** The message for a refusal Auth.js redirected here with (a plain form post or an old link). */
function messageFor(s: Search): string | null {
  if (!s.error) return null;
  if (s.error === "Verification") return "That sign-in link has expired or was already used. Ask for a new one.";
  if (s.error === "AccessDenied") return "That link does not belong to an account. Sign up or ask your workshop for an invitation.";
  const r = parseSignInCode(s.code);
  if (r.kind === "rate_limited") return `Too many failed sign-ins. ${describeRetry(r.retryAfterSeconds)}`;
  if (r.kind === "invalid_credentials") return "That e-mail address and password do not match an account.";
  return "Signing in did not work. Try again.";
}

export default async function SignInPage({ searchParams }: { searchParams: Promise<Search> }) {
  const s = await searchParams;
  const callbackUrl = callbackPathSchema.parse(s.callbackUrl);
  if (await currentUser()) redirect(callbackUrl);
  return (
    <Card>
      <CardHeader title="Sign in" subtitle="With your password, or with a link we e-mail you." />
      <CardBody>
        <SignInForm
          callbackUrl={callbackUrl}
          initialEmail={s.email ?? ""}
          initialMessage={messageFor(s)}
          notice={s.reset === "done" ? "Your password was changed. Sign in with the new one." : null}
        />
      </CardBody>
    </Card>
  );
}
