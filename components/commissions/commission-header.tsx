"use client";

// The commission's header: number, title, stage, client, builder, target date. It starts from the
// summary the server read for the access check and follows the API after every change. Pages that
// change the commission through server actions (payments, setup, photos) re-render the layout with
// a newer summary: that one wins, and the cached API answers are marked stale.
import { useQueryClient } from "@tanstack/react-query";
import { useEffect, useRef } from "react";
import { Badge } from "@/components/ui/badge";
import type { CommissionSummary } from "@/lib/schemas/commission-out";
import { commissionKeys } from "./api-paths";
import { formatDay } from "./format";
import { useCommission } from "./queries";
import { StageBadge } from "./stage-badge";

export function CommissionHeader({ slug, initial, showClient }: { slug: string; initial: CommissionSummary; showClient: boolean }) {
  const detail = useCommission(slug, initial.id);
  const qc = useQueryClient();
  const seen = useRef(`${initial.updatedAt}|${initial.stage}`);
  useEffect(() => {
    // The server read the commission again (a server action or a refresh): the browser's copies follow.
    const now = `${initial.updatedAt}|${initial.stage}`;
    if (seen.current === now) return;
    seen.current = now;
    void qc.invalidateQueries({ queryKey: commissionKeys.all(slug) });
  }, [qc, slug, initial.updatedAt, initial.stage]);
  const c: CommissionSummary = detail.data && detail.data.updatedAt >= initial.updatedAt ? detail.data : initial;
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
