"use client";

// Everything a ComputeResult shows: issues, strings, tension chart, frets, pickups. Props only, so
// the calculator and (later) the commission spec editor render the same figures the same way.
import { Card, CardBody, CardHeader } from "@/components/ui/card";
import type { ComputeResult } from "@/lib/schemas/instrument-spec";
import { forceUnitFor, formatForce, formatLengthIn } from "@/lib/lutherie/units";
import { IssueList } from "./issue-list";
import { FretTable, HarmonicsChart, TensionChart } from "./lazy-charts";
import { PickupTable } from "./pickup-table";
import { StringTable } from "./string-table";

export interface BuildResultsProps {
  result: ComputeResult;
  onSelectIssue?: (path: string) => void;
  /** True while the figures belong to the last valid spec, not the one being edited. */
  stale?: boolean;
  fileName?: string;
}

export function BuildResults({ result, onSelectIssue, stale = false, fileName }: BuildResultsProps) {
  const fu = forceUnitFor(result.units);
  const errors = result.issues.filter((i) => i.level === "error").length;
  const warnings = result.issues.length - errors;
  return (
    <div className={stale ? "space-y-6 opacity-60" : "space-y-6"} aria-busy={stale || undefined}>
      <Card>
        <CardHeader
          title="Checks"
          subtitle={`${errors} error${errors === 1 ? "" : "s"}, ${warnings} warning${warnings === 1 ? "" : "s"}. Warnings use common-practice ranges.`}
        />
        <CardBody>
          <IssueList issues={result.issues} onSelect={onSelectIssue} />
        </CardBody>
      </Card>

      <dl className="grid grid-cols-2 gap-3 sm:grid-cols-4">
        <Stat label="Total string tension" value={`${formatForce(result.totals.tensionN, fu)} ${fu}`} testId="total-tension" />
        <Stat label="Scale" value={result.scale.multiScale ? `${formatLengthIn(result.scale.bass, result.units)}–${formatLengthIn(result.scale.treble, result.units)} ${result.units}` : `${formatLengthIn(result.scale.bass, result.units)} ${result.units}`} />
        <Stat label="Fret 12 from nut (bass)" value={`${formatLengthIn(result.frets[12]?.fromNut.bass ?? Number.NaN, result.units)} ${result.units}`} testId="fret-12" />
        <Stat label="Tension ranges for" value={result.family} />
      </dl>

      <Card>
        <CardHeader title="Tension per string" subtitle="T = μ(2Lf)²; stress against the ASTM A228 minimum for the core" />
        <CardBody className="space-y-4">
          <TensionChart result={result} />
          <StringTable result={result} />
        </CardBody>
      </Card>

      <Card>
        <CardHeader title="Fret positions" subtitle={result.scale.multiScale ? "Fanned: each edge is its own scale" : "Single scale"} />
        <CardBody>
          <FretTable result={result} fileName={fileName} />
        </CardBody>
      </Card>

      <Card>
        <CardHeader title="Harmonics at each pickup" subtitle="|sin(nπx/L)| at the centre line; per string below" />
        <CardBody className="space-y-4">
          <HarmonicsChart result={result} />
          <PickupTable result={result} />
        </CardBody>
      </Card>
    </div>
  );
}

function Stat({ label, value, testId }: { label: string; value: string; testId?: string }) {
  return (
    <div className="rounded-panel border border-spruce-200 bg-white px-4 py-3">
      <dt className="text-2xs font-semibold uppercase tracking-wider text-graphite-500">{label}</dt>
      <dd className="mt-1 font-mono text-lg tabular" data-testid={testId}>
        {value}
      </dd>
    </div>
  );
}
