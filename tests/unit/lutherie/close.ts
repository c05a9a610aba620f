/** Relative difference |a − b| / |b|, for checks "within 1e-12 relative" (SOURCES §5 tolerances). */
export const rel = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);
