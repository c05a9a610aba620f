import { z } from "zod";
import { BRIDGE_TYPES, DEFAULT_BUILD_OPTIONS as D, NECK_JOINTS } from "./build-options-values";

// The structured build options of a spec version, beside the instrument spec (scale, strings,
// pickups) that the build math computes. Free text where workshops differ; enums where the
// choice changes the work or the physics (a floating tremolo needs its springs rebalanced).

export { BRIDGE_LABELS, BRIDGE_TYPES, DEFAULT_BUILD_OPTIONS, NECK_JOINT_LABELS, NECK_JOINTS } from "./build-options-values";

const text = (max: number) => z.string().trim().max(max, `At most ${max} characters.`);

export const buildOptionsSchema = z.object({
  bodyWood: text(80).default(D.bodyWood),
  topWood: text(80).default(D.topWood),
  neckWood: text(80).default(D.neckWood),
  fretboardWood: text(80).default(D.fretboardWood),
  neckJoint: z.enum(NECK_JOINTS).default(D.neckJoint),
  fretWire: text(80).default(D.fretWire),
  finish: text(120).default(D.finish),
  colour: text(80).default(D.colour),
  bridge: z.enum(BRIDGE_TYPES).default(D.bridge),
  hardware: text(200).default(D.hardware),
  electronics: text(400).default(D.electronics),
  notes: text(4000).default(D.notes),
});

export type BuildOptions = z.infer<typeof buildOptionsSchema>;
