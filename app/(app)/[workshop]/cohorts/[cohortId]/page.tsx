import type { Metadata } from "next";
import Link from "next/link";
import { CommissionCell } from "@/components/overview/commission-cell";
import { notFound } from "next/navigation";
import { CohortProgressBar } from "@/components/overview/cohort-progress-bar";
import { Badge } from "@/components/ui/badge";
import { Card, CardBody, CardHeader } from "@/components/ui/card";
import { Table, TBody, Td, Th, THead } from "@/components/ui/table";
import { requireWorkshopPage } from "@/lib/auth/pages";
import { getCohortDetail, listAssignableCommissions } from "@/lib/data/cohorts";
import { listCommissionPeople } from "@/lib/data/commissions";
import { getWorkshopSettings } from "@/lib/data/workshop-settings";
import { AppError } from "@/lib/http/errors";
import { commissionsListHref } from "@/lib/overview/drill-down";
import { openStages } from "@/lib/overview/figures";
import { idParamSchema } from "@/lib/schemas/ids";
import { CohortForm } from "../cohort-form";
import { AddCommission, DeleteCohort, RemoveCommission } from "./cohort-manage-client";

export const metadata: Metadata = { title: "Cohort" };

const link = "text-sm font-semibold text-rosewood-700 underline-offset-2 hover:underline";

export default async function CohortPage({ params }: { params: Promise<{ workshop: string; cohortId: string }> }) {
  const { workshop: slug, cohortId: rawId } = await params;
  const ctx = await requireWorkshopPage(slug, "cohort.read", `/${slug}/cohorts/${rawId}`);
  const id = idParamSchema.safeParse(rawId);
  if (!id.success) notFound();
  const cohort = await getCohortDetail(ctx.scope, id.data).catch((err) => {
    if (err instanceof AppError && err.code === "not_found") notFound();
    throw err;
  });
  const manage = ctx.can("cohort.manage");
  const assign = ctx.can("commission.assign");
  const [settings, people, assignable] = await Promise.all([
    getWorkshopSettings(ctx.scope),
    manage ? listCommissionPeople(ctx.scope) : null,
    assign ? listAssignableCommissions(ctx.scope, cohort.id) : [],
  ]);
  const stageKeys = openStages(settings.buildStages).map((s) => s.key);

  return (
    <div className="space-y-6">
      <div className="flex flex-wrap items-end justify-between gap-3">
        <div>
          <Link href={`/${slug}/cohorts`} className={link}>
            ← Cohorts
          </Link>
          <h2 className="text-xl font-semibold">{cohort.name}</h2>
          <p className="font-mono text-sm text-graphite-600">
            {cohort.startsOn} – {cohort.endsOn}
          </p>
        </div>
        <div className="flex flex-wrap gap-3">
          {ctx.can("overview.read") ? (
            <Link href={`/${slug}/overview?cohort=${cohort.id}`} className={link}>
              Overview of this cohort
            </Link>
          ) : null}
          <Link href={commissionsListHref(slug, { cohort: cohort.id })} className={link}>
            In the commissions table
          </Link>
        </div>
      </div>

      <Card>
        <CardHeader title="Progress" subtitle={cohort.builders.length ? `Builders: ${cohort.builders.map((b) => b.name).join(", ")}` : "No builders yet"} />
        <CardBody className="space-y-4">
          <CohortProgressBar progress={cohort.progress} stageKeys={stageKeys} />
          <ul className="flex flex-wrap gap-2 text-xs">
            {cohort.progress.byStage.map((s) => (
              <li key={s.stage} className="rounded-chip bg-spruce-50 px-2 py-1">
                {s.label}: <span className="font-mono font-semibold">{s.n}</span>
              </li>
            ))}
          </ul>
        </CardBody>
      </Card>

      <Card>
        <CardHeader title="Commissions in this cohort" subtitle={`${cohort.commissions.length} commission${cohort.commissions.length === 1 ? "" : "s"}`} />
        <div className="space-y-3 p-3">
          {assign ? <AddCommission slug={slug} cohortId={cohort.id} options={assignable} /> : null}
          {cohort.commissions.length === 0 ? (
            <p className="px-2 text-sm text-graphite-500">No commissions in this cohort yet.</p>
          ) : (
            <Table caption="Commissions in this cohort" className="min-w-[36rem]">
              <THead>
                <tr>
                  <Th>Commission</Th>
                  <Th>Stage</Th>
                  <Th>Builder</Th>
                  <Th>Target</Th>
                  {assign ? <Th className="text-right">Cohort</Th> : null}
                </tr>
              </THead>
              <TBody>
                {cohort.commissions.map((c) => (
                  <tr key={c.id}>
                    <Td>
                      <CommissionCell slug={slug} commission={c} />
                    </Td>
                    <Td>{c.stageLabel}</Td>
                    <Td>{c.builder?.name ?? "Nobody yet"}</Td>
                    <Td className="whitespace-nowrap font-mono">
                      {c.targetDate ?? "—"} {c.overdue ? <Badge tone="danger">Overdue</Badge> : null}
                    </Td>
                    {assign ? (
                      <Td className="text-right">
                        <RemoveCommission slug={slug} commission={c} />
                      </Td>
                    ) : null}
                  </tr>
                ))}
              </TBody>
            </Table>
          )}
        </div>
      </Card>

      {manage && people ? (
        <div className="grid gap-6 lg:grid-cols-[3fr_2fr]">
          <Card className="min-w-0">
            <CardHeader title="Change the cohort" />
            <CardBody>
              <CohortForm
                slug={slug}
                builders={people.builders}
                cohortId={cohort.id}
                initial={{ name: cohort.name, startsOn: cohort.startsOn, endsOn: cohort.endsOn, builderIds: cohort.builders.map((b) => b.id) }}
              />
            </CardBody>
          </Card>
          <Card className="min-w-0 self-start">
            <CardHeader title="Remove the cohort" subtitle="Its commissions stay, without a cohort" />
            <CardBody>
              <DeleteCohort slug={slug} cohort={{ id: cohort.id, name: cohort.name, commissions: cohort.commissions.length }} />
            </CardBody>
          </Card>
        </div>
      ) : null}
    </div>
  );
}
