"use client";

import { useRouter } from "next/navigation";
import { useState, useTransition } from "react";
import { Alert } from "@/components/ui/alert";
import { Badge, type BadgeTone } from "@/components/ui/badge";
import { Button } from "@/components/ui/button";
import { CardBody } from "@/components/ui/card";
import { Table, TBody, Td, Th, THead } from "@/components/ui/table";
import { ROLE_LABELS } from "@/lib/auth/permissions";
import type { InvitationOut } from "@/lib/schemas/member";
import { revokeInvitationAction } from "./actions";

const STATE: Record<InvitationOut["state"], { label: string; tone: BadgeTone }> = {
  pending: { label: "Waiting", tone: "accent" },
  accepted: { label: "Joined", tone: "success" },
  revoked: { label: "Withdrawn", tone: "neutral" },
  expired: { label: "Expired", tone: "warning" },
};

const day = (iso: string) => new Date(iso).toISOString().slice(0, 10);

export function InvitationsTable({ slug, invitations }: { slug: string; invitations: InvitationOut[] }) {
  const router = useRouter();
  const [pending, startTransition] = useTransition();
  const [error, setError] = useState<string | null>(null);

  if (invitations.length === 0) return <CardBody className="text-sm text-graphite-500">No invitations yet.</CardBody>;

  const revoke = (id: number) =>
    startTransition(async () => {
      setError(null);
      const r = await revokeInvitationAction(slug, { invitationId: id });
      if (!r.ok) setError(r.message);
      router.refresh();
    });

  return (
    <div className="space-y-3 p-3">
      {error ? <Alert tone="error">{error}</Alert> : null}
      <Table caption="Invitations" className="min-w-[36rem]">
        <THead>
          <tr>
            <Th>E-mail</Th>
            <Th>Role</Th>
            <Th>State</Th>
            <Th>Until</Th>
            <Th className="text-right">Withdraw</Th>
          </tr>
        </THead>
        <TBody>
          {invitations.map((i) => (
            <tr key={i.id}>
              <Td className="break-words">{i.email}</Td>
              <Td>{ROLE_LABELS[i.role]}</Td>
              <Td>
                <Badge tone={STATE[i.state].tone}>{STATE[i.state].label}</Badge>
              </Td>
              <Td className="font-mono text-xs whitespace-nowrap">{day(i.expiresAt)}</Td>
              <Td className="text-right">
                {i.state === "pending" ? (
                  <Button variant="ghost" size="sm" disabled={pending} onClick={() => revoke(i.id)} aria-label={`Withdraw the invitation to ${i.email}`}>
                    Withdraw
                  </Button>
                ) : null}
              </Td>
            </tr>
          ))}
        </TBody>
      </Table>
    </div>
  );
}
