// Invented instrument designs for the demo commissions: an instrument spec built from the
// calculator's presets (lengths in mm) and structured build options. Woods, finishes and parts
// are generic descriptions; no maker's product or brand is named.
import { presetById } from "@/lib/lutherie/presets";
import type { BuildOptions } from "@/lib/schemas/build-options";
import type { InstrumentSpec } from "@/lib/schemas/instrument-spec";

export interface DemoDesign {
  /** Short words for the commission's title ("… for Nadia"). */
  title: string;
  spec: InstrumentSpec;
  options: BuildOptions;
  /** A change the client asks for after seeing a version: the next version's spec and options. */
  revise: (spec: InstrumentSpec, options: BuildOptions) => { spec: InstrumentSpec; options: BuildOptions; why: string };
}

const opts = (o: Partial<BuildOptions>): BuildOptions => ({
  bodyWood: "",
  topWood: "",
  neckWood: "",
  fretboardWood: "",
  neckJoint: "bolt_on",
  fretWire: "",
  finish: "",
  colour: "",
  bridge: "fixed",
  hardware: "",
  electronics: "",
  notes: "",
  ...o,
});

/** A preset's spec with changes applied (a fresh copy every time). */
function from(presetId: string, change: (s: InstrumentSpec) => void = () => {}): InstrumentSpec {
  const spec = structuredClone(presetById(presetId).spec);
  change(spec);
  return spec;
}

/** One string heavier by a step of 0.0005–0.002 in, as players ask for a firmer low end. */
const heavierLowString = (by: number) => (spec: InstrumentSpec, options: BuildOptions) => {
  const s = structuredClone(spec);
  const low = s.strings[s.strings.length - 1]!;
  low.gaugeIn = Math.round((low.gaugeIn + by) * 10000) / 10000;
  return { spec: s, options, why: `a heavier lowest string (${low.gaugeIn} in) for a firmer low end` };
};

const newColour = (colour: string) => (spec: InstrumentSpec, options: BuildOptions) => ({
  spec: structuredClone(spec),
  options: { ...options, colour },
  why: `the colour changed to ${colour.toLowerCase()}`,
});

const widerNut = (nut: number) => (spec: InstrumentSpec, options: BuildOptions) => {
  const s = structuredClone(spec);
  s.nutWidth = nut;
  return { spec: s, options, why: `a wider nut (${nut} mm)` };
};

