// A setup sheet revision for reading (signed, locked, or for the client): the measurements in the
// workshop's unit with the saddle moves and pull-test figures beside them.
import { Badge } from "@/components/ui/badge";
import { TBody, THead, Table, Td, Th } from "@/components/ui/table";
import { formatCents, formatLength } from "@/lib/lutherie/units";
import { ELECTRONICS_CHECKS } from "@/lib/schemas/setup-sheet";
import type { SetupSheetStatus, SetupSheetView } from "@/lib/schemas/setup-sheet-out";
import { describePullTest, describeSaddleMove } from "@/lib/setup/format";
import { setupForceUnit } from "@/lib/setup/sheet-units";

export const STATUS_LABEL: Record<SetupSheetStatus, string> = { draft: "Draft", awaiting_owner: "Waiting for the owner", signed: "Signed" };

export function StatusBadge({ status }: { status: SetupSheetStatus }) {
  return <Badge tone={status === "signed" ? "success" : status === "awaiting_owner" ? "warning" : "neutral"}>{STATUS_LABEL[status]}</Badge>;
}

const date = (iso: string | null) => (iso ? iso.slice(0, 10) : "");

export function SetupReadout({ view }: { view: SetupSheetView }) {
  const sheet = view.sheet!;
  const v = sheet.values;
  const unit = view.unit;
  const fu = setupForceUnit(unit);
  const L = (mm: number) => `${formatLength(mm, unit)} ${unit}`;
  const note = (string: number) => view.spec?.strings.find((s) => s.string === string)?.note ?? "";
  return (
    <div className="space-y-5">
      <p className="text-sm">
        Revision {sheet.revision} <StatusBadge status={sheet.status} />
        {sheet.builderSignedBy ? ` Signed by ${sheet.builderSignedBy.name} on ${date(sheet.builderSignedAt)}` : ""}
        {sheet.ownerSignedBy ? `; signed off by ${sheet.ownerSignedBy.name} on ${date(sheet.ownerSignedAt)}` : ""}.
        {sheet.reopenNote ? ` Reopened: ${sheet.reopenNote}` : ""}
      </p>
      <Table caption="Measurements per string">
        <THead>
          <tr>
            <Th>String</Th>
            <Th>Action at 12th</Th>
            <Th>Nut slot at 1st</Th>
            <Th>Intonation at 12th</Th>
            <Th>Suggested saddle move</Th>
            <Th>Pull-test tension / spec / difference</Th>
          </tr>
        </THead>
        <TBody>
          {v.strings.map((s, i) => {
            const fig = view.figures[i];
            const pt = fig?.pullTest ? describePullTest(fig.pullTest, fu) : null;
            return (
              <tr key={s.string}>
                <Td className="font-semibold">
                  {s.string} <span className="font-mono text-xs text-graphite-500">{note(s.string)}</span>
                </Td>
                <Td numeric>{L(s.actionAt12Mm)}</Td>
                <Td numeric>{L(s.nutSlotAt1Mm)}</Td>
                <Td numeric>{formatCents(s.intonationCents)} cents</Td>
                <Td className="text-xs">{describeSaddleMove(fig?.saddleMoveMm ?? null, unit)}</Td>
                <Td className="text-xs">{pt ? `${pt.measured} / ${pt.spec} / ${pt.difference}` : "-"}</Td>
              </tr>
            );
          })}
        </TBody>
      </Table>
      <dl className="grid gap-x-6 gap-y-2 text-sm sm:grid-cols-[12rem_1fr]">
        <dt className="text-graphite-500">Relief at fret {v.neck.reliefAtFret}</dt>
        <dd className="font-mono">{L(v.neck.reliefMm)}</dd>
        <dt className="text-graphite-500">Truss rod notes</dt>
        <dd className="whitespace-pre-wrap">{v.neck.trussRodNotes || "-"}</dd>
        <dt className="text-graphite-500">Pickup height (bass / treble side)</dt>
        <dd>{v.pickups.length ? v.pickups.map((p) => `${p.label} ${L(p.bassSideMm)} / ${L(p.trebleSideMm)}`).join("; ") : "-"}</dd>
        <dt className="text-graphite-500">Electronics</dt>
        <dd>
          <ul>
            {ELECTRONICS_CHECKS.map((c) => (
              <li key={c.key}>
                <span aria-hidden>{v.electronics.checks[c.key] ? "☑" : "☐"}</span> <span className="sr-only">{v.electronics.checks[c.key] ? "Done:" : "Not done:"}</span> {c.label}
              </li>
            ))}
          </ul>
          {v.electronics.notes ? <p className="mt-1 whitespace-pre-wrap">{v.electronics.notes}</p> : null}
        </dd>
        <dt className="text-graphite-500">Notes</dt>
        <dd className="whitespace-pre-wrap">{v.notes || "-"}</dd>
      </dl>
    </div>
  );
}
