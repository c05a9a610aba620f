// Pitch: note names → MIDI → frequency, checked against ISO 16, 12-TET identities and the `tonal` npm library.
import fc from "fast-check";
import { Midi, Note } from "tonal";
import { describe, expect, it } from "vitest";
import { rel } from "./close";
import {
  centsBetween,
  frequencyToMidi,
  ISO_16_A4_HZ,
  midiToFrequency,
  midiToNoteName,
  nearestNote,
  noteToFrequency,
  noteToMidi,
  parseNote,
} from "@/lib/lutherie/pitch";


describe("reference pitch", () => {
  it("defaults to A4 = 440 Hz (ISO 16:1975, SOURCES §2.1)", () => {
    expect(ISO_16_A4_HZ).toBe(440);
    expect(noteToFrequency("A4")).toBe(440);
  });

  it("puts MIDI 69 on the chosen A4 and C4 on MIDI 60 (MIDI convention, SOURCES §2.1)", () => {
    for (const a4 of [400, 432, 440, 442, 480]) expect(midiToFrequency(69, a4)).toBe(a4);
    expect(noteToMidi("C4")).toBe(60);
    expect(noteToMidi("A4")).toBe(69);
  });
});

describe("12-TET identities (SOURCES §5.2)", () => {
  it("f(m + 12) = 2·f(m) across the MIDI range", () => {
    for (let m = 0; m <= 115; m++) expect(rel(midiToFrequency(m + 12), 2 * midiToFrequency(m))).toBeLessThan(1e-12);
  });

  it("a semitone is 100 cents and an octave 1200 (Ellis 1885, SOURCES §2.1)", () => {
    expect(centsBetween(440, 880)).toBeCloseTo(1200, 10);
    expect(centsBetween(midiToFrequency(60), midiToFrequency(61))).toBeCloseTo(100, 10);
    expect(centsBetween(880, 440)).toBeCloseTo(-1200, 10);
  });
});

describe("cross-check with the tonal npm library (parity, not a source of truth; SOURCES §5.3)", () => {
  const letters = ["C", "D", "E", "F", "G", "A", "B"];
  const accidentals = ["", "#", "b", "##", "bb"];
  const octaves = [-1, 0, 1, 2, 3, 4, 5, 6, 7, 8, 9];
  const names = letters.flatMap((l) => accidentals.flatMap((a) => octaves.map((o) => `${l}${a}${o}`)));

  it("gives tonal's MIDI number and A440 frequency for every spelling over MIDI 0…127", () => {
    let checked = 0;
    for (const name of names) {
      const ours = noteToMidi(name);
      const theirs = Note.midi(name);
      if (theirs === null || theirs < 0 || theirs > 127) {
        expect(ours, name).toBeNull();
        continue;
      }
      expect(ours, name).toBe(theirs);
      expect(rel(noteToFrequency(name)!, Note.freq(name)!), name).toBeLessThan(1e-12);
      checked++;
    }
    expect(checked).toBeGreaterThan(350);
  });

  it("agrees with tonal's Midi.midiToFreq for any reference from 400 to 480 Hz", () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 127 }), fc.double({ min: 400, max: 480, noNaN: true }), (m, a4) => {
        expect(rel(midiToFrequency(m, a4), Midi.midiToFreq(m, a4))).toBeLessThan(1e-12);
      }),
    );
  });

  it("inverts frequencies like tonal's Midi.freqToMidi", () => {
    for (let m = 0; m <= 127; m++) expect(frequencyToMidi(midiToFrequency(m))).toBeCloseTo(Midi.freqToMidi(midiToFrequency(m)), 9);
  });
});

describe("note names", () => {
  it("reads sharps and flats as the trade writes them", () => {
    expect(noteToMidi("F#1")).toBe(30);
    expect(noteToMidi("Bb2")).toBe(46);
    expect(noteToMidi("E2")).toBe(40);
    expect(noteToMidi("B♭2")).toBe(46);
    expect(noteToMidi("Fx2")).toBe(43);
    expect(parseNote("H2")).toBeNull();
    expect(parseNote("E10")).toBeNull();
    expect(parseNote("Cb-1")).toBeNull(); // below MIDI 0
  });

  it("names whole MIDI numbers and the nearest note of a frequency", () => {
    expect(midiToNoteName(30)).toBe("F#1");
    expect(nearestNote(445).name).toBe("A4");
    expect(nearestNote(445).cents).toBeCloseTo(centsBetween(440, 445), 9);
  });
});
