import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { SafetyCaution } from "@/components/build-math/safety-caution";
import { PrintoutsCard } from "@/components/setup/printouts-card";
import { SetupChecks } from "@/components/setup/setup-checks";
import { SetupReadout, StatusBadge } from "@/components/setup/setup-readout";
import { Alert } from "@/components/ui/alert";
import { Card, CardBody, CardHeader } from "@/components/ui/card";
import { requireWorkshopPage } from "@/lib/auth/pages";
import { getSetupSheetView } from "@/lib/data/setup-sheets";
import { AppError } from "@/lib/http/errors";
import { idParamSchema } from "@/lib/schemas/ids";
import { setupSheetQuerySchema } from "@/lib/schemas/setup-sheet-out";
import { SetupSheetForm } from "./setup-sheet-form";
import { SignOffForm } from "./sign-off-form";

export const metadata: Metadata = { title: "Final setup" };

type Props = { params: Promise<{ workshop: string; id: string }>; searchParams: Promise<Record<string, string | string[] | undefined>> };

// The commission's final setup: the builder fills in and signs the sheet, the owner countersigns
// when the workshop asks for it, the client reads the signed sheet; everyone who may see the
// commission downloads the printouts. The header and tabs come from the commission's layout.
export default async function SetupPage({ params, searchParams }: Props) {
  const { workshop: slug, id: rawId } = await params;
  const ctx = await requireWorkshopPage(slug, "setup.read", `/${slug}/commissions/${rawId}/setup`);
  const id = idParamSchema.safeParse(rawId);
  const query = setupSheetQuerySchema.safeParse(await searchParams);
  if (!id.success || !query.success) notFound();
  const view = await getSetupSheetView(ctx.scope, id.data, { revision: query.data.revision }).catch((err: unknown) => {
    if (err instanceof AppError && err.code === "not_found") notFound();
    throw err;
  });
  const here = `/${slug}/commissions/${view.commission.id}/setup`;

  return (
    <div className="space-y-6">
      <Card>
        <CardHeader
          title={view.can.edit ? `Setup sheet${view.sheet ? `, revision ${view.sheet.revision}` : ""}` : "Setup sheet"}
          subtitle={view.spec ? `Measured against the approved spec, version ${view.spec.version}` : "No approved spec yet"}
          action={view.sheet ? <StatusBadge status={view.sheet.status} /> : null}
        />
        <CardBody className="space-y-4">
          {view.lockedReason && !view.can.edit ? <Alert tone="info">{view.lockedReason}</Alert> : null}
          {view.can.edit ? (
            <SetupSheetForm key={view.commission.id} slug={slug} view={view} />
          ) : view.sheet ? (
            <>
              <SetupReadout view={view} />
              {ctx.scope.role !== "client" ? <SetupChecks issues={view.issues} /> : null}
            </>
          ) : (
            <p className="text-sm text-graphite-600">
              {ctx.scope.role === "client" ? "The workshop has not signed off the final setup yet." : "No setup sheet has been filled in yet."}
            </p>
          )}
          {view.can.sign || view.can.reopen ? <SignOffForm slug={slug} view={view} /> : null}
          {view.revisions.length > 1 ? (
            <nav aria-label="Revisions" className="flex flex-wrap gap-2 text-sm">
              <span className="text-graphite-500">Revisions:</span>
              {view.revisions.map((r) => (
                <Link key={r.revision} href={`${here}?revision=${r.revision}`} aria-current={view.sheet?.revision === r.revision ? "page" : undefined} className="underline-offset-2 hover:underline aria-[current=page]:font-semibold">
                  {r.revision} ({r.status === "signed" ? `signed ${r.signedAt?.slice(0, 10)}` : r.status === "awaiting_owner" ? "waiting for the owner" : "draft"})
                </Link>
              ))}
            </nav>
          ) : null}
        </CardBody>
      </Card>

      {view.summary.length && view.sheet?.status === "signed" ? (
        <Card>
          <CardHeader title="Summary" subtitle="As the client reads it in the delivery e-mail" />
          <CardBody>
            <ul className="list-disc space-y-1 pl-5 text-sm">
              {view.summary.map((line) => (
                <li key={line}>{line}</li>
              ))}
            </ul>
          </CardBody>
        </Card>
      ) : null}

      {ctx.can("commission.read") ? <PrintoutsCard slug={slug} commissionId={view.commission.id} unit={view.unit} hasApprovedSpec={!!view.spec} /> : null}
      <SafetyCaution />
    </div>
  );
}
