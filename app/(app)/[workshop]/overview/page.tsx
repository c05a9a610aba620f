import type { Metadata } from "next";
import Link from "next/link";
import { StageTimeChart, WorkloadChart } from "@/components/overview/lazy-charts";
import { Alert } from "@/components/ui/alert";
import { Card, CardBody, CardHeader } from "@/components/ui/card";
import { requireWorkshopPage } from "@/lib/auth/pages";
import { listCommissionPeople } from "@/lib/data/commissions";
import { getOverview } from "@/lib/data/overview";
import { AppError } from "@/lib/http/errors";
import { formatMoney, money } from "@/lib/money/money";
import { commissionsListHref } from "@/lib/overview/drill-down";
import { overviewQuerySchema } from "@/lib/schemas/overview";
import { CohortCards } from "./cohort-cards";
import { CohortFilter } from "./cohort-filter";
import { OverdueList, UpcomingList } from "./date-lists";
import { DepositsTable } from "./deposits-table";
import { InStageTable } from "./in-stage-table";
import { WorkloadTable } from "./workload-table";

export const metadata: Metadata = { title: "Overview" };

const link = "text-sm font-semibold text-rosewood-700 underline-offset-2 hover:underline";

// The owner's view across builders (a bookkeeper sees it too, without reassigning).
export default async function OverviewPage({ params, searchParams }: { params: Promise<{ workshop: string }>; searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const { workshop: slug } = await params;
  const ctx = await requireWorkshopPage(slug, "overview.read", `/${slug}/overview`);
  const raw = await searchParams;
  const parsed = overviewQuerySchema.safeParse({ cohort: raw.cohort || undefined });
  let notice = parsed.success ? null : "That cohort filter is not valid; showing every commission.";
  const query = parsed.success ? parsed.data : overviewQuerySchema.parse({});
  const overview = await getOverview(ctx.scope, query).catch(async (err) => {
    if (!(err instanceof AppError) || err.code !== "not_found") throw err;
    notice = "There is no such cohort; showing every commission.";
    return getOverview(ctx.scope, { ...query, cohort: undefined });
  });
  const builders = ctx.can("commission.assign") ? (await listCommissionPeople(ctx.scope)).builders : null;
  const cohort = overview.cohort?.id;

  return (
    <div className="space-y-6">
      <div className="flex flex-wrap items-end justify-between gap-4">
        <div>
          <h2 className="text-xl font-semibold">{overview.cohort ? `Overview: ${overview.cohort.name}` : "Overview"}</h2>
          <p className="text-sm text-graphite-600">
            As of {overview.asOf} (UTC) ·{" "}
            <Link className={link} href={commissionsListHref(slug, { cohort })}>
              {overview.openTotal} open commission{overview.openTotal === 1 ? "" : "s"}
            </Link>{" "}
            ·{" "}
            <Link className={link} href={commissionsListHref(slug, { overdue: true, cohort })}>
              {overview.workload.reduce((n, w) => n + w.overdue, 0)} overdue
            </Link>
            {overview.depositsOutstanding?.totals.map((t) => ` · ${formatMoney(money(t.outstandingMinor, t.currency))} in deposits outstanding`)}
          </p>
        </div>
        <CohortFilter slug={slug} overview={overview} />
      </div>
      {notice ? <Alert tone="warning">{notice}</Alert> : null}

      <Card>
        <CardHeader title="Workload" subtitle="Open commissions by builder and stage; each number opens the commissions table" />
        <CardBody className="space-y-4">
          <WorkloadChart stages={overview.stages} workload={overview.workload} />
          <WorkloadTable slug={slug} overview={overview} />
        </CardBody>
      </Card>

      <Card>
        <CardHeader title="Time in stage" subtitle="Days in the current stage against the workshop's median for that stage" />
        <CardBody>
          <StageTimeChart stageTimes={overview.stageTimes} />
        </CardBody>
        <div className="p-3 pt-0">
          <InStageTable slug={slug} overview={overview} builders={builders} />
          {overview.openTotal > overview.inStage.length ? (
            <p className="mt-2 text-xs text-graphite-500">
              The {overview.inStage.length} furthest past their median of {overview.openTotal}.{" "}
              <Link className={link} href={commissionsListHref(slug, { cohort })}>
                See all
              </Link>
            </p>
          ) : null}
        </div>
      </Card>

      <div className="grid gap-6 lg:grid-cols-2">
        <Card>
          <CardHeader title="Overdue" subtitle="Target date passed, not delivered" action={<Link className={link} href={commissionsListHref(slug, { overdue: true, cohort })}>In the table</Link>} />
          <CardBody>
            <OverdueList slug={slug} overview={overview} />
          </CardBody>
        </Card>
        <Card>
          <CardHeader title="Upcoming target dates" subtitle={`The next ${overview.upcomingDays} days`} />
          <CardBody>
            <UpcomingList slug={slug} overview={overview} />
          </CardBody>
        </Card>
      </div>

      {overview.depositsOutstanding ? (
        <Card>
          <CardHeader title="Deposits outstanding" subtitle="Asked for (the spec is approved) and not yet paid in full" />
          <div className="p-3">
            <DepositsTable slug={slug} deposits={overview.depositsOutstanding} />
          </div>
        </Card>
      ) : null}

      <Card>
        <CardHeader title="Cohorts" subtitle="Each course's commissions by stage and the share delivered" action={<Link className={link} href={`/${slug}/cohorts`}>{ctx.can("cohort.manage") ? "Manage cohorts" : "See cohorts"}</Link>} />
        <CardBody>
          <CohortCards slug={slug} overview={overview} />
        </CardBody>
      </Card>
    </div>
  );
}
