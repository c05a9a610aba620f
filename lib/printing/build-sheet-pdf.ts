// The build sheet: one document with the approved spec and its computed tables (frets, strings and
// tensions, pickups), the stages with their dates, the setup sheet when there is one, and the
// cautions. Lengths in the workshop's unit; gauges in inches as the trade gives them.
import { CONSTRUCTION_LABELS, type ComputeResult, type InstrumentSpec } from "@/lib/schemas/instrument-spec";
import { ELECTRONICS_CHECKS } from "@/lib/schemas/setup-sheet";
import type { SetupSheetRevision } from "@/lib/schemas/setup-sheet-out";
import type { SetupIssue } from "@/lib/setup/checks";
import type { StringFigures } from "@/lib/setup/figures";
import { formatCents, formatDegrees, formatForce, formatGaugeIn, formatHz, formatLength, formatPercent, toMm, type LengthUnit } from "@/lib/lutherie/units";
import { PRINTOUT_CAUTIONS } from "./cautions";
import type { PaperSize } from "./paper";
import { MUTED, PdfFlow, type Column } from "./pdf-flow";

/** A workshop logo for the masthead (PNG or JPEG bytes). */
export interface PrintLogo {
  bytes: Uint8Array;
  format: "png" | "jpeg";
}

export interface BuildSheetData {
  workshopName: string;
  logo: PrintLogo | null;
  unit: LengthUnit;
  generatedAt: string;
  commission: { number: string; title: string; clientName: string; builderName: string | null; stageLabel: string; targetDate: string | null };
  spec: { version: number; approvedAt: string; spec: InstrumentSpec; result: ComputeResult } | null;
  stages: Array<{ at: string; fromLabel: string | null; toLabel: string; actor: string | null; note: string | null }>;
  setup: { revision: SetupSheetRevision; figures: StringFigures[]; issues: SetupIssue[] } | null;
}

const date = (isoString: string) => isoString.slice(0, 10);

export async function renderBuildSheetPdf(data: BuildSheetData, paper: PaperSize): Promise<Uint8Array> {
  const f = await PdfFlow.create(paper, {
    title: `Build sheet - ${data.commission.number} ${data.commission.title}`,
    footer: `${data.workshopName} - build sheet ${data.commission.number} - generated ${data.generatedAt.slice(0, 16).replace("T", " ")} UTC`,
  });
  if (data.logo) {
    const image = data.logo.format === "png" ? await f.doc.embedPng(data.logo.bytes) : await f.doc.embedJpg(data.logo.bytes);
    f.imageTopRight(image, 14);
  }
  f.text(data.workshopName, { size: 10, bold: true, color: MUTED });
  f.heading(`Build sheet ${data.commission.number}: ${data.commission.title}`, 1);
  f.pairs([
    ["Client", data.commission.clientName],
    ["Builder", data.commission.builderName ?? "Not assigned"],
    ["Stage now", data.commission.stageLabel],
    ["Target date", data.commission.targetDate ?? "None set"],
    ["Approved spec", data.spec ? `Version ${data.spec.version}, approved ${date(data.spec.approvedAt)}` : "No approved spec yet"],
  ]);

  if (data.spec) specSections(f, data.spec.spec, data.spec.result, data.unit);
  stageSection(f, data.stages);
  if (data.setup) setupSection(f, data.setup, data.unit);

  f.heading("Cautions");
  for (const c of PRINTOUT_CAUTIONS) {
    f.text(c.title, { size: 8.5, bold: true });
    f.text(c.text, { size: 8.5 });
  }
  f.text("The figures are design estimates from idealised physics, not guarantees of safe loads.", { size: 8, color: MUTED });
  return f.save();
}

