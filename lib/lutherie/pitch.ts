// Pitch: scientific pitch notation ↔ MIDI numbers ↔ frequency in 12-tone equal temperament.
//   f(m) = A4 · 2^((m − 69)/12), A4 = MIDI 69, C4 = MIDI 60   [textbook] + MIDI convention, SOURCES §2.1
//   cents = 1200 · log2(f2/f1)                                   [paper] Ellis (1885), SOURCES §2.1

/** [standard] ISO 16:1975 standard tuning frequency, A4 = 440 Hz (SOURCES §2.1). */
export const ISO_16_A4_HZ = 440;
/** The reference pitches the tool accepts (432 and 442 Hz are user choices, not standards). */
export const REFERENCE_PITCH_RANGE_HZ = { min: 400, max: 480 } as const;

const LETTER_SEMITONES: Record<string, number> = { C: 0, D: 2, E: 4, F: 5, G: 7, A: 9, B: 11 };
const ACCIDENTALS: Record<string, number> = { "": 0, "#": 1, "##": 2, x: 2, "♯": 1, b: -1, bb: -2, "♭": -1 };
const NOTE_RE = /^([A-Ga-g])(##|#|x|♯|bb|b|♭)?(-1|[0-9])$/;

export interface ParsedNote {
  letter: string;
  accidental: number;
  octave: number;
  midi: number;
}

/**
 * Parses a note in scientific pitch notation ("E4", "F#1", "Bb2", "C-1"): sharps #, ##, x or ♯,
 * flats b, bb or ♭, octaves −1…9. Returns null for anything else or outside MIDI 0…127.
 */
export function parseNote(name: string): ParsedNote | null {
  const m = NOTE_RE.exec(name.trim());
  if (!m) return null;
  const letter = m[1]!.toUpperCase();
  const accidental = ACCIDENTALS[m[2] ?? ""]!;
  const octave = Number(m[3]);
  const midi = (octave + 1) * 12 + LETTER_SEMITONES[letter]! + accidental;
  if (midi < 0 || midi > 127) return null;
  return { letter, accidental, octave, midi };
}

/** MIDI number of a note name, or null when it is not a note. */
export function noteToMidi(name: string): number | null {
  const known = MIDI_BY_NAME.get(name);
  if (known !== undefined) return known;
  const midi = parseNote(name)?.midi ?? null;
  // Only valid names are cached, so the cache is bounded by the set of spellable notes.
  if (midi !== null) MIDI_BY_NAME.set(name, midi);
  return midi;
}
const MIDI_BY_NAME = new Map<string, number>();

/** Frequency of MIDI note m in 12-TET from the reference A4 (default ISO 16, 440 Hz). */
export function midiToFrequency(midi: number, a4Hz = ISO_16_A4_HZ): number {
  return a4Hz * 2 ** ((midi - 69) / 12);
}

/** Fractional MIDI number of a frequency (the inverse of midiToFrequency). */
export function frequencyToMidi(hz: number, a4Hz = ISO_16_A4_HZ): number {
  return 69 + 12 * Math.log2(hz / a4Hz);
}

/** Frequency of a note name, or null when the name is not a note. */
export function noteToFrequency(name: string, a4Hz = ISO_16_A4_HZ): number | null {
  const midi = noteToMidi(name);
  return midi === null ? null : midiToFrequency(midi, a4Hz);
}

/** Cents from f1 up to f2 (negative when f2 is lower). */
export function centsBetween(f1: number, f2: number): number {
  return 1200 * Math.log2(f2 / f1);
}

const SHARP_NAMES = ["C", "C#", "D", "D#", "E", "F", "F#", "G", "G#", "A", "A#", "B"];

/** The sharp spelling of a whole MIDI number ("F#1"), for labels. */
export function midiToNoteName(midi: number): string {
  const m = Math.round(midi);
  return `${SHARP_NAMES[((m % 12) + 12) % 12]}${Math.floor(m / 12) - 1}`;
}

/** The nearest note to a frequency and how many cents the frequency is above it. */
export function nearestNote(hz: number, a4Hz = ISO_16_A4_HZ): { name: string; cents: number } {
  const exact = frequencyToMidi(hz, a4Hz);
  const midi = Math.round(exact);
  return { name: midiToNoteName(midi), cents: (exact - midi) * 100 };
}
