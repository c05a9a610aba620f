// What a chart's (or helper's) place shows while its code loads (they load after the page: see
// lazy-charts.tsx). Same height as what replaces it, so nothing below it jumps.
export function ChartLoading({ height, label = "Drawing the chart…" }: { height: number; label?: string }) {
  return (
    <div role="status" aria-busy="true" style={{ height }} className="flex items-center justify-center rounded-panel bg-spruce-50 text-sm text-graphite-500">
      {label}
    </div>
  );
}
