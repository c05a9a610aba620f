// The setup summary a client reads in the delivery e-mail (and the build sheet repeats): a few
// plain lines in the workshop's unit. Pure.
import { formatCents, formatLength, type LengthUnit } from "@/lib/lutherie/units";
import { ELECTRONICS_CHECKS, type SetupSheet } from "@/lib/schemas/setup-sheet";

export interface SummarySignature {
  revision: number;
  builderName: string | null;
  signedAt: string | null;
  ownerName?: string | null;
}

const span = (values: number[], unit: LengthUnit) => {
  const lo = Math.min(...values);
  const hi = Math.max(...values);
  return lo === hi ? `${formatLength(lo, unit)} ${unit}` : `${formatLength(lo, unit)}-${formatLength(hi, unit)} ${unit}`;
};

export function setupSummaryLines(sheet: SetupSheet, unit: LengthUnit, signature?: SummarySignature): string[] {
  const strings = [...sheet.strings].sort((a, b) => a.string - b.string);
  const first = strings[0];
  const last = strings.at(-1);
  const lines: string[] = [];
  if (first && last) {
    lines.push(
      first === last
        ? `Action at the 12th fret: ${formatLength(first.actionAt12Mm, unit)} ${unit}`
        : `Action at the 12th fret: ${formatLength(first.actionAt12Mm, unit)} ${unit} (string ${first.string}) to ${formatLength(last.actionAt12Mm, unit)} ${unit} (string ${last.string})`,
    );
    lines.push(`Nut slot height over the 1st fret: ${span(strings.map((s) => s.nutSlotAt1Mm), unit)}`);
    const worst = Math.max(...strings.map((s) => Math.abs(s.intonationCents)));
    lines.push(`Intonation at the 12th fret: within ${formatCents(worst)} cents on every string`);
  }
  lines.push(`Neck relief at the ${sheet.neck.reliefAtFret}th fret: ${formatLength(sheet.neck.reliefMm, unit)} ${unit}`);
  if (sheet.pickups.length) {
    lines.push(
      `Pickup height, bass/treble side: ${sheet.pickups.map((p) => `${p.label} ${formatLength(p.bassSideMm, unit)}/${formatLength(p.trebleSideMm, unit)} ${unit}`).join("; ")}`,
    );
  }
  const done = ELECTRONICS_CHECKS.filter((c) => sheet.electronics.checks[c.key]).length;
  lines.push(`Electronics checks done: ${done} of ${ELECTRONICS_CHECKS.length}`);
  if (signature?.signedAt) {
    const who = [signature.builderName, signature.ownerName].filter(Boolean).join(" and ");
    lines.push(`Signed off${who ? ` by ${who}` : ""} on ${signature.signedAt.slice(0, 10)} (revision ${signature.revision})`);
  }
  return lines;
}
