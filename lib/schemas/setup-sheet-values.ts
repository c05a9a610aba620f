// The setup sheet's electronics checklist (setup-sheet.ts builds the schema from it and re-exports
// it). No zod here, so client components import these without bringing zod into a page's first
// load (components/forms/lazy-schema.ts loads the schemas on first use).

/** Our own electronics checklist, in the order a builder works through it. */
export const ELECTRONICS_CHECKS = [
  { key: "jack_output", label: "Output jack tight; signal on every pickup" },
  { key: "selector_positions", label: "Every selector position gives the expected pickup(s)" },
  { key: "pots_sweep", label: "Volume and tone controls sweep smoothly, no crackle" },
  { key: "string_ground", label: "Bridge and strings bonded to signal ground (continuity measured)" },
  { key: "shielding", label: "Cavity shielding continuous to ground" },
  { key: "hum_touch", label: "Hum drops when the strings are touched" },
  { key: "balance", label: "Output levels balanced between pickups" },
  { key: "active_current", label: "Active electronics: battery current draw checked (skip if passive)" },
] as const;

export type ElectronicsCheckKey = (typeof ELECTRONICS_CHECKS)[number]["key"];
