export function SiteFooter() {
  return (
    <footer className="border-t border-spruce-200 py-8 text-xs text-graphite-500">
      <div className="mx-auto max-w-6xl space-y-2 px-4 sm:px-6">
        <p>
          Figures are design estimates from idealised physics. Strings under tension can snap: wear eye protection when
          bringing strings to pitch, and follow the string maker&apos;s limits and local licensed practice for mains-powered
          equipment.
        </p>
        <p>Scalewright — software for workshops that build instruments to order.</p>
      </div>
    </footer>
  );
}
