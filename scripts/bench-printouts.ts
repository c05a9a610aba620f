// npm run bench:printouts — how long the shop printouts take to generate, measured in process on
// this machine (never asserted in tests): the 1:1 fret template of a 36-fret multi-scale 8-string
// (711.2/647.7 mm, fret 8 square) on A4 and Letter, and its build sheet with a setup sheet. Target:
// the template in under 1 s. Prints the first (cold) run and the median and p95 of warm runs, wall
// time and this process's CPU time, with the load average beside them (other work on the machine
// moves the wall times; the CPU times much less).
import { cpus, loadavg } from "node:os";
import { computeSpec } from "../lib/lutherie/compute-spec";
import { presetById } from "../lib/lutherie/presets";
import { renderBuildSheetPdf, type BuildSheetData } from "../lib/printing/build-sheet-pdf";
import { renderFretTemplatePdf } from "../lib/printing/fret-template-pdf";
import type { PaperSize } from "../lib/printing/paper";
import { fretTemplateDrawing, templateCaption } from "../lib/printing/template-drawing";
import { instrumentSpecSchema } from "../lib/schemas/instrument-spec";
import { setupSheetSchema } from "../lib/schemas/setup-sheet";
import { checkSetupSheet } from "../lib/setup/checks";
import { setupFigures, specStrings } from "../lib/setup/figures";
import { DEFAULT_SETUP_RANGES } from "../lib/setup/ranges";

// `npm run bench:printouts -- --runs 100` for more warm runs.
const runsArg = process.argv.indexOf("--runs");
const RUNS = runsArg > 0 ? Math.max(1, Number(process.argv[runsArg + 1]) || 30) : 30;
const spec = instrumentSpecSchema.parse({ ...presetById("fanned-eight").spec, frets: 36, nutWidth: 48, lastFretWidth: 72 });

async function template(paper: PaperSize) {
  // What the download route does after reading the approved version: drawing, then the PDF.
  const result = computeSpec(spec);
  const drawing = fretTemplateDrawing({ result, unit: "mm", title: "Bench - 36-fret multi-scale", subtitle: templateCaption(result, "mm", { version: 1, approvedAt: new Date().toISOString() }) });
  return renderFretTemplatePdf(drawing, paper);
}

function buildSheetData(): BuildSheetData {
  const result = computeSpec(spec);
  const strings = specStrings(result);
  const values = setupSheetSchema.parse({
    strings: strings.map((s) => ({ string: s.string, actionAt12Mm: 1.9, nutSlotAt1Mm: 0.1, intonationCents: 1, pullTest: { forceN: 2, deflectionMm: 4.5 } })),
    neck: { reliefMm: 0.2, reliefAtFret: 8 },
    pickups: spec.pickups.map((p) => ({ label: p.label, bassSideMm: 2.4, trebleSideMm: 1.8 })),
    electronics: { checks: { jack_output: true } },
  });
  const now = new Date().toISOString();
  return {
    workshopName: "Bench Workshop",
    logo: null,
    unit: "mm",
    generatedAt: now,
    commission: { number: "2026-999", title: "Bench build", clientName: "Bench Client", builderName: "Bench Builder", stageLabel: "Final setup", targetDate: null },
    spec: { version: 1, approvedAt: now, spec, result },
    stages: Array.from({ length: 10 }, (_, i) => ({ at: now, fromLabel: `Stage ${i}`, toLabel: `Stage ${i + 1}`, actor: "Bench Builder", note: null })),
    setup: {
      revision: { id: 1, revision: 1, status: "signed", values, specVersion: 1, reopenNote: null, createdAt: now, updatedAt: now, updatedBy: { id: 1, name: "Bench Builder" }, builderSignedAt: now, builderSignedBy: { id: 1, name: "Bench Builder" }, ownerSignedAt: null, ownerSignedBy: null, signedAt: now },
      figures: setupFigures(values, strings),
      issues: checkSetupSheet(values, DEFAULT_SETUP_RANGES.guitar, { stringCount: strings.length, strings }),
    },
  };
}

/** Wall time and this process's CPU time (user + system) of one call, ms. */
async function timed(fn: () => Promise<Uint8Array>) {
  const cpu0 = process.cpuUsage();
  const t0 = performance.now();
  const bytes = await fn();
  const wall = performance.now() - t0;
  const cpu = process.cpuUsage(cpu0);
  return { bytes, wall, cpu: (cpu.user + cpu.system) / 1000 };
}

async function measure(label: string, fn: () => Promise<Uint8Array>) {
  const cold = await timed(fn);
  const wall: number[] = [];
  const cpu: number[] = [];
  for (let i = 0; i < RUNS; i++) {
    const t = await timed(fn);
    wall.push(t.wall);
    cpu.push(t.cpu);
  }
  const q = (xs: number[], p: number) => [...xs].sort((a, b) => a - b)[Math.min(xs.length - 1, Math.ceil(p * xs.length) - 1)]!;
  const f = (ms: number) => `${ms.toFixed(1)} ms`;
  console.log(
    `| ${label} | ${f(cold.wall)} (CPU ${f(cold.cpu)}) | ${f(q(wall, 0.5))} (CPU ${f(q(cpu, 0.5))}) | ${f(q(wall, 0.95))} | ${f(Math.max(...wall))} | ${(cold.bytes.byteLength / 1024).toFixed(0)} KB |`,
  );
  return Math.max(cold.wall, ...wall);
}

async function main() {
  console.log(`[bench] printouts, ${RUNS} warm runs each, in process (Node ${process.version}), ${cpus().length} cores, load ${loadavg()[0]!.toFixed(2)}`);
  console.log("| printout | first run (cold) | median of warm runs | p95 | slowest | size |");
  console.log("|---|---|---|---|---|---|");
  const worst = Math.max(
    await measure("fret template, 36-fret multi-scale, A4", () => template("a4")),
    await measure("fret template, 36-fret multi-scale, Letter", () => template("letter")),
  );
  const data = buildSheetData();
  await measure("build sheet with setup sheet, A4", () => renderBuildSheetPdf(data, "a4"));
  console.log(`[bench] slowest template, cold run included: ${worst.toFixed(1)} ms wall (target < 1000 ms: ${worst < 1000 ? "met" : "NOT met"}); load now ${loadavg()[0]!.toFixed(2)}`);
}

main().catch((err) => {
  console.error(err);
  process.exitCode = 1;
});
