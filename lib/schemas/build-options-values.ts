// The fixed choices of a spec version's build options, their labels and the options of a new
// version: build-options.ts builds the schema from them and re-exports them. No zod here, so client
// components import these without bringing zod into a page's first load
// (components/forms/lazy-schema.ts loads the schemas on first use).

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

export type NeckJoint = (typeof NECK_JOINTS)[number];
export type BridgeType = (typeof BRIDGE_TYPES)[number];

/** The options a new spec version starts from (the schema's defaults). */
export const DEFAULT_BUILD_OPTIONS = {
  bodyWood: "",
  topWood: "",
  neckWood: "",
  fretboardWood: "",
  neckJoint: "bolt_on" as NeckJoint,
  fretWire: "",
  finish: "",
  colour: "",
  bridge: "fixed" as BridgeType,
  hardware: "",
  electronics: "",
  notes: "",
};
