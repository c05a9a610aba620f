"use client";

// Open commissions per builder, stacked by stage in the workshop's order.
import { Bar, BarChart, CartesianGrid, Legend, Tooltip, XAxis, YAxis } from "recharts";
import { CHART_GRID, CHART_INK } from "@/components/build-math/chart-colors";
import type { Overview } from "@/lib/schemas/overview";
import { stageColor } from "./stage-colors";

export function WorkloadChart({ stages, workload }: Pick<Overview, "stages" | "workload">) {
  const used = stages.filter((s) => workload.some((w) => w.byStage[s.key]));
  const data = workload.map((w) => ({ name: w.builder?.name ?? "Nobody yet", ...w.byStage }));
  const summary = workload.map((w) => `${w.builder?.name ?? "nobody assigned"}: ${w.open} open`).join(", ");
  if (workload.every((w) => w.open === 0)) return <p className="text-sm text-graphite-500">No open commissions.</p>;
  return (
    <figure className="space-y-2">
      <div role="img" aria-label={`Open commissions per builder, by stage. ${summary}`}>
        <BarChart responsive style={{ width: "100%", height: Math.max(180, 48 * data.length + 60) }} data={data} layout="vertical" margin={{ top: 8, right: 16, bottom: 8, left: 8 }}>
          <CartesianGrid stroke={CHART_GRID} horizontal={false} />
          <XAxis type="number" allowDecimals={false} tick={{ fill: CHART_INK, fontSize: 12 }} />
          <YAxis type="category" dataKey="name" width={120} tick={{ fill: CHART_INK, fontSize: 12 }} />
          <Tooltip />
          <Legend verticalAlign="top" height={36} />
          {used.map((s) => (
            <Bar key={s.key} dataKey={s.key} name={s.label} stackId="stages" fill={stageColor(stages.indexOf(s), s.key)} isAnimationActive={false} />
          ))}
        </BarChart>
      </div>
      <figcaption className="text-xs text-graphite-500">Each bar is one builder&apos;s open commissions, coloured by the stage they are in.</figcaption>
    </figure>
  );
}
