"use client";

// The versions of a commission's spec: who saved each and when, whether it was sent and approved,
// its checks and total tension. Picking one shows it in full.
import { Badge } from "@/components/ui/badge";
import { Table, TBody, Td, Th, THead } from "@/components/ui/table";
import { forceUnitFor, formatForce, type LengthUnit } from "@/lib/lutherie/units";
import type { SpecVersionSummary } from "@/lib/schemas/spec-version";
import { formatWhen } from "./format";

export function versionStatus(v: SpecVersionSummary) {
  if (v.approvedAt) return <Badge tone="success">approved</Badge>;
  if (v.submittedAt) return <Badge tone="accent">sent</Badge>;
  return <Badge>draft</Badge>;
}

export function SpecVersionsTable({ versions, unit, selectedId, onSelect }: { versions: SpecVersionSummary[]; unit: LengthUnit; selectedId: number | null; onSelect: (id: number) => void }) {
  const fu = forceUnitFor(unit);
  return (
    <Table caption="Spec versions" aria-label="Spec versions">
      <THead>
        <tr>
          <Th>Version</Th>
          <Th>Saved</Th>
          <Th>Status</Th>
          <Th>Checks</Th>
          <Th className="text-right">Total tension ({fu})</Th>
          <Th>
            <span className="sr-only">Show</span>
          </Th>
        </tr>
      </THead>
      <TBody>
        {versions.map((v) => (
          <tr key={v.id} className={v.id === selectedId ? "bg-brass-50" : undefined}>
            <Td className="font-mono font-semibold">v{v.version}</Td>
            <Td className="whitespace-nowrap text-xs">
              {v.createdBy.name}
              <br />
              {formatWhen(v.createdAt)}
            </Td>
            <Td>{versionStatus(v)}</Td>
            <Td className="whitespace-nowrap text-xs">
              {v.errorCount ? <Badge tone="danger">{v.errorCount} errors</Badge> : null} {v.warningCount ? <Badge tone="warning">{v.warningCount} warnings</Badge> : null}
              {!v.errorCount && !v.warningCount ? "clear" : null}
            </Td>
            <Td numeric>{formatForce(v.totalTensionN, fu)}</Td>
            <Td>
              <button type="button" className="text-sm font-semibold text-rosewood-700 underline disabled:no-underline disabled:opacity-50" disabled={v.id === selectedId} onClick={() => onSelect(v.id)} aria-label={`Show version ${v.version}`}>
                {v.id === selectedId ? "Shown" : "Show"}
              </button>
            </Td>
          </tr>
        ))}
      </TBody>
    </Table>
  );
}
