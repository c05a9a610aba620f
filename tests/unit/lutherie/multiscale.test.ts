// Fanned frets: the geometry of SOURCES §2.3, checked against its closed forms and against the single-scale rule.
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { fretDistance } from "@/lib/lutherie/frets";
import { edgeY, fretGeometry, fretOffset, interpolatedScale, saddleY, widthAtFret } from "@/lib/lutherie/multiscale";

const fan = { bass: 711.2, treble: 647.7, perpendicularFret: 8 };
const widths = { nut: 54, lastFret: 72, lastFretNumber: 27 };

describe("multi-scale geometry [derived here, SOURCES §2.3]", () => {
  it("keeps the perpendicular fret square: both ends at y = 0, angle 0", () => {
    const g = fretGeometry(fan, 8, widths);
    expect(g.offset).toBeCloseTo(0, 12);
    expect(g.angleDeg).toBeCloseTo(0, 12);
    expect(g.ends!.bass.y).toBeCloseTo(0, 12);
  });

  it("offsets the nut by −(L_b − L_t)(1 − 2^(−p/12)) and the saddle line by +(L_b − L_t)·2^(−p/12)", () => {
    const diff = fan.bass - fan.treble;
    expect(fretOffset(fan, 0)).toBeCloseTo(-diff * (1 - 2 ** (-8 / 12)), 12);
    expect(saddleY(fan.bass, 8) - saddleY(fan.treble, 8)).toBeCloseTo(diff * 2 ** (-8 / 12), 12);
  });

  it("spaces frets along each edge exactly as a single scale of that edge's length", () => {
    for (let n = 0; n <= 27; n++) {
      expect(edgeY(fan.bass, 8, n) - edgeY(fan.bass, 8, 0)).toBeCloseTo(fretDistance(fan.bass, n), 9);
      expect(edgeY(fan.treble, 8, n) - edgeY(fan.treble, 8, 0)).toBeCloseTo(fretDistance(fan.treble, n), 9);
    }
  });

  it("gives the angle atan(offset/W) and the length sqrt(W² + offset²) at each fret", () => {
    for (const n of [0, 1, 12, 27]) {
      const g = fretGeometry(fan, n, widths);
      const w = widthAtFret(54, 72, 27, n);
      expect(g.angleDeg).toBeCloseTo((Math.atan(g.offset / w) * 180) / Math.PI, 12);
      expect(g.length).toBeCloseTo(Math.sqrt(w * w + g.offset * g.offset), 12);
      expect(g.ends!.bass.x - g.ends!.treble.x).toBeCloseTo(w, 12);
    }
    expect(widthAtFret(54, 72, 27, 0)).toBe(54);
    expect(widthAtFret(54, 72, 27, 27)).toBeCloseTo(72, 12);
  });

  it("reduces to square frets on a single scale", () => {
    fc.assert(
      fc.property(fc.double({ min: 200, max: 1300, noNaN: true }), fc.integer({ min: 0, max: 36 }), (L, n) => {
        const g = fretGeometry({ bass: L, treble: L, perpendicularFret: 0 }, n, { nut: 43, lastFret: 56, lastFretNumber: 36 });
        expect(g.offset).toBe(0);
        expect(g.angleDeg).toBe(0);
      }),
    );
  });

  it("interpolates string lengths linearly from treble (string 1) to bass edge (common practice, no source)", () => {
    expect(interpolatedScale(fan, 0, 8)).toBe(647.7);
    expect(interpolatedScale(fan, 7, 8)).toBeCloseTo(711.2, 12);
    expect(interpolatedScale(fan, 3, 8) - interpolatedScale(fan, 2, 8)).toBeCloseTo((711.2 - 647.7) / 7, 12);
  });
});
