// The stages a commission moves through. Fixed stages at both ends, the workshop's own build
// stages in between (its template), plus two side states.

export const SPEC = "spec";
export const DEPOSIT = "deposit";
export const FINAL_SETUP = "final_setup";
export const DELIVERED = "delivered";
export const ON_HOLD = "on_hold";
export const CANCELLED = "cancelled";

export const FIXED_STAGES = [SPEC, DEPOSIT, FINAL_SETUP, DELIVERED, ON_HOLD, CANCELLED] as const;

/** One build stage of a workshop's template: a stable key and the label people see. */
export interface BuildStage {
  key: string;
  label: string;
}

/** A sensible template for a new workshop, from timber selection to assembly and electronics. */
export const DEFAULT_BUILD_STAGES: BuildStage[] = [
  { key: "timber", label: "Timber selection" },
  { key: "body_neck_shaping", label: "Body and neck shaping" },
  { key: "fretboard_frets", label: "Fretboard and frets" },
  { key: "finish", label: "Finishing" },
  { key: "finish_cure_level", label: "Cure and level" },
  { key: "assembly_electronics", label: "Assembly and electronics" },
];

const FIXED_LABELS: Record<string, string> = {
  [SPEC]: "Spec",
  [DEPOSIT]: "Deposit",
  [FINAL_SETUP]: "Final setup",
  [DELIVERED]: "Delivered",
  [ON_HOLD]: "On hold",
  [CANCELLED]: "Cancelled",
};

/** Build-stage keys: lower-case words joined by underscores, not clashing with the fixed stages. */
export const BUILD_STAGE_KEY = /^[a-z][a-z0-9_]{1,39}$/;

/** The whole ordered line of a workshop: spec, deposit, its build stages, final setup, delivered. */
export function stageLine(template: readonly BuildStage[]): string[] {
  return [SPEC, DEPOSIT, ...template.map((s) => s.key), FINAL_SETUP, DELIVERED];
}

export function stageLabel(stage: string, template: readonly BuildStage[]): string {
  return FIXED_LABELS[stage] ?? template.find((s) => s.key === stage)?.label ?? stage;
}

export function isBuildStage(stage: string, template: readonly BuildStage[]): boolean {
  return template.some((s) => s.key === stage);
}

/** Problems with a template an owner wants to save (empty list when it is fine). */
export function templateProblems(template: readonly BuildStage[]): Array<{ path: string; message: string }> {
  const out: Array<{ path: string; message: string }> = [];
  if (template.length < 1) out.push({ path: "stages", message: "Keep at least one build stage." });
  if (template.length > 20) out.push({ path: "stages", message: "At most 20 build stages." });
  const seen = new Set<string>();
  template.forEach((s, i) => {
    if (!BUILD_STAGE_KEY.test(s.key)) out.push({ path: `stages.${i}.key`, message: "Use 2–40 lower-case letters, digits or underscores, starting with a letter." });
    if ((FIXED_STAGES as readonly string[]).includes(s.key)) out.push({ path: `stages.${i}.key`, message: `"${s.key}" is reserved.` });
    if (seen.has(s.key)) out.push({ path: `stages.${i}.key`, message: "Each stage needs its own key." });
    if (!s.label.trim()) out.push({ path: `stages.${i}.label`, message: "Give the stage a name." });
    seen.add(s.key);
  });
  return out;
}
