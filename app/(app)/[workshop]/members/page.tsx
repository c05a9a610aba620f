import type { Metadata } from "next";
import { Card, CardBody, CardHeader } from "@/components/ui/card";
import { requireWorkshopPage } from "@/lib/auth/pages";
import { listInvitations } from "@/lib/data/invitations";
import { listMemberNames, listMembers } from "@/lib/data/memberships";
import { listOutboxMessages } from "@/lib/data/outbox";
import { FailedEmails } from "./failed-emails";
import { InvitationsTable } from "./invitations-table";
import { InviteForm } from "./invite-form";
import { MembersTable } from "./members-table";

export const metadata: Metadata = { title: "Members" };

// The owner manages people here; a bookkeeper sees the list, a builder the names; a client gets 403.
export default async function MembersPage({ params }: { params: Promise<{ workshop: string }> }) {
  const { workshop: slug } = await params;
  const ctx = await requireWorkshopPage(slug, "member.names", `/${slug}/members`);

  if (!ctx.can("member.read")) {
    const names = await listMemberNames(ctx.scope);
    return (
      <Card>
        <CardHeader title="People in this workshop" />
        <CardBody>
          <ul className="grid gap-1 sm:grid-cols-2">
            {names.map((n, i) => (
              <li key={i}>{n.name}</li>
            ))}
          </ul>
        </CardBody>
      </Card>
    );
  }

  const manage = ctx.can("member.manage");
  const [members, invitations, failed] = await Promise.all([
    listMembers(ctx.scope),
    manage ? listInvitations(ctx.scope) : Promise.resolve([]),
    ctx.can("outbox.read") ? listOutboxMessages(ctx.scope, "failed") : Promise.resolve([]),
  ]);

  return (
    <div className="space-y-6">
      {failed.length > 0 ? <FailedEmails slug={slug} messages={failed} /> : null}
      <Card>
        <CardHeader title="Members" subtitle={`${members.length} ${members.length === 1 ? "person" : "people"}`} />
        <MembersTable slug={slug} members={members} manage={manage} selfMembershipId={ctx.membership.id} />
      </Card>
      {manage ? (
        <div className="grid gap-6 lg:grid-cols-[2fr_3fr]">
          <Card className="min-w-0">
            <CardHeader title="Invite someone" subtitle="They get an e-mail with a link that works once, for 7 days." />
            <CardBody>
              <InviteForm slug={slug} />
            </CardBody>
          </Card>
          <Card className="min-w-0">
            <CardHeader title="Invitations" subtitle="Pending ones, and those of the last 30 days" />
            <InvitationsTable slug={slug} invitations={invitations} />
          </Card>
        </div>
      ) : null}
    </div>
  );
}
