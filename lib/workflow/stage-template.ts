// Editing a workshop's build-stage template: keys for new stages, and which stages an edit drops.
// Pure. A stage keeps its key for life (commissions and their history refer to it); renaming
// changes only the label.
import { BUILD_STAGE_KEY, FIXED_STAGES, type BuildStage } from "./stages";

/**
 * A key for a new stage from its label: "Fret levelling & dressing" → "fret_levelling_dressing",
 * with a number added when the key is taken or reserved, e.g. "finish_2".
 */
export function stageKeyFromLabel(label: string, taken: Iterable<string>): string {
  const used = new Set<string>([...taken, ...FIXED_STAGES]);
  let base = label
    .toLowerCase()
    .normalize("NFKD")
    .replace(/[\u0300-\u036f]/g, "")
    .replace(/[^a-z0-9]+/g, "_")
    .replace(/^[^a-z]+|_+$/g, "")
    .slice(0, 36)
    .replace(/_+$/, "");
  if (!BUILD_STAGE_KEY.test(base)) base = "stage";
  if (!used.has(base)) return base;
  for (let n = 2; ; n++) {
    const key = `${base}_${n}`;
    if (!used.has(key)) return key;
  }
}

/** The keys of `before` that `after` no longer has. */
export function removedStageKeys(before: readonly BuildStage[], after: readonly BuildStage[]): string[] {
  const kept = new Set(after.map((s) => s.key));
  return before.filter((s) => !kept.has(s.key)).map((s) => s.key);
}