export const DEMO_DESIGNS: readonly DemoDesign[] = [
  {
    title: "Offset six-string with tremolo",
    spec: from("six"),
    options: opts({
      bodyWood: "Alder, two-piece",
      neckWood: "Hard maple, quartersawn",
      fretboardWood: "Indian rosewood, 305 mm radius",
      fretWire: "Nickel-silver, medium",
      finish: "Nitrocellulose lacquer, gloss",
      colour: "Amber burst",
      bridge: "floating_tremolo",
      hardware: "Two-point floating tremolo, locking tuners, nickel",
      electronics: "Three single coils, 5-way switch, master volume, two tones (250 kΩ)",
    }),
    revise: heavierLowString(0.0015),
  },
  {
    title: "Single-cut with carved maple top",
    spec: from("six", (s) => {
      s.scale = { bass: 628.65, treble: 628.65, perpendicularFret: 0 };
      s.strings[0]!.gaugeIn = 0.0105;
      s.strings[1]!.gaugeIn = 0.014;
    }),
    options: opts({
      bodyWood: "African mahogany, one piece",
      topWood: "Flamed maple, 15 mm carved",
      neckWood: "African mahogany",
      fretboardWood: "Ebony, 300 mm radius",
      neckJoint: "set",
      fretWire: "Stainless steel, medium jumbo",
      finish: "Nitrocellulose lacquer, gloss",
      colour: "Tobacco burst",
      hardware: "Adjustable two-post bridge and stop tailpiece, vintage-style tuners, nickel",
      electronics: "Two humbuckers, alnico V, 3-way switch, two volumes and two tones (500 kΩ)",
    }),
    revise: newColour("Cherry translucent"),
  },
  {
    title: "Through-neck seven-string",
    spec: from("seven"),
    options: opts({
      bodyWood: "Swamp ash",
      neckWood: "Roasted maple, five-piece with walnut stripes",
      fretboardWood: "Macassar ebony, 400 mm radius",
      neckJoint: "through",
      fretWire: "Stainless steel, jumbo",
      finish: "Hand-rubbed oil and wax",
      colour: "Natural",
      hardware: "Hardtail bridge with through-body stringing, locking tuners, black",
      electronics: "Two seven-string humbuckers, ceramic, 3-way switch, volume and tone, push-pull coil split",
    }),
    revise: heavierLowString(0.0015),
  },
  {
    title: "Multi-scale seven-string",
    spec: from("seven", (s) => {
      s.scale = { bass: 685.8, treble: 647.7, perpendicularFret: 8 };
      s.strings[6]!.gaugeIn = 0.0595;
      s.pickups = [
        { label: "Bridge", fromBridge: 42, fromBridgeTreble: 36 },
        { label: "Neck", fromBridge: 158, fromBridgeTreble: 146 },
      ];
    }),
    options: opts({
      bodyWood: "Black limba",
      topWood: "Figured walnut, 6 mm",
      neckWood: "Roasted maple and wenge, three-piece",
      fretboardWood: "Ebony, compound radius 250–400 mm",
      neckJoint: "bolt_on",
      fretWire: "Stainless steel, medium jumbo",
      finish: "Polyurethane, satin",
      colour: "Smoked grey burst",
      hardware: "Single-string saddles on a fanned plate, locking tuners, black",
      electronics: "Two humbuckers, alnico V, slanted to the fan, 3-way switch, volume only",
    }),
    revise: widerNut(49),
  },
  {
    title: "Baritone in B standard",
    spec: from("baritone"),
    options: opts({
      bodyWood: "Walnut, chambered",
      topWood: "Spalted maple, 5 mm",
      neckWood: "Hard maple",
      fretboardWood: "Pau ferro",
      fretWire: "Nickel-silver, medium jumbo",
      finish: "Thin polyester base, nitrocellulose top coat",
      colour: "Olive",
      hardware: "Hardtail bridge, 10.8 mm string spacing, vintage-style tuners, chrome",
      electronics: "Humbucker and single coil, 3-way switch, volume and tone",
    }),
    revise: newColour("Seafoam green"),
  },
  {
    title: "Four-string bass",
    spec: from("bass-four"),
    options: opts({
      bodyWood: "Alder",
      neckWood: "Hard maple with graphite reinforcement rods",
      fretboardWood: "Indian rosewood",
      fretWire: "Nickel-silver, medium",
      finish: "Nitrocellulose lacquer, gloss",
      colour: "Oxblood",
      hardware: "Four-saddle bridge, 19 mm spacing, open-gear tuners, chrome",
      electronics: "Two single-coil bass pickups, passive, volume, volume, tone",
    }),
    revise: newColour("Satin black"),
  },
  {
    title: "Five-string through-neck bass",
    spec: from("bass-five"),
    options: opts({
      bodyWood: "Swamp ash",
      topWood: "Quilted maple, 6 mm",
      neckWood: "Maple and purpleheart, five-piece",
      fretboardWood: "Ebony",
      neckJoint: "through",
      fretWire: "Stainless steel, medium",
      finish: "Hand-rubbed oil and wax",
      colour: "Natural",
      hardware: "Five-saddle bridge, 18 mm spacing, lightweight tuners, black",
      electronics: "Two humbucking bass pickups with a 2-band onboard preamp (9 V battery), passive switch",
    }),
    revise: heavierLowString(0.005),
  },
  {
    title: "Multi-scale eight-string",
    spec: from("fanned-eight"),
    options: opts({
      bodyWood: "White limba",
      topWood: "Redwood burl, 6 mm",
      neckWood: "Roasted maple, quartersawn, five-piece",
      fretboardWood: "Roasted maple",
      neckJoint: "through",
      fretWire: "Stainless steel, medium jumbo",
      finish: "Polyurethane, satin",
      colour: "Natural",
      hardware: "Single-string saddles on a fanned plate, headless tuners at the bridge, black",
      electronics: "Two eight-string humbuckers and a single coil, 5-way switch, volume and tone",
    }),
    revise: heavierLowString(0.002),
  },
  {
    title: "Multi-scale five-string bass",
    spec: from("bass-five", (s) => {
      s.scale = { bass: 889, treble: 863.6, perpendicularFret: 7 };
      s.pickups = [
        { label: "Bridge", fromBridge: 92, fromBridgeTreble: 88 },
        { label: "Neck", fromBridge: 185, fromBridgeTreble: 176 },
      ];
    }),
    options: opts({
      bodyWood: "Okoume",
      topWood: "Flamed maple, 6 mm",
      neckWood: "Maple and wenge, five-piece",
      fretboardWood: "Wenge",
      neckJoint: "bolt_on",
      fretWire: "Stainless steel, medium",
      finish: "Polyurethane, satin",
      colour: "Slate blue metallic",
      hardware: "Single-string saddles, 18 mm spacing, lightweight tuners, black",
      electronics: "Two humbucking bass pickups, passive, volume, blend, tone",
    }),
    revise: widerNut(47),
  },
  {
    title: "24-fret six-string with three pickups",
    spec: from("six", (s) => {
      s.frets = 24;
      s.pickups = [
        { label: "Bridge", fromBridge: 40 },
        { label: "Middle", fromBridge: 100 },
        { label: "Neck", fromBridge: 150 },
      ];
    }),
    options: opts({
      bodyWood: "Sapele",
      neckWood: "Roasted maple",
      fretboardWood: "Roasted maple, 350 mm radius",
      fretWire: "Stainless steel, jumbo",
      finish: "Polyurethane, gloss",
      colour: "Satin black",
      bridge: "floating_tremolo",
      hardware: "Double-locking floating tremolo, recessed, black",
      electronics: "Humbucker, single coil, humbucker; 5-way switch; volume and tone (500 kΩ)",
    }),
    revise: heavierLowString(0.002),
  },
  {
    title: "Short-scale bass",
    spec: from("bass-four", (s) => {
      s.scale = { bass: 762, treble: 762, perpendicularFret: 0 };
      s.frets = 21;
      s.strings = [
        { note: "G2", gaugeIn: 0.05, construction: "round-wound-nickel" },
        { note: "D2", gaugeIn: 0.067, construction: "round-wound-nickel" },
        { note: "A1", gaugeIn: 0.089, construction: "round-wound-nickel" },
        { note: "E1", gaugeIn: 0.118, construction: "round-wound-nickel" },
      ];
      s.pickups = [{ label: "Middle", fromBridge: 140 }];
    }),
    options: opts({
      bodyWood: "African mahogany",
      neckWood: "African mahogany",
      fretboardWood: "Indian rosewood",
      neckJoint: "set",
      fretWire: "Nickel-silver, medium",
      finish: "Nitrocellulose lacquer, satin",
      colour: "Cherry translucent",
      hardware: "Three-point bridge, vintage-style tuners, nickel",
      electronics: "One humbucking bass pickup, volume and tone",
    }),
    revise: newColour("Tobacco burst"),
  },
  {
    title: "Semi-hollow six-string",
    spec: from("six", (s) => {
      s.scale = { bass: 628.65, treble: 628.65, perpendicularFret: 0 };
      s.frets = 20;
      s.strings[2] = { note: "G3", gaugeIn: 0.02, construction: "round-wound-nickel", coreIn: 0.012, coreShape: "hex" };
      s.pickups = [
        { label: "Bridge", fromBridge: 45 },
        { label: "Neck", fromBridge: 160 },
      ];
    }),
    options: opts({
      bodyWood: "Chambered African mahogany",
      topWood: "Spruce, carved, with an f-hole",
      neckWood: "African mahogany",
      fretboardWood: "Ebony",
      neckJoint: "set",
      fretWire: "Nickel-silver, narrow tall",
      finish: "Shellac French polish (neck: oil)",
      colour: "Amber burst",
      hardware: "Floating rosewood bridge over a trapeze tailpiece, vintage-style tuners, gold",
      electronics: "Two low-output humbuckers, 3-way switch, two volumes and a master tone",
    }),
    revise: newColour("Natural"),
  },
];
