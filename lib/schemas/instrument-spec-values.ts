// The fixed choices of an instrument spec and their labels: instrument-spec.ts builds the schema
// from them and re-exports them. No zod here, so client components import these without bringing
// zod into a page's first load (components/forms/lazy-schema.ts loads the schemas on first use).

export const LENGTH_UNITS = ["mm", "in"] as const;
export const FAMILIES = ["guitar", "bass"] as const;
export const CORE_SHAPES = ["hex", "round"] as const;

/** String constructions. Every round-wound string has a steel music-wire core. */
export const CONSTRUCTIONS = [
  "plain-steel",
  "round-wound-nickel",
  "round-wound-pure-nickel",
  "round-wound-stainless",
  "round-wound-phosphor-bronze",
  "round-wound-80-20-bronze",
] as const;
export type Construction = (typeof CONSTRUCTIONS)[number];

export const CONSTRUCTION_LABELS: Record<Construction, string> = {
  "plain-steel": "Plain steel",
  "round-wound-nickel": "Round-wound, nickel-plated steel",
  "round-wound-pure-nickel": "Round-wound, pure nickel",
  "round-wound-stainless": "Round-wound, stainless steel",
  "round-wound-phosphor-bronze": "Round-wound, phosphor bronze",
  "round-wound-80-20-bronze": "Round-wound, 80/20 bronze",
};
