// The measures of a workshop's setup ranges and their labels (setup-ranges.ts re-exports them).
// No zod here, so client components import these without bringing zod into a page's first load
// (components/forms/lazy-schema.ts loads the schemas on first use).
import type { SetupRanges } from "../setup/ranges";

/** The measures of a range set, in the order forms and tables show them. */
export const RANGE_FIELDS = [
  { key: "actionTrebleSideMm", label: "Action at the 12th, treble side" },
  { key: "actionBassSideMm", label: "Action at the 12th, bass side" },
  { key: "reliefMm", label: "Neck relief" },
  { key: "nutSlotMm", label: "Nut slot height over the 1st fret" },
  { key: "pickupTrebleSideMm", label: "Pickup height, treble side" },
  { key: "pickupBassSideMm", label: "Pickup height, bass side" },
] as const satisfies ReadonlyArray<{ key: Exclude<keyof SetupRanges, "intonationToleranceCents">; label: string }>;
