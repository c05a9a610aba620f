// Splitting a long drawing (a fretboard template, nut to bridge) into page-sized windows that tape
// together exactly: consecutive windows overlap, and alignment marks sit in the overlap at the same
// board positions on both pages.

export interface TileOptions {
  /** Board length to cover, mm (e.g. from a little before the nut to a little past the saddle). */
  startMm: number;
  endMm: number;
  /** Length of board one page can show, mm. */
  windowMm: number;
  /** Shared length between consecutive pages, mm. */
  overlapMm: number;
}

export interface Tile {
  /** 0-based page index. */
  index: number;
  /** Board range shown on this page, mm from the nut. */
  fromMm: number;
  toMm: number;
  /** Board positions of the alignment marks printed on this page (shared with the neighbour). */
  alignMarksMm: number[];
}

/** Windows covering [startMm, endMm]; the last one ends at endMm exactly and marks sit mid-overlap. */
export function planTiles(o: TileOptions): Tile[] {
  if (!(o.windowMm > 0) || !(o.overlapMm >= 0) || o.overlapMm >= o.windowMm) {
    throw new RangeError("window must be positive and longer than the overlap");
  }
  if (!(o.endMm > o.startMm)) throw new RangeError("end must be after start");
  const step = o.windowMm - o.overlapMm;
  const total = o.endMm - o.startMm;
  const count = total <= o.windowMm ? 1 : 1 + Math.ceil((total - o.windowMm) / step);
  const tiles: Tile[] = [];
  for (let i = 0; i < count; i++) {
    const fromMm = o.startMm + i * step;
    tiles.push({ index: i, fromMm, toMm: Math.min(fromMm + o.windowMm, o.endMm), alignMarksMm: [] });
  }
  // One mark in the middle of each overlap, printed on both pages that share it.
  for (let i = 0; i + 1 < tiles.length; i++) {
    const mark = tiles[i + 1]!.fromMm + o.overlapMm / 2;
    tiles[i]!.alignMarksMm.push(mark);
    tiles[i + 1]!.alignMarksMm.push(mark);
  }
  return tiles;
}

/** The part of a segment along the board axis that falls inside [from, to] (null when none). */
export function clipToWindow(
  seg: { x1: number; y1: number; x2: number; y2: number },
  from: number,
  to: number,
): { x1: number; y1: number; x2: number; y2: number } | null {
  let { x1, y1, x2, y2 } = seg;
  if (x1 > x2) [x1, y1, x2, y2] = [x2, y2, x1, y1];
  if (x2 < from || x1 > to) return null;
  // Square to the board axis (a fret on a single-scale neck): all of it is in the window.
  if (x1 === x2) return { x1, y1, x2, y2 };
  const at = (x: number) => y1 + ((y2 - y1) * (x - x1)) / (x2 - x1);
  const cx1 = Math.max(x1, from);
  const cx2 = Math.min(x2, to);
  return { x1: cx1, y1: at(cx1), x2: cx2, y2: at(cx2) };
}
