// A workshop's setup ranges between the workshop's unit (the owner's form) and storage (mm). Pure.
import { INPUT_DECIMALS, fromMm, roundTo, toMm, type LengthUnit } from "@/lib/lutherie/units";
import type { WorkshopSetupRanges } from "@/lib/schemas/setup-ranges";
import { RANGE_FIELDS } from "@/lib/schemas/setup-ranges-values";
import type { SetupRanges } from "./ranges";

function mapFamily(r: SetupRanges, f: (v: number) => number): SetupRanges {
  const out = { ...r };
  for (const { key } of RANGE_FIELDS) out[key] = { min: f(r[key].min), max: f(r[key].max) };
  return out;
}

export function rangesToDisplay(r: WorkshopSetupRanges, unit: LengthUnit): WorkshopSetupRanges {
  const f = (mm: number) => roundTo(fromMm(mm, unit), INPUT_DECIMALS[unit]);
  return { guitar: mapFamily(r.guitar, f), bass: mapFamily(r.bass, f) };
}

export function rangesFromDisplay(r: WorkshopSetupRanges, unit: LengthUnit): WorkshopSetupRanges {
  const f = (v: number) => toMm(v, unit);
  return { guitar: mapFamily(r.guitar, f), bass: mapFamily(r.bass, f) };
}
