// The caution every build-math screen shows (SOURCES §6).
export function SafetyCaution() {
  return (
    <aside role="note" aria-label="Safety caution" className="rounded-panel border-2 border-amber-500 bg-amber-50 px-4 py-3 text-sm text-graphite-900">
      <p className="font-semibold text-amber-700">Caution: strings under tension can snap.</p>
      <p className="mt-1">
        Wear eye protection when bringing strings to pitch, doing pull tests and clipping string ends, and keep your face out of line
        with the string. The figures here are estimates from idealised physics, not guarantees of safe loads: follow the string
        maker&apos;s limits and local licensed practice.
      </p>
    </aside>
  );
}
