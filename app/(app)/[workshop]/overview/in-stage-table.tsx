import { CommissionCell } from "@/components/overview/commission-cell";
import { Badge } from "@/components/ui/badge";
import { Table, TBody, Td, Th, THead } from "@/components/ui/table";
import type { Overview } from "@/lib/schemas/overview";
import { BuilderReassign } from "./builder-reassign-client";

const days = (n: number | null) => (n === null ? "—" : `${n} d`);

/** Open commissions, longest past their stage's median first; the owner can reassign each. */
export function InStageTable({ slug, overview, builders }: { slug: string; overview: Overview; builders: Array<{ id: number; name: string }> | null }) {
  if (overview.inStage.length === 0) return <p className="px-5 py-4 text-sm text-graphite-500">No open commissions.</p>;
  return (
    <Table caption="Time in the current stage" className="min-w-[44rem]">
      <THead>
        <tr>
          <Th>Commission</Th>
          <Th>Stage</Th>
          <Th className="text-right">In stage</Th>
          <Th className="text-right">Median</Th>
          <Th className="text-right">Over median</Th>
          <Th>Target</Th>
          <Th>Builder</Th>
        </tr>
      </THead>
      <TBody>
        {overview.inStage.map((c) => (
          <tr key={c.id}>
            <Td>
              <CommissionCell slug={slug} commission={c} />
            </Td>
            <Td>{c.stageLabel}</Td>
            <Td numeric>{days(c.daysInStage)}</Td>
            <Td numeric>{days(c.stageMedianDays)}</Td>
            <Td numeric className={c.overMedianDays !== null && c.overMedianDays > 0 ? "font-semibold text-ember-600" : undefined}>
              {c.overMedianDays === null ? "—" : `${c.overMedianDays > 0 ? "+" : ""}${c.overMedianDays} d`}
            </Td>
            <Td className="whitespace-nowrap font-mono">
              {c.targetDate ?? "—"} {c.overdue ? <Badge tone="danger">Overdue</Badge> : null}
            </Td>
            <Td>{builders ? <BuilderReassign slug={slug} commission={c} builders={builders} /> : (c.builder?.name ?? "Nobody yet")}</Td>
          </tr>
        ))}
      </TBody>
    </Table>
  );
}
