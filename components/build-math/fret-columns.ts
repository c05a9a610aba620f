// The fret table's columns, defined once for the on-screen table, the clipboard copy and the CSV.
// Values come from a ComputeResult (lengths already in its units); text goes through units.ts.
import type { ComputeResult, FretRow } from "@/lib/schemas/instrument-spec";
import { formatCents, formatDegrees, formatLengthIn, type LengthUnit } from "@/lib/lutherie/units";

export interface FretColumn {
  id: string;
  header: string;
  value: (row: FretRow) => number | null;
  text: (v: number | null) => string;
}

/** Columns for a result: edge pairs on a fanned neck, one value per quantity on a single scale. */
export function fretColumns(result: Pick<ComputeResult, "units" | "scale" | "frets">): FretColumn[] {
  const u: LengthUnit = result.units;
  const len = (v: number | null) => (v === null ? "" : formatLengthIn(v, u));
  const fan = result.scale.multiScale;
  const hasWidths = result.frets[0]?.width !== null;
  const pair = (id: string, header: string, pick: (r: FretRow) => { bass: number; treble: number }): FretColumn[] =>
    fan
      ? [
          { id: `${id}-bass`, header: `${header}, bass (${u})`, value: (r) => pick(r).bass, text: len },
          { id: `${id}-treble`, header: `${header}, treble (${u})`, value: (r) => pick(r).treble, text: len },
        ]
      : [{ id, header: `${header} (${u})`, value: (r) => pick(r).bass, text: len }];
  const cols: FretColumn[] = [
    { id: "n", header: "Fret", value: (r) => r.n, text: (v) => (v === 0 ? "nut" : String(v)) },
    ...pair("from-nut", "From nut", (r) => r.fromNut),
    ...pair("spacing", "From previous", (r) => r.fromPrevious),
    ...pair("to-saddle", "To saddle", (r) => r.toSaddle),
  ];
  if (fan) {
    cols.push({ id: "offset", header: `Bass end toward bridge (${u})`, value: (r) => r.offset, text: len });
    if (hasWidths) {
      cols.push({ id: "angle", header: "Angle (°)", value: (r) => r.angleDeg, text: (v) => (v === null ? "" : formatDegrees(v)) });
      cols.push({ id: "length", header: `Fret length (${u})`, value: (r) => r.length, text: len });
    }
  }
  cols.push(...pair("rule18", "Rule of 18", (r) => r.ruleOf18FromNut));
  cols.push({ id: "rule18-cents", header: "Rule of 18 error (cents)", value: (r) => r.ruleOf18Cents, text: (v) => (v === null ? "" : formatCents(v)) });
  return cols;
}

/** The table as text rows (header first), for the clipboard and the CSV file. */
export function fretTableText(result: Pick<ComputeResult, "units" | "scale" | "frets">): string[][] {
  const cols = fretColumns(result);
  return [cols.map((c) => c.header), ...result.frets.map((r) => cols.map((c) => c.text(c.value(r))))];
}
