"use client";

// Harmonic weight |sin(nπx/L)| per pickup, n = 1…16, at the neck's centre line.
import { Bar, BarChart, CartesianGrid, Legend, Tooltip, XAxis, YAxis } from "recharts";
import type { ComputeResult } from "@/lib/schemas/instrument-spec";
import { formatWeight } from "@/lib/lutherie/units";
import { CHART_COLORS, CHART_GRID, CHART_INK } from "./chart-colors";

export function HarmonicsChart({ result }: { result: Pick<ComputeResult, "pickups"> }) {
  if (result.pickups.length === 0) return <p className="text-sm text-graphite-500">Add a pickup to see which harmonics it picks up.</p>;
  const count = result.pickups[0]!.harmonics.length;
  const data = Array.from({ length: count }, (_, k) => {
    const row: Record<string, number | string> = { n: k + 1 };
    result.pickups.forEach((p, j) => (row[`p${j}`] = Number(formatWeight(p.harmonics[k]!.weight))));
    return row;
  });
  const summary = result.pickups
    .map((p) => `${p.label}: nearly cancels ${p.nearlyCancelled.length ? p.nearlyCancelled.join(", ") : "none"}`)
    .join("; ");
  return (
    <figure className="space-y-2">
      <div role="img" aria-label={`Harmonic weight by pickup, harmonics 1 to ${count}. ${summary}`}>
        <BarChart responsive style={{ width: "100%", height: 280 }} data={data} margin={{ top: 8, right: 8, bottom: 8, left: 0 }}>
          <CartesianGrid stroke={CHART_GRID} vertical={false} />
          <XAxis dataKey="n" tick={{ fill: CHART_INK, fontSize: 12 }} label={{ value: "harmonic n", position: "insideBottom", offset: -4, fontSize: 12 }} />
          <YAxis domain={[0, 1]} tick={{ fill: CHART_INK, fontSize: 12 }} width={40} />
          <Tooltip />
          <Legend verticalAlign="top" height={28} />
          {result.pickups.map((p, j) => (
            <Bar key={`${p.label}-${j}`} dataKey={`p${j}`} name={p.label} fill={CHART_COLORS[j % CHART_COLORS.length]} isAnimationActive={false} />
          ))}
        </BarChart>
      </div>
      <figcaption className="text-xs text-graphite-500">
        Relative weight |sin(nπx/L)| of each harmonic at the pickup (ideal string, point pickup; pluck position and electronics not
        included). 0 means the pickup sits on a node of that harmonic.
      </figcaption>
    </figure>
  );
}
