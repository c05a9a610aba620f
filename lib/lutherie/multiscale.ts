// Multi-scale (fanned) fret geometry, SOURCES §2.3 [derived here].
//
// Each edge (bass edge with scale L_b, treble edge with L_t) is its own single-scale string. The
// nut and saddle ends are slid along the neck so that fret p is square to the centre line.
// Coordinates, in the unit the lengths are given in:
//   y — along the centre line toward the bridge, 0 on the perpendicular fret p;
//   x — across the neck, 0 on the centre line, positive toward the bass edge.
//   y_edge(n) = L_edge · (2^(−p/12) − 2^(−n/12))
// The edges converge toward the nut; measuring y along the centre line instead of along the
// slightly slanted edge changes offsets by a factor of about cos(0.5°), under 0.001 mm on a guitar
// (SOURCES §2.3), so the edges are treated as parallel to the centre line for the y values.
// A single-scale neck is the case L_b = L_t (every fret square, offset 0).

import { fretToSaddle, remainingShare } from "./frets";

export interface EdgeScales {
  bass: number;
  treble: number;
  /** The fret that is square to the centre line (0 = nut; may be fractional). */
  perpendicularFret: number;
}

export interface Point {
  x: number;
  y: number;
}

export interface FretGeometry {
  /** Bass-edge y minus treble-edge y: how far the bass end lies toward the bridge. */
  offset: number;
  /** Width between the two edges at this fret, perpendicular to the centre line (null without widths). */
  width: number | null;
  ends: { bass: Point; treble: Point } | null;
  /** Length of the fret between the two edges. */
  length: number | null;
  /** Angle to the perpendicular in degrees; positive when the bass end lies toward the bridge. */
  angleDeg: number | null;
}

/** y of fret n (0 = nut) on one edge of scale L, relative to the perpendicular fret. */
export function edgeY(scaleLength: number, perpendicularFret: number, n: number): number {
  return fretToSaddle(scaleLength, perpendicularFret) - fretToSaddle(scaleLength, n);
}

/** y of an edge's saddle end: +L · 2^(−p/12). */
export function saddleY(scaleLength: number, perpendicularFret: number): number {
  return fretToSaddle(scaleLength, perpendicularFret);
}

/** Axial offset of fret n, bass end minus treble end: (L_b − L_t)(2^(−p/12) − 2^(−n/12)). */
export function fretOffset(scales: EdgeScales, n: number): number {
  return (scales.bass - scales.treble) * (remainingShare(scales.perpendicularFret) - remainingShare(n));
}

/**
 * Width between the edges at fret n when the board tapers straight from nutWidth at the nut to
 * lastFretWidth at fret `lastFret`. Along either edge the fraction of the nut-to-last-fret distance
 * at fret n is (1 − 2^(−n/12)) / (1 − 2^(−N/12)), the same on both edges whatever their scale, so
 * one formula serves both ends [derived here].
 */
export function widthAtFret(nutWidth: number, lastFretWidth: number, lastFret: number, n: number): number {
  const t = (1 - remainingShare(n)) / (1 - remainingShare(lastFret));
  return nutWidth + (lastFretWidth - nutWidth) * t;
}

/** Geometry of fret n (0 = nut) on a neck with the given edge scales and, if known, widths. */
export function fretGeometry(
  scales: EdgeScales,
  n: number,
  widths: { nut: number; lastFret: number; lastFretNumber: number } | null,
): FretGeometry {
  const yBass = edgeY(scales.bass, scales.perpendicularFret, n);
  const yTreble = edgeY(scales.treble, scales.perpendicularFret, n);
  const offset = yBass - yTreble;
  if (!widths) return { offset, width: null, ends: null, length: null, angleDeg: null };
  const width = widthAtFret(widths.nut, widths.lastFret, widths.lastFretNumber, n);
  return {
    offset,
    width,
    ends: { bass: { x: width / 2, y: yBass }, treble: { x: -width / 2, y: yTreble } },
    length: Math.hypot(width, offset),
    // α = atan(offset_n / W_n), SOURCES §2.3.
    angleDeg: (Math.atan2(offset, width) * 180) / Math.PI,
  };
}

/**
 * Scale length of string i of `count` (i = 0 is string 1, the treble edge; i = count − 1 the bass
 * edge), interpolated linearly between the edges: common practice, no source (SOURCES §2.3).
 */
export function interpolatedScale(scales: Pick<EdgeScales, "bass" | "treble">, index: number, count: number): number {
  if (count <= 1) return (scales.bass + scales.treble) / 2;
  return scales.treble + ((scales.bass - scales.treble) * index) / (count - 1);
}
