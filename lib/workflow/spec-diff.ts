// What changed between two spec versions, for the client's re-approval step.

export interface FieldChange {
  /** Dotted path of the changed field, e.g. "strings.5.gaugeIn" or "options.finish". */
  path: string;
  before: unknown;
  after: unknown;
}

const isStructure = (v: unknown): v is Record<string, unknown> | unknown[] => typeof v === "object" && v !== null;

/** Every leaf of a JSON-like value by dotted path (arrays by index). */
function leaves(value: unknown, path: string, out: Map<string, unknown>): Map<string, unknown> {
  if (isStructure(value)) {
    const entries = Array.isArray(value) ? value.map((v, i) => [String(i), v] as const) : Object.entries(value);
    for (const [k, v] of entries) leaves(v, path ? `${path}.${k}` : k, out);
  } else if (value !== undefined) {
    out.set(path, value);
  }
  return out;
}

/** Every leaf that differs between two JSON-like values, added and removed ones included, sorted by path. */
export function diffValues(before: unknown, after: unknown): FieldChange[] {
  const b = leaves(before, "", new Map());
  const a = leaves(after, "", new Map());
  const paths = [...new Set([...b.keys(), ...a.keys()])].sort();
  return paths.filter((p) => !Object.is(b.get(p), a.get(p))).map((p) => ({ path: p, before: b.get(p), after: a.get(p) }));
}

export interface SpecChangeSummary {
  changes: FieldChange[];
  /** Change in total string tension (after − before), newtons. */
  tensionDeltaN: number;
  /** Set when the bridge is a floating tremolo and the total tension changed. */
  tremoloNote: string | null;
}

/** The client's view of a new spec version against the approved one. */
export function summariseSpecChange(input: {
  before: unknown;
  after: unknown;
  beforeTotalTensionN: number;
  afterTotalTensionN: number;
  bridge: "fixed" | "floating_tremolo";
}): SpecChangeSummary {
  const tensionDeltaN = input.afterTotalTensionN - input.beforeTotalTensionN;
  const tremoloNote =
    input.bridge === "floating_tremolo" && Math.abs(tensionDeltaN) >= 0.5
      ? `Total string tension changes by ${tensionDeltaN > 0 ? "+" : ""}${tensionDeltaN.toFixed(1)} N: the tremolo springs must be rebalanced so the bridge floats at its set angle.`
      : null;
  return { changes: diffValues(input.before, input.after), tensionDeltaN, tremoloNote };
}
