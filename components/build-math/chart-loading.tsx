// What a chart's place shows while its code loads (the charts load after the page: see
// lazy-charts.tsx). Same height as the chart, so nothing below it jumps.
export function ChartLoading({ height }: { height: number }) {
  return (
    <div role="status" aria-busy="true" style={{ height }} className="flex items-center justify-center rounded-panel bg-spruce-50 text-sm text-graphite-500">
      Drawing the chart…
    </div>
  );
}
