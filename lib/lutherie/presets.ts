// Starting specs for the calculator and the commission editor, held in mm (convert on load).
// The gauge sets are Scalewright's own: each gauge was chosen with this module's own round-wound
// model (hex core at 40 % of the gauge; the default core is now 45 %, which moves tensions by under 1 %) for roughly even tension — about 74 N a string on guitars and
// 185 N on basses — and rounded to 0.0005 in. They are not any string maker's sets. Pickup positions
// and widths are invented round figures.
import type { InstrumentSpec, StringSpec } from "@/lib/schemas/instrument-spec";
import { ISO_16_A4_HZ } from "./pitch";

export interface Preset {
  id: string;
  label: string;
  spec: InstrumentSpec;
}

const plain = (note: string, gaugeIn: number): StringSpec => ({ note, gaugeIn, construction: "plain-steel" });
const wound = (note: string, gaugeIn: number): StringSpec => ({ note, gaugeIn, construction: "round-wound-nickel" });

interface PresetShape {
  family: "guitar" | "bass";
  /** Bass and treble scale (mm) and the perpendicular fret; equal scales for a single-scale neck. */
  scale: [number, number, number];
  frets: number;
  /** Nut width and width at the last fret (mm). */
  widths: [number, number];
  strings: StringSpec[];
  /** Label and distance from the bridge (mm). */
  pickups: [string, number][];
}

function preset(id: string, label: string, p: PresetShape): Preset {
  return {
    id,
    label,
    spec: {
      units: "mm",
      family: p.family,
      scale: { bass: p.scale[0], treble: p.scale[1], perpendicularFret: p.scale[2] },
      frets: p.frets,
      referencePitchHz: ISO_16_A4_HZ,
      nutWidth: p.widths[0],
      lastFretWidth: p.widths[1],
      strings: p.strings,
      pickups: p.pickups.map(([l, fromBridge]) => ({ label: l, fromBridge })),
    },
  };
}

export const PRESETS: readonly Preset[] = [
  preset("six", "6-string, 648 mm (25.5 in)", {
    family: "guitar",
    scale: [648, 648, 0],
    frets: 22,
    widths: [43, 56],
    strings: [plain("E4", 0.01), plain("B3", 0.0135), plain("G3", 0.017), wound("D3", 0.0255), wound("A2", 0.034), wound("E2", 0.0455)],
    pickups: [["Bridge", 42], ["Neck", 158]],
  }),
  preset("seven", "7-string, 648 mm, 24 frets", {
    family: "guitar",
    scale: [648, 648, 0],
    frets: 24,
    widths: [48, 62],
    strings: [plain("E4", 0.01), plain("B3", 0.0135), plain("G3", 0.017), wound("D3", 0.0255), wound("A2", 0.034), wound("E2", 0.0455), wound("B1", 0.0605)],
    pickups: [["Bridge", 40], ["Neck", 150]],
  }),
  preset("baritone", "Baritone, 711 mm (28 in), B standard", {
    family: "guitar",
    scale: [711.2, 711.2, 0],
    frets: 24,
    widths: [43, 57],
    strings: [plain("B3", 0.0125), plain("F#3", 0.0165), wound("D3", 0.023), wound("A2", 0.031), wound("E2", 0.0415), wound("B1", 0.055)],
    pickups: [["Bridge", 45], ["Neck", 160]],
  }),
  preset("bass-four", "4-string bass, 864 mm (34 in)", {
    family: "bass",
    scale: [863.6, 863.6, 0],
    frets: 20,
    widths: [38, 58],
    strings: [wound("G2", 0.0455), wound("D2", 0.0605), wound("A1", 0.0805), wound("E1", 0.1075)],
    pickups: [["Bridge", 95], ["Neck", 200]],
  }),
  preset("bass-five", "5-string bass, 889 mm (35 in)", {
    family: "bass",
    scale: [889, 889, 0],
    frets: 24,
    widths: [45, 70],
    strings: [wound("G2", 0.044), wound("D2", 0.0585), wound("A1", 0.0785), wound("E1", 0.1045), wound("B0", 0.1395)],
    pickups: [["Bridge", 90], ["Neck", 180]],
  }),
  preset("fanned-eight", "Multi-scale 8-string, 711–648 mm, 27 frets", {
    family: "guitar",
    scale: [711.2, 647.7, 8],
    frets: 27,
    widths: [54, 72],
    strings: [
      plain("E4", 0.01), plain("B3", 0.0135), plain("G3", 0.0165), wound("D3", 0.025),
      wound("A2", 0.0325), wound("E2", 0.043), wound("B1", 0.0565), wound("F#1", 0.0745),
    ],
    pickups: [["Bridge", 38], ["Middle", 88], ["Neck", 125]],
  }),
];

export const DEFAULT_PRESET_ID = "six";

/** A preset by id (the default one for an unknown id). */
export function presetById(id: string): Preset {
  return PRESETS.find((p) => p.id === id) ?? PRESETS[0]!;
}
