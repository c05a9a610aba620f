// The fret table's text export (clipboard and CSV): one header row, one row per fret, read back with csv-parse.
import { parse } from "csv-parse/sync";
import { stringify } from "csv-stringify/sync";
import { describe, expect, it } from "vitest";
import { fretTableText } from "@/components/build-math/fret-columns";
import { computeSpec } from "@/lib/lutherie/compute-spec";
import { presetById } from "@/lib/lutherie/presets";

describe("fret table export", () => {
  it("writes a single scale as one column per quantity, fret 12 at L/2 (12-TET identity)", () => {
    const rows = parse(stringify(fretTableText(computeSpec(presetById("six").spec)))) as string[][];
    expect(rows[0]).toEqual(["Fret", "From nut (mm)", "From previous (mm)", "To saddle (mm)", "Rule of 18 (mm)", "Rule of 18 error (cents)"]);
    expect(rows).toHaveLength(1 + 23);
    expect(rows[1]![0]).toBe("nut");
    expect(rows[13]).toEqual(["12", "324.00", "19.27", "324.00", "321.64", "-12.5"]);
  });

  it("writes a fanned neck with bass and treble columns, offsets and angles", () => {
    const rows = parse(stringify(fretTableText(computeSpec(presetById("fanned-eight").spec)))) as string[][];
    expect(rows[0]).toContain("From nut, bass (mm)");
    expect(rows[0]).toContain("Angle (°)");
    const angle = rows[0]!.indexOf("Angle (°)");
    expect(rows[1 + 8]![angle]).toBe("0.00"); // the perpendicular fret
    expect(rows[13]![rows[0]!.indexOf("From nut, bass (mm)")]).toBe("355.60"); // 711.2 / 2
  });
});
