"use client";

// The client's approval step for the version sent to them: what changed since their last approval
// (with the change in total string tension and the tremolo note), what approving means, and the
// button. Approval locks the version.
import { useState } from "react";
import { commissionPaths } from "@/components/commissions/api-paths";
import { formatWhen } from "@/components/commissions/format";
import { useSpecVersion } from "@/components/commissions/queries";
import { Failed, Loading } from "@/components/commissions/query-states";
import { SpecChanges } from "@/components/commissions/spec-changes";
import { useCommissionChange } from "@/components/commissions/use-commission-change";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { Card, CardBody, CardHeader } from "@/components/ui/card";
import { Dialog } from "@/components/ui/dialog";
import { errorMessage } from "@/lib/http/api-client";
import type { LengthUnit } from "@/lib/lutherie/units";

export function ClientApproval({ slug, id, unit, latestId }: { slug: string; id: number; unit: LengthUnit; latestId: number }) {
  const v = useSpecVersion(slug, id, latestId);
  const [confirming, setConfirming] = useState(false);
  const approve = useCommissionChange<void, { approved: boolean; advanced: boolean }>(slug, () => ({ path: commissionPaths(slug).approve(id, latestId) }));

  if (v.isPending) return <Loading label="Loading the version to approve…" />;
  if (v.isError) return <Failed what="The version to approve" error={v.error} retry={() => v.refetch()} />;
  const version = v.data;

  if (version.approvedAt) {
    return (
      <Alert tone="success">
        You approved version {version.version} on {formatWhen(version.approvedAt)}. It is locked: the workshop builds exactly this spec, and any change will come to you as a new version to approve.
        {approve.data?.advanced ? " The workshop will now ask for the deposit." : ""}
      </Alert>
    );
  }

  return (
    <Card className="border-2 border-rosewood-300">
      <CardHeader title={`Version ${version.version} is waiting for your approval`} subtitle={`Sent ${version.submittedAt ? formatWhen(version.submittedAt) : ""}`} />
      <CardBody className="space-y-4">
        <SpecChanges version={version} unit={unit} />
        <div className="rounded-panel bg-spruce-50 px-4 py-3 text-sm" id="approval-meaning">
          <p className="font-semibold">What approving means</p>
          <ul className="ml-4 mt-1 list-disc space-y-1">
            <li>You agree that the workshop builds your instrument to version {version.version}: the build options and the figures below.</li>
            <li>Version {version.version} is locked. Nobody can edit it; any later change becomes a new version that needs your approval again.</li>
            <li>If the commission is still at the spec stage, it moves on to the deposit.</li>
          </ul>
          <p className="mt-2 text-graphite-600">Questions first? Write to the workshop under Comments on the overview.</p>
        </div>
        {approve.isError ? <Alert tone="error">{errorMessage(approve.error)}</Alert> : null}
        <Button size="lg" aria-describedby="approval-meaning" onClick={() => setConfirming(true)}>
          Approve version {version.version}
        </Button>
      </CardBody>
      <Dialog
        open={confirming}
        onClose={() => setConfirming(false)}
        title={`Approve and lock version ${version.version}?`}
        footer={
          <>
            <Button variant="secondary" onClick={() => setConfirming(false)}>
              Not yet
            </Button>
            <Button busy={approve.isPending} onClick={() => approve.mutate(undefined, { onSettled: () => setConfirming(false) })}>
              Yes, approve version {version.version}
            </Button>
          </>
        }
      >
        <p>The workshop will build to this version, and it can no longer be changed without your approval of a new version.</p>
      </Dialog>
    </Card>
  );
}
