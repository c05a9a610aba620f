"use client";

// The commission's stage history: who moved it where, when, with what note. Moves waiting for the
// owner's sign-off are marked; the owner signs them off here, which tells the client. Each stage's
// photos (rendered on the server for this caller) sit under the newest move into that stage.
import type { ReactNode } from "react";
import { Badge } from "@/components/ui/badge";
import { Button } from "@/components/ui/button";
import { Alert } from "@/components/ui/alert";
import { errorMessage } from "@/lib/http/api-client";
import type { StageHistoryEntry } from "@/lib/schemas/commission-out";
import { commissionPaths } from "./api-paths";
import { formatWhen } from "./format";
import { useStageHistory } from "./queries";
import { Empty, Failed, Loading } from "./query-states";
import { photoAnchors } from "./timeline-photos";
import { useCommissionChange } from "./use-commission-change";

const KIND: Record<string, string> = { open: "Opened", advance: "Moved on", back: "Moved back", hold: "Put on hold", resume: "Resumed", cancel: "Cancelled", deliver: "Delivered" };

/** `showSignoff`: mark moves that waited for the owner (the workshop's matter; a client only sees what they were told). */
export function StageTimeline({
  slug,
  commissionId,
  canSignOff,
  showSignoff,
  photos = [],
}: {
  slug: string;
  commissionId: number;
  canSignOff: boolean;
  showSignoff: boolean;
  photos?: Array<{ stage: string; strip: ReactNode }>;
}) {
  const history = useStageHistory(slug, commissionId);
  const signOff = useCommissionChange<number>(slug, (historyId) => ({ path: commissionPaths(slug).signoff(commissionId, historyId) }));
  if (history.isPending) return <Loading label="Loading the timeline…" />;
  if (history.isError) return <Failed what="The timeline" error={history.error} retry={() => history.refetch()} />;
  if (history.data.length === 0) return <Empty>Nothing has happened yet.</Empty>;
  const entries = [...history.data].reverse();
  const strips = new Map(photos.map((p) => [p.stage, p.strip]));
  const { byEntry, leftOver } = photoAnchors(history.data, photos.map((p) => p.stage));
  return (
    <div className="space-y-3">
      {signOff.isError ? <Alert tone="error">{errorMessage(signOff.error)}</Alert> : null}
      <ol aria-label="Timeline" className="space-y-3 border-l-2 border-spruce-200 pl-4">
        {entries.map((h) => (
          <TimelineEntry key={h.id} h={h} showSignoff={showSignoff} canSignOff={canSignOff} busy={signOff.isPending && signOff.variables === h.id} onSignOff={() => signOff.mutate(h.id)}>
            {byEntry.get(h.id)?.map((stage) => strips.get(stage))}
          </TimelineEntry>
        ))}
      </ol>
      {leftOver.length ? <div className="space-y-3 border-t border-spruce-100 pt-3">{leftOver.map((stage) => strips.get(stage))}</div> : null}
    </div>
  );
}

function TimelineEntry({
  h,
  showSignoff,
  canSignOff,
  busy,
  onSignOff,
  children,
}: {
  h: StageHistoryEntry;
  showSignoff: boolean;
  canSignOff: boolean;
  busy: boolean;
  onSignOff: () => void;
  children?: ReactNode;
}) {
  const pending = h.needsSignoff && !h.signedOffAt;
  return (
    <li className="relative">
      <span aria-hidden className="absolute -left-[1.4rem] top-1.5 size-2.5 rounded-full border-2 border-white bg-rosewood-700" />
      <p className="text-sm">
        <span className="font-semibold">{KIND[h.kind] ?? h.kind}</span>
        {h.fromLabel ? ` · ${h.fromLabel} → ${h.toLabel}` : ` · ${h.toLabel}`}
      </p>
      <p className="text-xs text-graphite-600">
        {h.actor?.name ?? "The workshop"} · <time dateTime={h.createdAt}>{formatWhen(h.createdAt)}</time>
      </p>
      {h.note ? <p className="mt-1 whitespace-pre-wrap break-words rounded-chip bg-spruce-50 px-2 py-1 text-sm">{h.note}</p> : null}
      {h.needsSignoff && showSignoff ? (
        <div className="mt-1 flex flex-wrap items-center gap-2">
          {pending ? <Badge tone="warning">waiting for the owner&apos;s sign-off</Badge> : <Badge tone="success">signed off</Badge>}
          {pending && canSignOff ? (
            <Button size="sm" busy={busy} onClick={onSignOff}>
              Sign off and tell the client
            </Button>
          ) : null}
        </div>
      ) : null}
      {children ? <div className="mt-2 space-y-3">{children}</div> : null}
    </li>
  );
}
