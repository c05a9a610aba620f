// The stored form of a spec version: the spec and build options with the computed results beside
// them. Pure (no connection), shared by the app's drafting and the demo seed.
import { computeSpec } from "@/lib/lutherie/compute-spec";
import type { BuildOptions } from "@/lib/schemas/build-options";
import type { InstrumentSpec } from "@/lib/schemas/instrument-spec";

export function specVersionColumns(spec: InstrumentSpec, options: BuildOptions) {
  const result = computeSpec(spec);
  return {
    spec: JSON.stringify(spec),
    options: JSON.stringify(options),
    result: JSON.stringify(result),
    has_errors: result.issues.some((i) => i.level === "error"),
    total_tension_n: result.totals.tensionN,
  };
}
