import type { Metadata } from "next";
import { CohortHeading } from "@/components/overview/cohort-heading";
import { CohortProgressBar } from "@/components/overview/cohort-progress-bar";
import { Card, CardBody, CardHeader } from "@/components/ui/card";
import { requireWorkshopPage } from "@/lib/auth/pages";
import { listCohorts } from "@/lib/data/cohorts";
import { listCommissionPeople } from "@/lib/data/commissions";
import { getWorkshopSettings } from "@/lib/data/workshop-settings";
import { openStages } from "@/lib/overview/figures";
import { CohortForm } from "./cohort-form";

export const metadata: Metadata = { title: "Cohorts" };

// Course cohorts: the owner creates and manages them; a builder sees the cohorts they build in;
// a bookkeeper sees them all.
export default async function CohortsPage({ params }: { params: Promise<{ workshop: string }> }) {
  const { workshop: slug } = await params;
  const ctx = await requireWorkshopPage(slug, "cohort.read", `/${slug}/cohorts`);
  const manage = ctx.can("cohort.manage");
  const [cohorts, settings, people] = await Promise.all([listCohorts(ctx.scope), getWorkshopSettings(ctx.scope), manage ? listCommissionPeople(ctx.scope) : null]);
  const stageKeys = openStages(settings.buildStages).map((s) => s.key);

  return (
    <div className="grid gap-6 lg:grid-cols-[3fr_2fr]">
      <Card className="min-w-0">
        <CardHeader title={manage ? "Cohorts" : "Your cohorts"} subtitle="Courses whose students build commissions, with each one's progress" />
        <CardBody>
          {cohorts.length === 0 ? (
            <p className="text-sm text-graphite-500">{manage ? "No cohorts yet." : "You are not in a cohort."}</p>
          ) : (
            <ul className="space-y-4">
              {cohorts.map((c) => (
                <li key={c.id} aria-label={`Cohort ${c.name}`} className="rounded-panel border border-spruce-200 p-3">
                  <CohortHeading slug={slug} cohort={c} className="font-semibold text-rosewood-700 underline-offset-2 hover:underline" />
                  <p className="mb-2 text-xs text-graphite-600">{c.builders.length ? c.builders.map((b) => b.name).join(", ") : "No builders yet"}</p>
                  <CohortProgressBar progress={c.progress} stageKeys={stageKeys} />
                </li>
              ))}
            </ul>
          )}
        </CardBody>
      </Card>
      {manage && people ? (
        <Card className="min-w-0 self-start">
          <CardHeader title="New cohort" subtitle="Name, dates and the builders in it; add commissions on its page" />
          <CardBody>
            <CohortForm slug={slug} builders={people.builders} />
          </CardBody>
        </Card>
      ) : null}
    </div>
  );
}
