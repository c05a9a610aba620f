// The client's view of what changed between spec versions: field names, enum labels, and lengths
// in the workshop's unit. Length checks use the international inch, exactly 25.4 mm (1959
// agreement; NIST SP 811).
import { describe, expect, it } from "vitest";
import { describeSpecChanges } from "@/components/commissions/spec-change-text";
import { summariseSpecChange } from "@/lib/workflow/spec-diff";

describe("spec change text", () => {
  it("names fields and shows enum labels", () => {
    const lines = describeSpecChanges(
      [
        { path: "options.bridge", before: "fixed", after: "floating_tremolo" },
        { path: "options.finish", before: "", after: "Satin oil" },
        { path: "spec.strings.5.gaugeIn", before: 0.046, after: 0.049 },
        { path: "spec.strings.0.construction", before: "plain-steel", after: "round-wound-nickel" },
        { path: "spec.pickups.1.label", before: "Neck", after: undefined },
        { path: "spec.frets", before: 22, after: 24 },
      ],
      { unit: "mm", afterUnits: "mm" },
    );
    expect(lines.map((l) => [l.label, l.before, l.after])).toEqual([
      ["Bridge", "Fixed bridge", "Floating tremolo"],
      ["Finish", "—", "Satin oil"],
      ["String 6 gauge (in)", "0.0460", "0.0490"],
      ["String 1 construction", "Plain steel", "Round-wound, nickel-plated steel"],
      ["Pickup 2 name", "Neck", "—"],
      ["Frets", "22", "24"],
    ]);
  });

  it("shows lengths in the workshop's unit: 647.7 mm is 25.5 in exactly", () => {
    const [line] = describeSpecChanges([{ path: "spec.scale.bass", before: 647.7, after: 685.8 }], { unit: "in", afterUnits: "mm" });
    expect(line).toEqual({ path: "spec.scale.bass", label: "Bass scale (in)", before: "25.500", after: "27.000" });
  });

  it("converts each side from its own unit, and hides a change of unit that changes no length", () => {
    // Version 1 stored in inches, version 2 in millimetres: 25.5 in and 647.7 mm are the same scale.
    const lines = describeSpecChanges(
      [
        { path: "spec.units", before: "in", after: "mm" },
        { path: "spec.scale.bass", before: 25.5, after: 647.7 },
        { path: "spec.scale.treble", before: 25.5, after: 660.4 },
      ],
      { unit: "mm", afterUnits: "mm" },
    );
    expect(lines).toEqual([{ path: "spec.scale.treble", label: "Treble scale (mm)", before: "647.70", after: "660.40" }]);
  });

  it("reads the diff the server computes for a re-approval", () => {
    const before = { spec: { units: "mm", scale: { bass: 648, treble: 648 } }, options: { bridge: "fixed" } };
    const after = { spec: { units: "mm", scale: { bass: 648, treble: 648 } }, options: { bridge: "floating_tremolo" } };
    const summary = summariseSpecChange({ before, after, beforeTotalTensionN: 450, afterTotalTensionN: 460, bridge: "floating_tremolo" });
    expect(describeSpecChanges(summary.changes, { unit: "mm", afterUnits: "mm" }).map((l) => l.label)).toEqual(["Bridge"]);
  });
});
