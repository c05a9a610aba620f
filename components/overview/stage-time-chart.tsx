"use client";

// Per stage: the workshop's median days over finished stays beside the median of the commissions
// there now — a stage whose second bar runs past the first is where work is waiting.
import { Bar, BarChart, CartesianGrid, Legend, Tooltip, XAxis, YAxis } from "recharts";
import { CHART_COLORS, CHART_GRID, CHART_INK } from "@/components/build-math/chart-colors";
import type { Overview } from "@/lib/schemas/overview";

const days = (v: number | null) => (v === null ? "no data" : `${v} d`);

export function StageTimeChart({ stageTimes }: Pick<Overview, "stageTimes">) {
  const data = stageTimes.map((s) => ({ name: s.label, median: s.medianDays, current: s.currentMedianDays }));
  const summary = stageTimes.map((s) => `${s.label}: median ${days(s.medianDays)}, now ${days(s.currentMedianDays)}`).join("; ");
  return (
    <figure className="space-y-2">
      <div role="img" aria-label={`Days in each stage. ${summary}`}>
        <BarChart responsive style={{ width: "100%", height: 260 }} data={data} margin={{ top: 8, right: 8, bottom: 8, left: 0 }}>
          <CartesianGrid stroke={CHART_GRID} vertical={false} />
          <XAxis dataKey="name" interval={0} angle={-20} textAnchor="end" height={64} tick={{ fill: CHART_INK, fontSize: 11 }} />
          <YAxis allowDecimals={false} width={40} unit=" d" tick={{ fill: CHART_INK, fontSize: 12 }} />
          <Tooltip formatter={(v) => (v === null || v === undefined ? "no data" : `${v} days`)} />
          <Legend verticalAlign="top" height={28} />
          <Bar dataKey="median" name="Workshop median (finished stays)" fill={CHART_COLORS[3]} isAnimationActive={false} />
          <Bar dataKey="current" name="Median of commissions there now" fill={CHART_COLORS[0]} isAnimationActive={false} />
        </BarChart>
      </div>
      <figcaption className="text-xs text-graphite-500">
        Days are whole UTC calendar days. The median is the middle value of all finished stays in the stage (the mean of the two middle
        ones for an even count).
      </figcaption>
    </figure>
  );
}
