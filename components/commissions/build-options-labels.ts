// Names and display text of the build options, for the form, the read-only list and the diff.
import type { BuildOptions } from "@/lib/schemas/build-options";
import { BRIDGE_LABELS, NECK_JOINT_LABELS } from "@/lib/schemas/build-options-values";

export const OPTION_LABELS: Record<keyof BuildOptions, string> = {
  bodyWood: "Body wood",
  topWood: "Top wood",
  neckWood: "Neck wood",
  fretboardWood: "Fretboard wood",
  neckJoint: "Neck joint",
  fretWire: "Fret wire",
  finish: "Finish",
  colour: "Colour",
  bridge: "Bridge",
  hardware: "Hardware",
  electronics: "Electronics and pickups",
  notes: "Notes",
};

/** An option's value as people read it (enum labels, "—" for empty). */
export function optionText(key: keyof BuildOptions, value: unknown): string {
  if (value === undefined || value === null || value === "") return "—";
  if (key === "bridge") return BRIDGE_LABELS[value as BuildOptions["bridge"]] ?? String(value);
  if (key === "neckJoint") return NECK_JOINT_LABELS[value as BuildOptions["neckJoint"]] ?? String(value);
  return String(value);
}
