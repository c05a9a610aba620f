// What the demo commissions say along the way: builders' notes on each stage move, reasons for a
// hold or a cancellation, and short conversations between client and workshop. All invented.

/** The builder's note on moving INTO a stage of the default template (two to vary). */
export const NOTES_INTO: Record<string, readonly string[]> = {
  body_neck_shaping: [
    "Timber chosen and acclimatised at 7–8 % moisture; body blank glued up.",
    "Neck blank quartersawn and rested two weeks; body halves joined.",
  ],
  fretboard_frets: ["Body routed and neck carved to the agreed profile.", "Neck carved; truss rod fitted and tested under load."],
  finish: ["Fretboard radiused, frets pressed, levelled and crowned.", "Frets in, ends bevelled and polished; fretboard oiled."],
  finish_cure_level: ["Colour and clear coats sprayed; now curing before levelling.", "Final oil coat on; left to cure."],
  assembly_electronics: ["Finish levelled and buffed to a shine.", "Cured, wet-sanded and polished."],
  final_setup: ["Wired, shielded and strung up; ready for the final setup.", "Assembled; electronics tested at every switch position."],
  delivered: ["Collected in person; setup sheet handed over.", "Shipped insured in a hard case with the setup sheet."],
};

export const HOLD_REASONS = {
  deposit: "The client asked to pause for a month before paying the deposit.",
  build: "Waiting for a replacement neck blank: the first one moved after resawing.",
} as const;

export const CANCEL_NOTES = {
  spec: "The client withdrew the request.",
  deposit: "Cancelled at the client's request before the deposit; nothing was paid.",
} as const;

export const REQUEST_NOTES: readonly string[] = [
  "I play mostly open chords and slide; I'd like a neck with some depth and a wide-ish nut.",
  "Looking for something for recording and small gigs. Light weight matters more than looks.",
  "My hands are small — is a shorter scale an option for this?",
  "I'd love to use wood from an old family table if that's at all possible.",
];

type Who = "client" | "builder" | "owner";
export interface Exchange {
  lines: ReadonlyArray<readonly [Who, string]>;
}

export const SPEC_TALK: readonly Exchange[] = [
  {
    lines: [
      ["client", "Could the neck be a little chunkier than usual? I play mostly chords."],
      ["builder", "Yes — about 22 mm deep at the first fret, filling out to 24 mm at the twelfth. It's in the build options."],
    ],
  },
  {
    lines: [
      ["client", "Is a satin neck possible with a gloss body?"],
      ["builder", "It is, and it's what I'd suggest for a neck that doesn't feel sticky. Noted in the spec."],
    ],
  },
  {
    lines: [
      ["client", "Thanks for the spec — the string tensions look even across the set. Happy with the gauges."],
    ],
  },
];

export const BUILD_TALK: readonly Exchange[] = [
  {
    lines: [
      ["builder", "Body halves glued up this week; the grain match came out well."],
      ["client", "That's lovely, thank you for the update!"],
    ],
  },
  {
    lines: [
      ["client", "Any chance of a matching headstock cap?"],
      ["owner", "We can do that; it goes on before the finish, so no delay."],
    ],
  },
  {
    lines: [
      ["client", "How is the finish curing in this weather?"],
      ["builder", "Slowly but well — the shop is kept at 21 °C and 45 % humidity. I'll level it once it's hard."],
    ],
  },
];

export const DELIVERY_TALK: Exchange = {
  lines: [
    ["builder", "Setup done: action 1.6 mm bass side and 1.3 mm treble side at the 12th fret, relief 0.25 mm."],
    ["client", "It plays beautifully. Thank you all!"],
  ],
};

/** The client's request for a change, and the workshop's answer. */
export function changeTalk(why: string, version: number): Exchange {
  return {
    lines: [
      ["client", `Having lived with the spec for a bit — could we go for ${why}?`],
      ["builder", `Done: version ${version} is on its way to you for approval.`],
    ],
  };
}
