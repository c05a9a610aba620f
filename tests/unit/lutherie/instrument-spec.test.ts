// The instrument spec schema: what it refuses, with the field paths a form and a 422 need.
import { describe, expect, it } from "vitest";
import { presetById } from "@/lib/lutherie/presets";
import { encodeSpec } from "@/lib/lutherie/spec-url";
import { decodeSpec } from "@/lib/lutherie/spec-url-decode";
import { instrumentSpecSchema } from "@/lib/schemas/instrument-spec";

const base = () => structuredClone(presetById("six").spec) as Record<string, unknown> & ReturnType<typeof presetById>["spec"];
const paths = (v: unknown) => {
  const r = instrumentSpecSchema.safeParse(v);
  return r.success ? [] : r.error.issues.map((i) => i.path.join("."));
};

describe("instrumentSpecSchema", () => {
  it("accepts the body the issue describes, in either unit", () => {
    expect(paths(base())).toEqual([]);
    expect(
      paths({
        units: "in",
        scale: { bass: 25.5, treble: 25.5, perpendicularFret: 0 },
        frets: 22,
        referencePitchHz: 440,
        strings: [{ note: "E4", gaugeIn: 0.01, construction: "plain-steel" }],
        pickups: [{ label: "Bridge", fromBridge: 1.625 }],
      }),
    ).toEqual([]);
  });

  it("refuses wrong types with their paths", () => {
    expect(paths({ ...base(), frets: "22" })).toEqual(["frets"]);
    expect(paths({ ...base(), units: "cm" })).toEqual(["units"]);
    expect(paths({ ...base(), scale: 648 })).toEqual(["scale"]);
    const s = base();
    (s.strings[2] as Record<string, unknown>).gaugeIn = "0.017";
    expect(paths(s)).toEqual(["strings.2.gaugeIn"]);
  });

  it("refuses out-of-range values, converted from the spec's units", () => {
    expect(paths({ ...base(), frets: 37 })).toEqual(["frets"]);
    expect(paths({ ...base(), frets: 21.5 })).toEqual(["frets"]);
    expect(paths({ ...base(), referencePitchHz: 300 })).toEqual(["referencePitchHz"]);
    expect(paths({ ...base(), scale: { bass: 64.8, treble: 64.8, perpendicularFret: 0 } })).toEqual(["scale.bass", "scale.treble"]);
    expect(paths({ ...base(), units: "in" })).toEqual(["scale.bass", "scale.treble", "nutWidth", "lastFretWidth", "pickups.1.fromBridge"]);
    expect(paths({ ...base(), scale: { bass: 648, treble: 648, perpendicularFret: 23 } })).toEqual(["scale.perpendicularFret"]);
  });

  it("refuses an empty string list, a bad note and a core as thick as its string", () => {
    expect(paths({ ...base(), strings: [] })).toEqual(["strings"]);
    const s = base();
    s.strings[0]!.note = "H4";
    s.strings[5]!.coreIn = 0.05;
    expect(paths(s)).toEqual(["strings.0.note", "strings.5.coreIn"]);
  });

  it("wants both widths or neither", () => {
    const { lastFretWidth: _drop, ...rest } = base();
    expect(paths(rest)).toEqual(["lastFretWidth"]);
    const { nutWidth: _a, lastFretWidth: _b, ...none } = base();
    expect(paths(none)).toEqual([]);
  });
});

describe("shareable link", () => {
  it("round-trips a spec through ?spec= and refuses anything else", () => {
    const spec = presetById("fanned-eight").spec;
    expect(decodeSpec(encodeSpec(spec))).toEqual(spec);
    expect(encodeSpec(spec)).toMatch(/^[A-Za-z0-9_-]+$/);
    expect(decodeSpec("not-a-spec")).toBeNull();
    expect(decodeSpec(encodeSpec({ ...spec, frets: 99 }))).toBeNull();
    expect(decodeSpec(undefined)).toBeNull();
  });
});
