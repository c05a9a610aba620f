/** Scalewright's mark: a fretboard seen from above, frets closing up toward the body. */
export function BrandMark({ className = "size-7" }: { className?: string }) {
  const frets = [4, 9.4, 14.1, 18.3, 22, 25.3, 28.2];
  return (
    <svg viewBox="0 0 32 32" className={className} aria-hidden focusable="false">
      <rect x="1" y="1" width="30" height="30" rx="6" className="fill-rosewood-700" />
      <path d="M9 3 L12 29 L20 29 L23 3 Z" className="fill-spruce-100" />
      {frets.map((y) => (
        <line key={y} x1={9.2 + y * 0.11} x2={22.8 - y * 0.11} y1={y} y2={y} className="stroke-brass-600" strokeWidth="0.9" />
      ))}
    </svg>
  );
}