function specSections(f: PdfFlow, spec: InstrumentSpec, r: ComputeResult, unit: LengthUnit) {
  const L = (v: number) => formatLength(toMm(v, r.units), unit);
  const multi = r.scale.multiScale;
  f.heading("Approved spec");
  f.pairs([
    ["Name", spec.name ?? "-"],
    ["Instrument", `${r.family === "bass" ? "Bass" : "Guitar"}, ${r.strings.length} strings, ${spec.frets} frets`],
    ["Scale", multi ? `${L(r.scale.bass)} ${unit} bass / ${L(r.scale.treble)} ${unit} treble, fret ${r.scale.perpendicularFret} square` : `${L(r.scale.bass)} ${unit}`],
    ["Reference pitch", `A4 = ${r.referencePitchHz} Hz`],
    ["Board width", spec.nutWidth !== undefined && spec.lastFretWidth !== undefined ? `${L(spec.nutWidth)} ${unit} at the nut, ${L(spec.lastFretWidth)} ${unit} at the last fret` : "Not given"],
    ["Pickups", spec.pickups.length ? spec.pickups.map((p) => `${p.label} ${L(p.fromBridge)}${p.fromBridgeTreble !== undefined ? `/${L(p.fromBridgeTreble)}` : ""} ${unit} from the bridge`).join("; ") : "None"],
  ]);

  f.heading(`Frets (distances in ${unit}${multi ? ", bass edge / treble edge" : ""})`);
  const fretCols: Column[] = multi
    ? [
        { label: "Fret", width: 0.08 },
        { label: "From nut, bass", width: 0.16, align: "right" },
        { label: "From nut, treble", width: 0.16, align: "right" },
        { label: "From previous, bass", width: 0.17, align: "right" },
        { label: "From previous, treble", width: 0.17, align: "right" },
        { label: "Angle (deg)", width: 0.12, align: "right" },
      ]
    : [
        { label: "Fret", width: 0.1 },
        { label: "From nut", width: 0.2, align: "right" },
        { label: "From previous", width: 0.2, align: "right" },
        { label: "To saddle", width: 0.2, align: "right" },
      ];
  f.table(
    fretCols,
    r.frets.map((row) =>
      multi
        ? [row.n === 0 ? "Nut" : String(row.n), L(row.fromNut.bass), L(row.fromNut.treble), L(row.fromPrevious.bass), L(row.fromPrevious.treble), row.angleDeg === null ? "-" : formatDegrees(row.angleDeg)]
        : [row.n === 0 ? "Nut" : String(row.n), L(row.fromNut.treble), L(row.fromPrevious.treble), L(row.toSaddle.treble)],
    ),
  );

  f.heading("Strings and tensions");
  f.table(
    [
      { label: "String", width: 0.07 },
      { label: "Note", width: 0.07 },
      { label: "Hz", width: 0.09, align: "right" },
      { label: `Scale (${unit})`, width: 0.1, align: "right" },
      { label: "Gauge (in)", width: 0.09, align: "right" },
      { label: "Construction", width: 0.28 },
      { label: "Tension N", width: 0.1, align: "right" },
      { label: "lbf", width: 0.08, align: "right" },
      { label: "% of A228", width: 0.1, align: "right" },
    ],
    r.strings.map((s) => [
      String(s.string),
      s.note,
      formatHz(s.frequencyHz),
      L(s.scaleLength),
      formatGaugeIn(s.gaugeIn),
      CONSTRUCTION_LABELS[s.construction],
      formatForce(s.tensionN, "N"),
      formatForce(s.tensionN, "lbf"),
      formatPercent(s.stressPercentOfBreaking),
    ]),
  );
  f.text(`Total ${formatForce(r.totals.tensionN, "N")} N (${formatForce(r.totals.tensionLbf, "lbf")} lbf). ${r.model.tension}`, { size: 7.5, color: MUTED });

  if (r.pickups.length) {
    f.heading("Pickups");
    f.table(
      [
        { label: "Pickup", width: 0.25 },
        { label: `From bridge (${unit})`, width: 0.2, align: "right" },
        { label: "Harmonics nearly cancelled (n)", width: 0.55 },
      ],
      r.pickups.map((p) => [p.label, L(p.fromBridge), p.nearlyCancelled.length ? p.nearlyCancelled.join(", ") : "none up to 16"]),
    );
  }
  if (r.issues.length) {
    f.heading("Build-math notes on this spec");
    for (const i of r.issues) f.text(`${i.level === "error" ? "Error" : "Warning"}: ${i.message}`, { size: 8 });
  }
}

