import Link from "next/link";
import { Table, TBody, Td, Th, THead } from "@/components/ui/table";
import { commissionsListHref } from "@/lib/overview/drill-down";
import type { Overview } from "@/lib/schemas/overview";

const linkClass = "font-semibold text-rosewood-700 underline-offset-2 hover:underline";

/** Builder × stage counts; every number opens the commissions table with the same filters. */
export function WorkloadTable({ slug, overview }: { slug: string; overview: Overview }) {
  const cohort = overview.cohort?.id;
  const used = overview.stages.filter((s) => overview.workload.some((w) => w.byStage[s.key]));
  return (
    <Table caption="Workload by builder and stage" className="min-w-[32rem]">
      <THead>
        <tr>
          <Th>Builder</Th>
          {used.map((s) => (
            <Th key={s.key} className="text-right">
              {s.label}
            </Th>
          ))}
          <Th className="text-right">Open</Th>
          <Th className="text-right">Overdue</Th>
        </tr>
      </THead>
      <TBody>
        {overview.workload.map((w) => {
          const builder = w.builder ? w.builder.id : ("none" as const);
          const name = w.builder?.name ?? "Nobody yet";
          return (
            <tr key={String(builder)}>
              <Td className="font-semibold">{name}</Td>
              {used.map((s) => (
                <Td key={s.key} numeric>
                  {w.byStage[s.key] ? (
                    <Link className={linkClass} href={commissionsListHref(slug, { builder, stage: s.key, cohort })} aria-label={`${name}, ${s.label}: ${w.byStage[s.key]}`}>
                      {w.byStage[s.key]}
                    </Link>
                  ) : (
                    <span className="text-graphite-300">·</span>
                  )}
                </Td>
              ))}
              <Td numeric>
                <Link className={linkClass} href={commissionsListHref(slug, { builder, cohort })} aria-label={`${name}: ${w.open} open`}>
                  {w.open}
                </Link>
              </Td>
              <Td numeric>
                {w.overdue ? (
                  <Link className="font-semibold text-ember-600 underline-offset-2 hover:underline" href={commissionsListHref(slug, { builder, overdue: true, cohort })} aria-label={`${name}: ${w.overdue} overdue`}>
                    {w.overdue}
                  </Link>
                ) : (
                  0
                )}
              </Td>
            </tr>
          );
        })}
      </TBody>
    </Table>
  );
}
