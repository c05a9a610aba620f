// What changed in a spec version against the one the client approved before: every changed field,
// the change in total string tension, and the tremolo springs note when it applies.
import { Alert } from "@/components/ui/alert";
import { Table, TBody, Td, Th, THead } from "@/components/ui/table";
import { forceUnitFor, formatForce, type LengthUnit } from "@/lib/lutherie/units";
import type { SpecVersionDetail } from "@/lib/schemas/spec-version";
import { describeSpecChanges } from "./spec-change-text";

const signed = (text: string) => (text.startsWith("-") ? `−${text.slice(1)}` : `+${text}`);

export function SpecChanges({ version, unit }: { version: SpecVersionDetail; unit: LengthUnit }) {
  const change = version.change;
  if (!change) return null;
  const lines = describeSpecChanges(change.changes, { unit, afterUnits: version.spec.units });
  const fu = forceUnitFor(unit);
  const other = fu === "N" ? "lbf" : "N";
  return (
    <div className="space-y-3">
      <h3 className="text-base font-semibold">
        Changes since version {change.againstVersion}, the last one approved
      </h3>
      {lines.length === 0 ? (
        <p className="text-sm">No field has changed.</p>
      ) : (
        <Table caption={`Changes since version ${change.againstVersion}`} aria-label="Changed fields">
          <THead>
            <tr>
              <Th>Field</Th>
              <Th>Was</Th>
              <Th>Now</Th>
            </tr>
          </THead>
          <TBody>
            {lines.map((l) => (
              <tr key={l.path}>
                <Td>{l.label}</Td>
                <Td className="whitespace-pre-wrap break-words text-graphite-600 line-through decoration-graphite-300">{l.before}</Td>
                <Td className="whitespace-pre-wrap break-words font-semibold">{l.after}</Td>
              </tr>
            ))}
          </TBody>
        </Table>
      )}
      <p className="text-sm" data-testid="tension-change">
        Total string tension:{" "}
        <span className="font-mono font-semibold">
          {signed(formatForce(change.tensionDeltaN, fu))} {fu}
        </span>{" "}
        <span className="text-graphite-600">
          ({signed(formatForce(change.tensionDeltaN, other))} {other})
        </span>
      </p>
      {change.tremoloNote ? (
        <Alert tone="warning" data-testid="tremolo-note">
          {change.tremoloNote}
        </Alert>
      ) : null}
    </div>
  );
}
