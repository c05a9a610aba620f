// A spec version's changes against the approved one (lib/workflow/spec-diff), in words a client
// reads: field names instead of paths, enum labels instead of keys, and lengths in the workshop's
// unit whatever unit each version was stored in. Pure: no React.
import { convertLengthInput, formatGaugeIn, formatLengthIn, type LengthUnit } from "@/lib/lutherie/units";
import { CONSTRUCTION_LABELS, type Construction } from "@/lib/schemas/instrument-spec-values";
import type { BuildOptions } from "@/lib/schemas/build-options";
import type { FieldChange } from "@/lib/workflow/spec-diff";
import { OPTION_LABELS, optionText } from "./build-options-labels";

export interface ChangeLine {
  path: string;
  label: string;
  before: string;
  after: string;
}

const LENGTHS: Record<string, string> = {
  "scale.bass": "Bass scale",
  "scale.treble": "Treble scale",
  nutWidth: "Nut width",
  lastFretWidth: "Width at the last fret",
};

const STRING_FIELDS: Record<string, string> = {
  note: "note",
  gaugeIn: "gauge (in)",
  construction: "construction",
  coreIn: "core (in)",
  coreShape: "core shape",
  unitWeightKgPerM: "measured unit weight (kg/m)",
};

const SPEC_FIELDS: Record<string, string> = {
  name: "Name",
  family: "Instrument",
  "scale.perpendicularFret": "Perpendicular fret",
  frets: "Frets",
  referencePitchHz: "Reference A4 (Hz)",
};

const empty = (v: unknown) => v === undefined || v === null || v === "";

/** The change lines for a version, against the versions' own units (`beforeUnits`, `afterUnits`). */
export function describeSpecChanges(changes: readonly FieldChange[], opts: { unit: LengthUnit; afterUnits: LengthUnit }): ChangeLine[] {
  const unitsChange = changes.find((c) => c.path === "spec.units");
  const beforeUnits = (unitsChange?.before as LengthUnit | undefined) ?? opts.afterUnits;
  const length = (v: unknown, from: LengthUnit) => (typeof v === "number" ? formatLengthIn(convertLengthInput(v, from, opts.unit), opts.unit) : "—");
  const lines: ChangeLine[] = [];
  for (const c of changes) {
    const line = describeOne(c, opts.unit, (v, side) => length(v, side === "before" ? beforeUnits : opts.afterUnits));
    // A unit change alone is not a change the client needs to see: every length is shown in one unit.
    if (line && line.before !== line.after) lines.push(line);
  }
  return lines;
}

type Side = "before" | "after";

function describeOne(c: FieldChange, unit: LengthUnit, length: (v: unknown, side: Side) => string): ChangeLine | null {
  const text = (v: unknown) => (empty(v) ? "—" : String(v));
  const both = (f: (v: unknown, side: Side) => string) => ({ before: empty(c.before) ? "—" : f(c.before, "before"), after: empty(c.after) ? "—" : f(c.after, "after") });
  if (c.path.startsWith("options.")) {
    const key = c.path.slice("options.".length) as keyof BuildOptions;
    return { path: c.path, label: OPTION_LABELS[key] ?? key, before: optionText(key, c.before), after: optionText(key, c.after) };
  }
  if (!c.path.startsWith("spec.")) return { path: c.path, label: c.path, before: text(c.before), after: text(c.after) };
  const p = c.path.slice("spec.".length);
  if (p === "units") return null;
  if (LENGTHS[p]) return { path: c.path, label: `${LENGTHS[p]} (${unit})`, ...both(length) };
  if (SPEC_FIELDS[p]) return { path: c.path, label: SPEC_FIELDS[p]!, ...both(text) };
  const s = /^strings\.(\d+)\.(\w+)$/.exec(p);
  if (s) {
    const field = s[2]!;
    const show = field === "construction" ? (v: unknown) => CONSTRUCTION_LABELS[v as Construction] ?? String(v) : field === "gaugeIn" || field === "coreIn" ? (v: unknown) => (typeof v === "number" ? formatGaugeIn(v) : String(v)) : text;
    return { path: c.path, label: `String ${Number(s[1]) + 1} ${STRING_FIELDS[field] ?? field}`, ...both(show) };
  }
  const k = /^pickups\.(\d+)\.(\w+)$/.exec(p);
  if (k) {
    const field = k[2]!;
    const n = Number(k[1]) + 1;
    if (field === "label") return { path: c.path, label: `Pickup ${n} name`, ...both(text) };
    const label = field === "fromBridgeTreble" ? `Pickup ${n} from the bridge, treble side (${unit})` : `Pickup ${n} from the bridge (${unit})`;
    return { path: c.path, label, ...both(length) };
  }
  const k2 = /^constants\.(.+)$/.exec(p);
  if (k2) return { path: c.path, label: `Constant ${k2[1]}`, ...both(text) };
  return { path: c.path, label: p, ...both(text) };
}
