"use client";

import { useRouter } from "next/navigation";
import { useTransition } from "react";
import { Select } from "@/components/ui/select";
import { useToast } from "@/components/ui/toast";
import { reassignBuilderAction } from "./actions";

const NOBODY = "";

/** The owner's builder picker on one commission row of the overview. */
export function BuilderReassign({
  slug,
  commission,
  builders,
}: {
  slug: string;
  commission: { id: number; number: string; builder: { id: number; name: string } | null };
  builders: Array<{ id: number; name: string }>;
}) {
  const router = useRouter();
  const toast = useToast();
  const [pending, startTransition] = useTransition();
  const change = (value: string) =>
    startTransition(async () => {
      const builderId = value === NOBODY ? null : Number(value);
      const r = await reassignBuilderAction(slug, { commissionId: commission.id, builderId });
      if (r.ok) toast.show(`${commission.number} is now with ${r.data.builder?.name ?? "nobody"}.`, "success");
      else toast.show(r.message, "error");
      router.refresh();
    });
  return (
    <Select
      aria-label={`Builder of ${commission.number}`}
      value={commission.builder ? String(commission.builder.id) : NOBODY}
      disabled={pending}
      onChange={(e) => change(e.target.value)}
      className="h-8 min-w-36 text-xs"
    >
      <option value={NOBODY}>Nobody yet</option>
      {builders.map((b) => (
        <option key={b.id} value={b.id}>
          {b.name}
        </option>
      ))}
    </Select>
  );
}
