"use client";

// Tension per string as bars, with the common-practice band for the family behind them.
import { Bar, BarChart, CartesianGrid, Cell, ReferenceArea, Tooltip, XAxis, YAxis } from "recharts";
import type { ComputeResult } from "@/lib/schemas/instrument-spec";
import { TENSION_RANGES_N } from "@/lib/lutherie/practice";
import { forceUnitFor, formatForce, newtonsToLbf } from "@/lib/lutherie/units";
import { CHART_BAND, CHART_COLORS, CHART_DANGER, CHART_GRID, CHART_INK } from "./chart-colors";

export function TensionChart({ result }: { result: Pick<ComputeResult, "strings" | "units" | "family" | "issues"> }) {
  const unit = forceUnitFor(result.units);
  const toUnit = (n: number) => (unit === "lbf" ? newtonsToLbf(n) : n);
  const band = TENSION_RANGES_N[result.family];
  const flagged = new Set(result.issues.filter((i) => i.level === "error").map((i) => i.path.split(".")[1]));
  const data = result.strings.map((s, i) => ({
    name: `${s.string} · ${s.note}`,
    tension: Number(formatForce(s.tensionN, unit)),
    both: `${formatForce(s.tensionN, "N")} N / ${formatForce(s.tensionN, "lbf")} lbf`,
    danger: flagged.has(String(i)),
  }));
  const summary = result.strings.map((s) => `string ${s.string} ${s.note} ${formatForce(s.tensionN, unit)} ${unit}`).join(", ");
  return (
    <figure className="space-y-2">
      <div role="img" aria-label={`Tension per string in ${unit}: ${summary}`}>
        <BarChart responsive style={{ width: "100%", height: 260 }} data={data} margin={{ top: 8, right: 8, bottom: 8, left: 0 }}>
          <CartesianGrid stroke={CHART_GRID} vertical={false} />
          <ReferenceArea y1={toUnit(band.typicalLow)} y2={toUnit(band.typicalHigh)} fill={CHART_BAND} fillOpacity={0.7} ifOverflow="extendDomain" />
          <XAxis dataKey="name" tick={{ fill: CHART_INK, fontSize: 12 }} />
          <YAxis tick={{ fill: CHART_INK, fontSize: 12 }} width={48} unit={` ${unit}`} />
          <Tooltip formatter={(_v, _n, item) => [(item.payload as { both: string }).both, "Tension"]} />
          <Bar dataKey="tension" name={`Tension (${unit})`} isAnimationActive={false}>
            {data.map((d) => (
              <Cell key={d.name} fill={d.danger ? CHART_DANGER : CHART_COLORS[1]} />
            ))}
          </Bar>
        </BarChart>
      </div>
      <figcaption className="text-xs text-graphite-500">
        Green band: typical tension for a {result.family} string, {formatForce(band.typicalLow, unit)}–{formatForce(band.typicalHigh, unit)} {unit} —
        common practice, no source; players and styles vary. Red bars: strings with an error.
      </figcaption>
    </figure>
  );
}
