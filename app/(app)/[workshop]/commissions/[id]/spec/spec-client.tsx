"use client";

// Who sees what on the spec tab: the workshop (owner, builder) drafts and sends; everyone else
// reads the versions they may see, and the client approves the one sent to them.
import { useEffect, useState } from "react";
import { commissionPaths } from "@/components/commissions/api-paths";
import { useCommission, useSpecVersion, useSpecVersions } from "@/components/commissions/queries";
import { Empty, Failed, Loading } from "@/components/commissions/query-states";
import { SpecChanges } from "@/components/commissions/spec-changes";
import { SpecVersionsTable } from "@/components/commissions/spec-versions-table";
import { useCommissionChange } from "@/components/commissions/use-commission-change";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { Card, CardBody, CardHeader } from "@/components/ui/card";
import { Textarea } from "@/components/ui/input";
import { errorMessage } from "@/lib/http/api-client";
import type { LengthUnit } from "@/lib/lutherie/units";
import type { SpecVersionSummary } from "@/lib/schemas/spec-version";
import { ClientApproval, preloadSpecParts, SpecEditor, SpecVersionView } from "./lazy-parts";

export interface SpecClientProps {
  slug: string;
  id: number;
  unit: LengthUnit;
  canDraft: boolean;
  canApprove: boolean;
}

export function SpecClient(props: SpecClientProps) {
  const { slug, id, canDraft, canApprove } = props;
  useEffect(() => preloadSpecParts({ canDraft, canApprove }), [canDraft, canApprove]);
  const commission = useCommission(slug, id);
  const versions = useSpecVersions(slug, id);
  const [picked, setPicked] = useState<number | null>(null);
  const latest = versions.data?.[0] ?? null;
  // The workshop looks at a version it picks (the editor is always there); others see the latest unless they pick another.
  const shownId = picked ?? (props.canDraft ? null : (latest?.id ?? null));
  const shown = useSpecVersion(slug, id, shownId);
  const latestDetail = useSpecVersion(slug, id, props.canDraft ? (latest?.id ?? null) : null);

  if (versions.isPending || commission.isPending) return <Loading label="Loading the spec…" rows={6} />;
  if (versions.isError) return <Failed what="The spec versions" error={versions.error} retry={() => versions.refetch()} />;
  if (commission.isError) return <Failed what="The commission" error={commission.error} retry={() => commission.refetch()} />;
  const c = commission.data;
  const closed = c.stage === "delivered" || c.stage === "cancelled";
  const fileName = `${c.number}-frets`;

  return (
    <div className="space-y-5">
      {/* The client's next step comes first. */}
      {props.canApprove && latest ? <ClientApproval slug={slug} id={id} unit={props.unit} latestId={latest.id} /> : null}
      {versions.data.length === 0 ? (
        props.canDraft ? null : <Empty>{props.canApprove ? "The workshop has not sent you a spec yet. You will get an e-mail when it is ready." : "No spec has been sent to the client yet."}</Empty>
      ) : (
        <Card>
          <CardHeader title="Versions" subtitle={props.canDraft ? "Every saved version; only the latest can be sent" : props.canApprove ? "The versions the workshop has sent you" : undefined} />
          <CardBody className="space-y-4">
            <SpecVersionsTable versions={versions.data} unit={props.unit} selectedId={shownId} onSelect={setPicked} />
            {props.canDraft && latest && !closed ? <SendPanel slug={slug} id={id} latest={latest} /> : null}
          </CardBody>
        </Card>
      )}

      {shownId !== null ? (
        shown.isPending ? (
          <Loading label="Loading the version…" rows={4} />
        ) : shown.isError ? (
          <Failed what="The version" error={shown.error} retry={() => shown.refetch()} />
        ) : (
          <section aria-label={`Version ${shown.data.version}`} className="space-y-4">
            <div className="flex flex-wrap items-center justify-between gap-2">
              <h3 className="text-lg font-semibold">Version {shown.data.version}</h3>
              {props.canDraft ? (
                <Button variant="secondary" size="sm" onClick={() => setPicked(null)}>
                  Back to the editor
                </Button>
              ) : null}
            </div>
            {!props.canApprove || shown.data.id !== latest?.id ? <SpecChanges version={shown.data} unit={props.unit} /> : null}
            <SpecVersionView version={shown.data} unit={props.unit} fileName={`${c.number}-v${shown.data.version}-frets`} />
          </section>
        )
      ) : null}

      {props.canDraft && shownId === null ? (
        closed ? (
          <Empty>The commission is {c.stageLabel.toLowerCase()}: its spec cannot change any more.</Empty>
        ) : latest && latestDetail.isPending ? (
          <Loading label="Loading the latest version…" rows={4} />
        ) : latest && latestDetail.isError ? (
          <Failed what="The latest version" error={latestDetail.error} retry={() => latestDetail.refetch()} />
        ) : (
          <SpecEditor key={latest?.id ?? "first"} slug={slug} commissionId={id} unit={props.unit} base={latestDetail.data ?? null} fileName={fileName} />
        )
      ) : null}
    </div>
  );
}

/** The latest version's way to the client: send it (with a note for the e-mail), or why it cannot go. */
function SendPanel({ slug, id, latest }: { slug: string; id: number; latest: SpecVersionSummary }) {
  const [note, setNote] = useState("");
  const send = useCommissionChange<string>(slug, (n) => ({ path: commissionPaths(slug).submit(id, latest.id), json: n.trim() ? { note: n.trim() } : {} }));
  if (latest.approvedAt) return <Alert tone="success">Version {latest.version} is approved by the client. A change makes a new version that needs their approval again.</Alert>;
  if (latest.submittedAt) return <Alert tone="info">Version {latest.version} is with the client, waiting for their approval.</Alert>;
  if (latest.hasErrors) return <Alert tone="warning">Version {latest.version} has errors in its build math, so it cannot be sent. Save a corrected version.</Alert>;
  return (
    <div className="space-y-2 rounded-panel border border-spruce-200 bg-spruce-50 p-3">
      <label htmlFor="send-note" className="block text-xs font-semibold uppercase tracking-wider text-graphite-700">
        Note to the client with version {latest.version} (optional)
      </label>
      <Textarea id="send-note" className="min-h-16" maxLength={1000} value={note} onChange={(e) => setNote(e.target.value)} />
      {send.isError ? <Alert tone="error">{errorMessage(send.error)}</Alert> : null}
      <Button busy={send.isPending} onClick={() => send.mutate(note, { onSuccess: () => setNote("") })}>
        Send version {latest.version} to the client
      </Button>
    </div>
  );
}
