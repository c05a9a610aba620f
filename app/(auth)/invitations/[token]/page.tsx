import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { SignOutButton } from "@/components/sign-out-button";
import { Alert } from "@/components/ui/alert";
import { buttonClasses } from "@/components/ui/button";
import { Card, CardBody, CardHeader } from "@/components/ui/card";
import { ROLE_LABELS } from "@/lib/auth/permissions";
import { currentUser } from "@/lib/auth/session";
import { previewInvitation } from "@/lib/members/invitations";
import { AcceptButton, NewAccountForm } from "./accept-forms";

export const metadata: Metadata = { title: "Invitation" };

const CLOSED: Record<string, string> = {
  accepted: "This invitation has already been used.",
  revoked: "This invitation was withdrawn.",
  expired: "This invitation has expired.",
};

export default async function InvitationPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const inv = token.length >= 20 && token.length <= 200 ? await previewInvitation(token) : null;
  if (!inv) notFound();
  const user = await currentUser();
  const role = ROLE_LABELS[inv.role].toLowerCase();
  const here = `/invitations/${token}`;

  let body;
  if (inv.state !== "pending") {
    body = (
      <div className="space-y-3">
        <Alert tone="warning">{CLOSED[inv.state]} Ask the workshop&apos;s owner for a new one.</Alert>
        {user ? (
          <Link href="/workshops" className={buttonClasses("secondary")}>
            Your workshops
          </Link>
        ) : null}
      </div>
    );
  } else if (user && user.email === inv.email) {
    body = <AcceptButton token={token} workshopName={inv.workshop.name} />;
  } else if (user) {
    body = (
      <div className="space-y-3">
        <Alert tone="warning">
          You are signed in as {user.email}, but this invitation is for {inv.email}. Sign out, then open the link again.
        </Alert>
        <SignOutButton />
      </div>
    );
  } else if (inv.accountExists) {
    body = (
      <div className="space-y-3 text-sm">
        <p>There is an account for {inv.email}. Sign in to accept.</p>
        <Link href={`/sign-in?${new URLSearchParams({ callbackUrl: here, email: inv.email })}`} className={buttonClasses("primary")}>
          Sign in to accept
        </Link>
      </div>
    );
  } else {
    body = <NewAccountForm token={token} email={inv.email} />;
  }

  return (
    <Card>
      <CardHeader
        title={`Join ${inv.workshop.name}`}
        subtitle={`${inv.invitedBy ?? "The owner"} invited ${inv.email} as ${role}. The link works until ${new Date(inv.expiresAt).toUTCString()}.`}
      />
      <CardBody>{body}</CardBody>
    </Card>
  );
}
