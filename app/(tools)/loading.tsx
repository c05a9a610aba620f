// The calculator's shell while it loads: heading, caution and the two columns.
export default function Loading() {
  return (
    <div className="mx-auto max-w-[96rem] animate-pulse px-4 py-10 sm:px-6" aria-busy="true" aria-label="Loading">
      <div className="h-9 w-64 rounded bg-spruce-200" />
      <div className="mt-4 h-16 rounded-panel border-2 border-amber-100 bg-amber-50" />
      <div className="mt-6 grid gap-6 lg:grid-cols-[minmax(0,38rem)_1fr]">
        <div className="h-[32rem] rounded-panel bg-spruce-100" />
        <div className="h-[32rem] rounded-panel bg-spruce-100" />
      </div>
    </div>
  );
}
