// A whole spec converted to the other length unit (the calculator's mm/in switch, presets held in
// mm). Gauges stay in inches; converted lengths are rounded to input precision (units.ts).
import type { InstrumentSpec } from "@/lib/schemas/instrument-spec";
import { convertLengthInput, type LengthUnit } from "./units";

export function convertSpecUnits(spec: InstrumentSpec, to: LengthUnit): InstrumentSpec {
  const from = spec.units;
  if (from === to) return spec;
  const c = (v: number) => convertLengthInput(v, from, to);
  const opt = (v: number | undefined) => (v === undefined ? undefined : c(v));
  return {
    ...spec,
    units: to,
    scale: { ...spec.scale, bass: c(spec.scale.bass), treble: c(spec.scale.treble) },
    nutWidth: opt(spec.nutWidth),
    lastFretWidth: opt(spec.lastFretWidth),
    pickups: spec.pickups.map((p) => ({ ...p, fromBridge: c(p.fromBridge), fromBridgeTreble: opt(p.fromBridgeTreble) })),
  };
}
