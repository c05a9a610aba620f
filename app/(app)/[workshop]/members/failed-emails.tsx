"use client";

import { useRouter } from "next/navigation";
import { useTransition } from "react";
import { Button } from "@/components/ui/button";
import { Card, CardHeader } from "@/components/ui/card";
import { Table, TBody, Td, Th, THead } from "@/components/ui/table";
import { useToast } from "@/components/ui/toast";
import type { OutboxMessageOut } from "@/lib/data/outbox";
import { retryEmailAction } from "./actions";

/** E-mail of this workshop the provider refused for good: the owner sees why and can send it again. */
export function FailedEmails({ slug, messages }: { slug: string; messages: OutboxMessageOut[] }) {
  const router = useRouter();
  const toast = useToast();
  const [pending, startTransition] = useTransition();

  const retry = (id: number) =>
    startTransition(async () => {
      const r = await retryEmailAction(slug, { messageId: id });
      toast.show(r.ok ? "Queued again; it goes out within a minute." : r.message, r.ok ? "success" : "error");
      router.refresh();
    });

  return (
    <Card className="border-ember-500">
      <CardHeader title="E-mail that could not be delivered" subtitle="The provider refused these after retrying. Check the address, then send again." />
      <div className="p-3">
        <Table caption="Undelivered e-mail" className="min-w-[36rem]">
          <THead>
            <tr>
              <Th>To</Th>
              <Th>Subject</Th>
              <Th>Why</Th>
              <Th className="text-right">Send again</Th>
            </tr>
          </THead>
          <TBody>
            {messages.map((m) => (
              <tr key={m.id}>
                <Td className="break-words">{m.to}</Td>
                <Td>{m.subject}</Td>
                <Td className="text-xs text-graphite-600">{m.lastError}</Td>
                <Td className="text-right">
                  <Button size="sm" variant="secondary" disabled={pending} onClick={() => retry(m.id)}>
                    Send again
                  </Button>
                </Td>
              </tr>
            ))}
          </TBody>
        </Table>
      </div>
    </Card>
  );
}
