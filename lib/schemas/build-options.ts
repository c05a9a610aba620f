import { z } from "zod";

// The structured build options of a spec version, beside the instrument spec (scale, strings,
// pickups) that the build math computes. Free text where workshops differ; enums where the
// choice changes the work or the physics (a floating tremolo needs its springs rebalanced).

export const BRIDGE_TYPES = ["fixed", "floating_tremolo"] as const;
export const BRIDGE_LABELS: Record<(typeof BRIDGE_TYPES)[number], string> = {
  fixed: "Fixed bridge",
  floating_tremolo: "Floating tremolo",
};

export const NECK_JOINTS = ["bolt_on", "set", "through"] as const;
export const NECK_JOINT_LABELS: Record<(typeof NECK_JOINTS)[number], string> = {
  bolt_on: "Bolt-on",
  set: "Set (glued)",
  through: "Neck-through",
};

const text = (max: number) => z.string().trim().max(max, `At most ${max} characters.`);

export const buildOptionsSchema = z.object({
  bodyWood: text(80).default(""),
  topWood: text(80).default(""),
  neckWood: text(80).default(""),
  fretboardWood: text(80).default(""),
  neckJoint: z.enum(NECK_JOINTS).default("bolt_on"),
  fretWire: text(80).default(""),
  finish: text(120).default(""),
  colour: text(80).default(""),
  bridge: z.enum(BRIDGE_TYPES).default("fixed"),
  hardware: text(200).default(""),
  electronics: text(400).default(""),
  notes: text(4000).default(""),
});

export type BuildOptions = z.infer<typeof buildOptionsSchema>;
