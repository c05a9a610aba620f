// Editing the stage template: keys for new stages always pass the template's own rules
// (templateProblems), and removed stages are found by key, whatever the order or labels.
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { removedStageKeys, stageKeyFromLabel } from "@/lib/workflow/stage-template";
import { DEFAULT_BUILD_STAGES, templateProblems } from "@/lib/workflow/stages";
import { buildStagesSchema, workshopSettingsPatchSchema } from "@/lib/schemas/workshop-settings";

describe("stage keys from labels", () => {
  it("makes lower-case keys with underscores", () => {
    expect(stageKeyFromLabel("Binding & purfling", [])).toBe("binding_purfling");
    expect(stageKeyFromLabel("  Vernis à l'huile ", [])).toBe("vernis_a_l_huile");
  });

  it("numbers a key that is taken or reserved", () => {
    expect(stageKeyFromLabel("Finish", ["finish"])).toBe("finish_2");
    expect(stageKeyFromLabel("Finish", ["finish", "finish_2"])).toBe("finish_3");
    expect(stageKeyFromLabel("Deposit", [])).toBe("deposit_2");
    expect(stageKeyFromLabel("1 2 3", [])).toBe("stage");
  });

  it("always gives a key the template accepts, for any label", () => {
    fc.assert(
      fc.property(fc.array(fc.string({ maxLength: 50 }), { minLength: 1, maxLength: 20 }), (labels) => {
        const stages: Array<{ key: string; label: string }> = [];
        for (const label of labels) stages.push({ key: stageKeyFromLabel(label, stages.map((s) => s.key)), label: label.trim() || "x" });
        expect(templateProblems(stages)).toEqual([]);
      }),
    );
  });
});

describe("removed stages", () => {
  it("are the keys the new list no longer has (renames and moves keep a stage)", () => {
    const after = [{ key: "finish", label: "Lacquer" }, ...DEFAULT_BUILD_STAGES.filter((s) => !["finish", "timber"].includes(s.key))];
    expect(removedStageKeys(DEFAULT_BUILD_STAGES, after)).toEqual(["timber"]);
    expect(removedStageKeys(DEFAULT_BUILD_STAGES, [...DEFAULT_BUILD_STAGES].reverse())).toEqual([]);
  });
});

describe("settings schema", () => {
  it("reports template problems under buildStages with the stage's index", () => {
    const r = buildStagesSchema.safeParse([{ key: "timber", label: "Timber" }, { key: "timber", label: "" }, { key: "spec", label: "Spec again" }]);
    expect(r.success).toBe(false);
    const paths = r.error!.issues.map((i) => i.path.join("."));
    expect(paths).toEqual(expect.arrayContaining(["1.key", "1.label", "2.key"]));
    expect(buildStagesSchema.safeParse([]).error!.issues[0]!.path).toEqual([]);
  });

  it("keeps a sender name out of header syntax and turns an empty one into none", () => {
    expect(workshopSettingsPatchSchema.safeParse({ emailSenderName: "Fernhollow <x@example.com>" }).success).toBe(false);
    expect(workshopSettingsPatchSchema.safeParse({ emailSenderName: "Line\nbreak" }).success).toBe(false);
    expect(workshopSettingsPatchSchema.parse({ emailSenderName: "  " })).toEqual({ emailSenderName: null });
    expect(workshopSettingsPatchSchema.safeParse({ depositPercent: 33.333 }).success).toBe(false);
    expect(workshopSettingsPatchSchema.safeParse({}).success).toBe(false);
  });
});
