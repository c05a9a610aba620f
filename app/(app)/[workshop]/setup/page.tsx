import type { Metadata } from "next";
import Link from "next/link";
import { StatusBadge } from "@/components/setup/setup-readout";
import { Badge } from "@/components/ui/badge";
import { Card, CardBody, CardHeader } from "@/components/ui/card";
import { TBody, THead, Table, Td, Th } from "@/components/ui/table";
import { requireWorkshopPage } from "@/lib/auth/pages";
import { formatLength } from "@/lib/lutherie/units";
import { getWorkshopSetupRanges } from "@/lib/data/setup-ranges";
import { listSetupQueue } from "@/lib/data/setup-sheets";
import { RANGE_FIELDS } from "@/lib/schemas/setup-ranges";
import { RangesForm } from "./ranges-form";

export const metadata: Metadata = { title: "Final setup" };

// The workshop's setup area: commissions in final setup (and delivered ones) with where their
// sheet stands, and the common-practice ranges the sheets are checked against (the owner edits them).
export default async function SetupAreaPage({ params }: { params: Promise<{ workshop: string }> }) {
  const { workshop: slug } = await params;
  const ctx = await requireWorkshopPage(slug, "setup.read", `/${slug}/setup`);
  const [queue, ranges] = await Promise.all([listSetupQueue(ctx.scope), getWorkshopSetupRanges(ctx.scope)]);
  const unit = ctx.workshop.unitPreference;
  const showRanges = ctx.scope.role !== "client";

  return (
    <div className="space-y-6">
      <Card>
        <CardHeader title="Final setup" subtitle="Commissions in final setup first, then delivered ones" />
        {queue.length ? (
          <Table caption="Commissions and their setup sheets">
            <THead>
              <tr>
                <Th>Number</Th>
                <Th>Commission</Th>
                <Th>Stage</Th>
                <Th>Setup sheet</Th>
              </tr>
            </THead>
            <TBody>
              {queue.map((c) => (
                <tr key={c.id}>
                  <Td className="font-mono">{c.number}</Td>
                  <Td>
                    <Link href={`/${slug}/commissions/${c.id}/setup`} className="font-semibold text-rosewood-700 underline-offset-2 hover:underline">
                      {c.title}
                    </Link>
                  </Td>
                  <Td>{c.stageLabel}</Td>
                  <Td>{c.status === "none" ? <Badge>Not started</Badge> : <StatusBadge status={c.status} />}</Td>
                </tr>
              ))}
            </TBody>
          </Table>
        ) : (
          <CardBody>
            <p className="text-sm text-graphite-600">No commission is in final setup or delivered yet.</p>
          </CardBody>
        )}
      </Card>

      {showRanges ? (
        <Card>
          <CardHeader
            title="Common-practice ranges"
            subtitle={`Typical values the setup checks warn outside of: starting points, not rules; they vary with player, style and instrument. ${ranges.customised ? "This workshop's own values." : "The defaults."}`}
          />
          <CardBody>
            {ctx.can("settings.manage") ? (
              <RangesForm slug={slug} unit={unit} ranges={ranges.ranges} customised={ranges.customised} />
            ) : (
              <Table caption={`Common-practice ranges (${unit})`}>
                <THead>
                  <tr>
                    <Th>Measure</Th>
                    <Th>Guitar</Th>
                    <Th>Bass</Th>
                  </tr>
                </THead>
                <TBody>
                  {RANGE_FIELDS.map((r) => (
                    <tr key={r.key}>
                      <Td>{r.label}</Td>
                      {(["guitar", "bass"] as const).map((f) => (
                        <Td key={f} numeric>
                          {formatLength(ranges.ranges[f][r.key].min, unit)}–{formatLength(ranges.ranges[f][r.key].max, unit)} {unit}
                        </Td>
                      ))}
                    </tr>
                  ))}
                </TBody>
              </Table>
            )}
          </CardBody>
        </Card>
      ) : null}
    </div>
  );
}
