"use client";

// The overview tab: where the commission stands and what can be done next, with the stage photos in
// the timeline, the money and the signed setup sheet, each linking to its own tab.
import Link from "next/link";
import { useState, type ReactNode } from "react";
import { CommentsThread } from "@/components/commissions/comments-thread";
import { EditCommissionForm } from "@/components/commissions/edit-commission-form";
import { MoneyPanel } from "@/components/commissions/money-panel";
import { useCommission } from "@/components/commissions/queries";
import { Failed, Loading } from "@/components/commissions/query-states";
import { SetupSummaryPanel, type SignedSetupSummary } from "@/components/commissions/setup-summary-panel";
import { StageLine } from "@/components/commissions/stage-line";
import { StageMoves, type FixLinks } from "@/components/commissions/stage-moves";
import { StageTimeline } from "@/components/commissions/stage-timeline";
import { Alert } from "@/components/ui/alert";
import { Badge } from "@/components/ui/badge";
import { Button } from "@/components/ui/button";
import { Card, CardBody, CardHeader } from "@/components/ui/card";
import type { CommissionDetail } from "@/lib/schemas/commission-out";

export interface OverviewProps {
  slug: string;
  id: number;
  me: number;
  isClient: boolean;
  isOwner: boolean;
  canWrite: boolean;
  canSignOff: boolean;
  /** The commission's tabs the caller may open (null: not theirs to see). */
  tabs: { spec: string | null; payments: string | null; photos: string | null; setup: string | null };
  /** Stage photos as the server rendered them for this caller, in the order of the stage line. */
  photos: Array<{ stage: string; strip: ReactNode }>;
  setup: SignedSetupSummary | null;
}

/** Where each thing a move waits for is settled, among the tabs the caller may open. */
function fixLinks(tabs: OverviewProps["tabs"]): FixLinks {
  const links: FixLinks = {};
  if (tabs.spec) links.spec_approval = { href: tabs.spec, label: "Open the spec" };
  if (tabs.payments) links.deposit = links.balance = { href: tabs.payments, label: "Open the Payments tab" };
  if (tabs.setup) links.setup_sheet = { href: tabs.setup, label: "Open the setup sheet" };
  return links;
}

export function OverviewClient(props: OverviewProps) {
  const { slug, id } = props;
  const detail = useCommission(slug, id);
  if (detail.isPending) return <Loading label="Loading the commission…" rows={5} />;
  if (detail.isError) return <Failed what="The commission" error={detail.error} retry={() => detail.refetch()} />;
  const c = detail.data;
  const awaitingApproval = props.isClient && c.latestSpecVersion?.submitted && !c.latestSpecVersion.approved;
  return (
    <div className="grid grid-cols-1 items-start gap-5 lg:grid-cols-[minmax(0,1fr)_22rem]">
      <div className="min-w-0 space-y-5">
        {awaitingApproval ? (
          <Alert tone="warning">
            Version {c.latestSpecVersion!.version} of the spec is waiting for your approval.{" "}
            <Link href={`/${slug}/commissions/${c.id}/spec`} className="font-semibold underline">
              Review it
            </Link>
          </Alert>
        ) : null}
        <Card>
          <CardHeader title="Stage" subtitle={props.isClient ? "Where your instrument is in the build" : "The workshop's stage line"} />
          <CardBody className="space-y-5">
            <StageLine commission={c} />
            {c.transitions.length > 0 ? <StageMoves slug={slug} commission={c} fixLinks={fixLinks(props.tabs)} /> : null}
          </CardBody>
        </Card>
        <Card>
          <CardHeader title="Timeline" subtitle={props.photos.length ? "Newest first, with each stage's photos" : "Newest first"} />
          <CardBody>
            <StageTimeline slug={slug} commissionId={id} canSignOff={props.canSignOff} showSignoff={!props.isClient} photos={props.photos} />
          </CardBody>
        </Card>
        <Card>
          <CardHeader title="Comments" subtitle="Between the client and the workshop" />
          <CardBody>
            <CommentsThread slug={slug} commissionId={id} me={props.me} isClient={props.isClient} />
          </CardBody>
        </Card>
      </div>
      <div className="min-w-0 space-y-5">
        <SpecPanel slug={slug} c={c} isClient={props.isClient} />
        {c.money ? <MoneyPanel c={c} paymentsHref={props.tabs.payments} isClient={props.isClient} /> : null}
        {props.setup ? <SetupSummaryPanel setup={props.setup} setupHref={props.tabs.setup} /> : null}
        <DetailsPanel {...props} c={c} />
      </div>
    </div>
  );
}

function SpecPanel({ slug, c, isClient }: { slug: string; c: CommissionDetail; isClient: boolean }) {
  const v = c.latestSpecVersion;
  const waitingForClient = v && v.submitted && !v.approved;
  return (
    <Card>
      <CardHeader title="Spec" />
      <CardBody className="space-y-2 text-sm">
        {!v ? (
          <p>{isClient ? "The workshop has not sent you a spec yet." : "No spec drafted yet."}</p>
        ) : (
          <p>
            Version {v.version}: {v.approved ? <Badge tone="success">approved</Badge> : v.submitted ? <Badge tone="accent">sent to the client</Badge> : <Badge>draft</Badge>}{" "}
            {v.hasErrors ? <Badge tone="danger">has errors</Badge> : null}
          </p>
        )}
        {c.approvedSpecVersion && c.approvedSpecVersion.id !== v?.id ? <p>Last approved: version {c.approvedSpecVersion.version}.</p> : null}
        {isClient && waitingForClient ? <p className="font-semibold text-rosewood-800">Waiting for your approval.</p> : null}
        <Link href={`/${slug}/commissions/${c.id}/spec`} className="inline-block font-semibold text-rosewood-700 underline">
          {isClient ? (waitingForClient ? "Review and approve the spec" : "See the spec") : "Open the spec"}
        </Link>
      </CardBody>
    </Card>
  );
}

function DetailsPanel({ slug, c, isClient, isOwner, canWrite }: OverviewProps & { c: CommissionDetail }) {
  const [editing, setEditing] = useState(false);
  const closed = c.stage === "delivered" || c.stage === "cancelled";
  return (
    <Card>
      <CardHeader
        title="Details"
        action={
          canWrite && !closed && !editing ? (
            <Button variant="secondary" size="sm" onClick={() => setEditing(true)}>
              Change
            </Button>
          ) : null
        }
      />
      <CardBody className="space-y-3 text-sm">
        {editing ? (
          <EditCommissionForm slug={slug} commission={c} isOwner={isOwner} onDone={() => setEditing(false)} />
        ) : (
          <>
            <div>
              <h3 className="text-xs font-semibold uppercase tracking-wider text-graphite-500">{isClient ? "Your request" : "The client's request"}</h3>
              <p className="mt-1 whitespace-pre-wrap break-words">{c.requestNotes || "No notes."}</p>
            </div>
            <p className="text-xs text-graphite-500">Opened {c.createdAt.slice(0, 10)} · changed {c.updatedAt.slice(0, 10)}</p>
          </>
        )}
      </CardBody>
    </Card>
  );
}