function stageSection(f: PdfFlow, stages: BuildSheetData["stages"]) {
  f.heading("Stages");
  if (!stages.length) {
    f.text("No stage changes yet.", { size: 8.5 });
    return;
  }
  f.table(
    [
      { label: "Date (UTC)", width: 0.14 },
      { label: "Stage", width: 0.34 },
      { label: "By", width: 0.18 },
      { label: "Note", width: 0.34 },
    ],
    stages.map((s) => [date(s.at), s.fromLabel ? `${s.fromLabel} -> ${s.toLabel}` : s.toLabel, s.actor ?? "-", s.note ?? ""]),
  );
}

function setupSection(f: PdfFlow, setup: NonNullable<BuildSheetData["setup"]>, unit: LengthUnit) {
  const { revision: r, figures } = setup;
  const v = r.values;
  const L = (mm: number) => formatLength(mm, unit);
  f.heading(`Final setup (revision ${r.revision}, ${r.status === "signed" ? `signed ${date(r.signedAt!)}` : r.status === "awaiting_owner" ? "awaiting the owner's sign-off" : "draft, not signed"})`);
  const signers = [r.builderSignedBy && `builder ${r.builderSignedBy.name} ${date(r.builderSignedAt!)}`, r.ownerSignedBy && `owner ${r.ownerSignedBy.name} ${date(r.ownerSignedAt!)}`].filter(Boolean);
  if (signers.length) f.text(`Signed by ${signers.join("; ")}.`, { size: 8.5 });
  f.table(
    [
      { label: "String", width: 0.08 },
      { label: `Action 12th (${unit})`, width: 0.13, align: "right" },
      { label: `Nut slot (${unit})`, width: 0.12, align: "right" },
      { label: "Cents at 12th", width: 0.13, align: "right" },
      { label: `Saddle move (${unit})`, width: 0.14, align: "right" },
      { label: "Pull test N", width: 0.12, align: "right" },
      { label: "Spec N", width: 0.1, align: "right" },
      { label: "Difference", width: 0.18, align: "right" },
    ],
    v.strings.map((s, i) => {
      const fig = figures[i];
      const pt = fig?.pullTest;
      const move = fig?.saddleMoveMm;
      return [
        String(s.string),
        L(s.actionAt12Mm),
        L(s.nutSlotAt1Mm),
        formatCents(s.intonationCents),
        move === null || move === undefined ? "-" : move === 0 ? "0" : `${L(Math.abs(move))} ${move > 0 ? "back" : "forward"}`,
        pt ? formatForce(pt.tensionN, "N") : "-",
        pt ? formatForce(pt.specTensionN, "N") : "-",
        pt ? `${pt.differenceN >= 0 ? "+" : ""}${formatForce(pt.differenceN, "N")} N (${formatPercent(pt.differencePercent)} %)` : "-",
      ];
    }),
  );
  f.text("Saddle move: 'back' is away from the nut (the note was sharp), 'forward' toward it; model B, retune and check again.", { size: 7.5, color: MUTED });
  f.pairs([
    [`Relief at fret ${v.neck.reliefAtFret}`, `${L(v.neck.reliefMm)} ${unit}`],
    ["Truss rod notes", v.neck.trussRodNotes || "-"],
    ["Pickup heights (bass/treble)", v.pickups.length ? v.pickups.map((p) => `${p.label} ${L(p.bassSideMm)}/${L(p.trebleSideMm)} ${unit}`).join("; ") : "-"],
    ["Electronics", ELECTRONICS_CHECKS.map((c) => `[${v.electronics.checks[c.key] ? "x" : " "}] ${c.label}`).join("\n")],
    ["Electronics notes", v.electronics.notes || "-"],
    ["Notes", v.notes || "-"],
  ]);
  const warnings = setup.issues.filter((i) => i.level === "warning");
  if (warnings.length) {
    f.text("Outside the workshop's common-practice ranges:", { size: 8.5, bold: true });
    for (const w of warnings) f.text(`- ${w.message}`, { size: 8 });
  }
}
