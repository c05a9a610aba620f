// POST /api/compute over HTTP against the built app: the documented answers for good and bad bodies.
import { describe, expect, it } from "vitest";
import { presetById } from "@/lib/lutherie/presets";
import type { ComputeResult } from "@/lib/schemas/instrument-spec";
import { appUrl } from "./app-url";
import { postCompute } from "./compute-client";

const six = () => structuredClone(presetById("six").spec);
type ErrorJson = { error: { code: string; message: string; issues?: { path: string; message: string; level?: string; code?: string }[] } };

describe("POST /api/compute", () => {
  it("answers 200 with frets, strings, totals, pickups and issues for a valid spec in inches", async () => {
    const res = await postCompute({
      units: "in",
      scale: { bass: 25.5, treble: 25.5, perpendicularFret: 0 },
      frets: 24,
      referencePitchHz: 440,
      strings: [
        { note: "E4", gaugeIn: 0.01, construction: "plain-steel" },
        { note: "B3", gaugeIn: 0.0135, construction: "plain-steel" },
      ],
      pickups: [{ label: "Bridge", fromBridge: 1.625 }],
    });
    expect(res.status).toBe(200);
    expect(res.headers.get("content-type")).toMatch(/application\/json/);
    expect(Number(res.headers.get("ratelimit-limit"))).toBeGreaterThan(0);
    const body = (await res.json()) as ComputeResult;
    expect(body.units).toBe("in");
    expect(body.frets).toHaveLength(25);
    expect(body.frets[12]!.fromNut.bass).toBeCloseTo(12.75, 9); // fret 12 at L/2 (12-TET identity)
    expect(body.frets[24]!.fromNut.treble).toBeCloseTo(19.125, 9); // fret 24 at 3L/4
    // 0.010 in plain steel at E4 on 25.5 in: 72.52 N, recomputed by hand in tests/unit/lutherie/strings.test.ts.
    expect(body.strings[0]!.tensionN).toBeCloseTo(72.524, 2);
    expect(body.strings[0]!.stressPercentOfBreaking).toBeCloseTo(53.64, 1);
    expect(body.totals.tensionN).toBeCloseTo(body.strings[0]!.tensionN + body.strings[1]!.tensionN, 9);
    expect(body.pickups[0]!.harmonics).toHaveLength(16);
    expect(body.pickups[0]!.harmonics[0]).toEqual({ n: 1, weight: expect.any(Number) });
    expect(Array.isArray(body.issues)).toBe(true);
  });

  it("answers 200 with warning-level issues when the spec is possible but unusual", async () => {
    const s = six();
    s.strings[5]!.gaugeIn = 0.03;
    const res = await postCompute(s);
    expect(res.status).toBe(200);
    const body = (await res.json()) as ComputeResult;
    expect(body.issues).toContainEqual(expect.objectContaining({ level: "warning", code: "tension_low", path: "strings.5.gaugeIn" }));
  });

  it("answers 422 with every issue when the computation finds an error (stress at the breaking margin)", async () => {
    const s = six();
    s.strings[0]!.note = "A4";
    const res = await postCompute(s);
    expect(res.status).toBe(422);
    const body = (await res.json()) as ErrorJson;
    expect(body.error.code).toBe("validation_failed");
    expect(body.error.issues).toContainEqual(expect.objectContaining({ level: "error", code: "stress_too_high", path: "strings.0.gaugeIn" }));
    expect(body.error.issues!.some((i) => i.level === "warning")).toBe(true);
  });

  it("answers 400 for malformed JSON and for an empty body", async () => {
    for (const raw of ['{"units": "mm",', ""]) {
      const res = await postCompute(raw, undefined, true);
      expect(res.status).toBe(400);
      const body = (await res.json()) as ErrorJson;
      expect(body.error.code).toBe("bad_request");
      expect(body.error.issues).toEqual([expect.objectContaining({ path: "" })]);
    }
  });

  it.each([
    ["wrong types", { ...six(), frets: "22", units: 5 }, ["frets", "units"]],
    ["a string gauge as text", { ...six(), strings: [{ note: "E4", gaugeIn: "0.010", construction: "plain-steel" }] }, ["strings.0.gaugeIn"]],
    ["out-of-range values", { ...six(), frets: 40, referencePitchHz: 500, scale: { bass: 100, treble: 648, perpendicularFret: 0 } }, ["frets", "referencePitchHz", "scale.bass"]],
    ["an empty strings list", { ...six(), strings: [] }, ["strings"]],
    ["an unknown construction and note", { ...six(), strings: [{ note: "X9", gaugeIn: 0.01, construction: "gut" }] }, ["strings.0.note", "strings.0.construction"]],
    ["a body that is not an object", [1, 2, 3], [""]],
  ])("answers 422 with field paths for %s", async (_what, body, paths) => {
    const res = await postCompute(body);
    expect(res.status).toBe(422);
    const json = (await res.json()) as ErrorJson;
    expect(json.error.code).toBe("validation_failed");
    expect(json.error.issues!.map((i) => i.path).sort()).toEqual([...paths].sort());
    for (const i of json.error.issues!) expect(i.message.length).toBeGreaterThan(3);
  });

  it("refuses other methods without a 500", async () => {
    const res = await fetch(appUrl("/api/compute"));
    expect(res.status).toBe(405);
  });
});
