"use client";

// The commission's header: number, title, stage, client, builder, target date. It starts from the
// summary the server read for the access check and follows the API after every change.
import { Badge } from "@/components/ui/badge";
import type { CommissionSummary } from "@/lib/schemas/commission-out";
import { formatDay } from "./format";
import { useCommission } from "./queries";
import { StageBadge } from "./stage-badge";

export function CommissionHeader({ slug, initial, showClient }: { slug: string; initial: CommissionSummary; showClient: boolean }) {
  const detail = useCommission(slug, initial.id);
  const c: CommissionSummary = detail.data ?? initial;
  return (
    <header className="space-y-2" data-testid="commission-header">
      <p className="font-mono text-sm font-semibold text-rosewood-700">{c.number}</p>
      <div className="flex flex-wrap items-center gap-3">
        <h2 className="break-words text-2xl font-semibold" data-testid="commission-title">
          {c.title}
        </h2>
        <StageBadge stage={c.stage} label={c.stageLabel} />
        {c.awaitingSignoff ? <Badge tone="warning">sign-off pending</Badge> : null}
      </div>
      <dl className="flex flex-wrap gap-x-6 gap-y-1 text-sm">
        {showClient ? <Item label="Client" value={c.client.name} /> : null}
        <Item label="Builder" value={c.builder?.name ?? "Not assigned yet"} />
        <Item
          label="Target date"
          value={
            <>
              {c.targetDate ? formatDay(c.targetDate) : "Not set"} {c.overdue ? <Badge tone="danger">overdue</Badge> : null}
            </>
          }
        />
      </dl>
    </header>
  );
}

function Item({ label, value }: { label: string; value: React.ReactNode }) {
  return (
    <div className="flex gap-2">
      <dt className="text-graphite-500">{label}</dt>
      <dd className="font-semibold">{value}</dd>
    </div>
  );
}
