"use client";

import { useRouter } from "next/navigation";
import { useState, useTransition } from "react";
import { Alert } from "@/components/ui/alert";
import { Badge } from "@/components/ui/badge";
import { Button } from "@/components/ui/button";
import { Dialog } from "@/components/ui/dialog";
import { Select } from "@/components/ui/select";
import { Table, TBody, Td, Th, THead } from "@/components/ui/table";
import { useToast } from "@/components/ui/toast";
import { ROLE_LABELS, ROLES, type Role } from "@/lib/auth/permissions";
import type { MemberOut } from "@/lib/schemas/member";
import { changeRoleAction, removeMemberAction } from "./actions";

const ROLE_OPTIONS = ROLES.map((r) => ({ value: r, label: ROLE_LABELS[r] }));

export function MembersTable({ slug, members, manage, selfMembershipId }: { slug: string; members: MemberOut[]; manage: boolean; selfMembershipId: number }) {
  const router = useRouter();
  const toast = useToast();
  const [pending, startTransition] = useTransition();
  const [error, setError] = useState<string | null>(null);
  const [removing, setRemoving] = useState<MemberOut | null>(null);

  const changeRole = (m: MemberOut, role: Role) =>
    startTransition(async () => {
      setError(null);
      const r = await changeRoleAction(slug, { memberId: m.id, role });
      if (r.ok) toast.show(`${m.name} is now ${ROLE_LABELS[role].toLowerCase()}.`, "success");
      else setError(r.message);
      router.refresh();
    });

  const remove = (m: MemberOut) =>
    startTransition(async () => {
      setError(null);
      const r = await removeMemberAction(slug, { memberId: m.id });
      setRemoving(null);
      if (r.ok) toast.show(`${m.name} was removed from the workshop.`, "success");
      else setError(r.message);
      router.refresh();
    });

  return (
    <div className="space-y-3 p-3">
      {error ? <Alert tone="error">{error}</Alert> : null}
      <Table caption="Members" className="min-w-[36rem]">
        <THead>
          <tr>
            <Th>Name</Th>
            <Th>E-mail</Th>
            <Th>Role</Th>
            {manage ? <Th className="text-right">Remove</Th> : null}
          </tr>
        </THead>
        <TBody>
          {members.map((m) => (
            <tr key={m.id}>
              <Td className="font-semibold">
                {m.name}
                {m.id === selfMembershipId ? <span className="ml-2 text-xs font-normal text-graphite-500">(you)</span> : null}
              </Td>
              <Td className="break-words">{m.email}</Td>
              <Td>
                {manage ? (
                  <Select
                    aria-label={`Role of ${m.name}`}
                    value={m.role}
                    disabled={pending}
                    onChange={(e) => changeRole(m, e.target.value as Role)}
                    options={ROLE_OPTIONS}
                    className="min-w-32"
                  />
                ) : (
                  <Badge tone={m.role === "owner" ? "primary" : "neutral"}>{ROLE_LABELS[m.role]}</Badge>
                )}
              </Td>
              {manage ? (
                <Td className="text-right">
                  <Button variant="ghost" size="sm" disabled={pending} onClick={() => setRemoving(m)} aria-label={`Remove ${m.name}`}>
                    Remove
                  </Button>
                </Td>
              ) : null}
            </tr>
          ))}
        </TBody>
      </Table>
      <Dialog
        open={removing !== null}
        onClose={() => setRemoving(null)}
        title="Remove this member?"
        footer={
          <>
            <Button variant="secondary" onClick={() => setRemoving(null)}>
              Keep
            </Button>
            <Button variant="danger" busy={pending} onClick={() => removing && remove(removing)}>
              Remove {removing?.name}
            </Button>
          </>
        }
      >
        <p>
          {removing?.name} loses access to this workshop at once. Their account stays; you can invite them again later.
        </p>
      </Dialog>
    </div>
  );
}
