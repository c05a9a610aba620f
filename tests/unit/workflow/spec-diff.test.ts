// The spec diff shown at re-approval: changed leaves by path, and the total-tension change.
import { describe, expect, it } from "vitest";
import { diffValues, summariseSpecChange } from "@/lib/workflow/spec-diff";

describe("spec diff", () => {
  const before = { scale: { bass: 648, treble: 648 }, strings: [{ note: "E4", gaugeIn: 0.01 }, { note: "B3", gaugeIn: 0.013 }], options: { finish: "oil" } };

  it("lists changed, added and removed fields by path", () => {
    const after = { scale: { bass: 686, treble: 648 }, strings: [{ note: "E4", gaugeIn: 0.01 }], options: { finish: "nitro", colour: "amber burst" } };
    expect(diffValues(before, after)).toEqual([
      { path: "options.colour", before: undefined, after: "amber burst" },
      { path: "options.finish", before: "oil", after: "nitro" },
      { path: "scale.bass", before: 648, after: 686 },
      { path: "strings.1.gaugeIn", before: 0.013, after: undefined },
      { path: "strings.1.note", before: "B3", after: undefined },
    ]);
    expect(diffValues(before, structuredClone(before))).toEqual([]);
  });

  it("adds the spring note only for a floating tremolo whose total tension changed", () => {
    const trem = summariseSpecChange({ before, after: before, beforeTotalTensionN: 450, afterTotalTensionN: 470.4, bridge: "floating_tremolo" });
    expect(trem.tensionDeltaN).toBeCloseTo(20.4, 9);
    expect(trem.tremoloNote).toMatch(/\+20\.4 N.*springs/);
    expect(summariseSpecChange({ before, after: before, beforeTotalTensionN: 450, afterTotalTensionN: 470, bridge: "fixed" }).tremoloNote).toBeNull();
    expect(summariseSpecChange({ before, after: before, beforeTotalTensionN: 450, afterTotalTensionN: 450.1, bridge: "floating_tremolo" }).tremoloNote).toBeNull();
  });
});
