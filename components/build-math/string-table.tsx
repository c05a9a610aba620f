// Per-string results: pitch, length, unit weight, tension, stress against ASTM A228, breaking pitch, B.
import { Badge } from "@/components/ui/badge";
import { Table, TBody, Td, Th, THead } from "@/components/ui/table";
import type { ComputeResult } from "@/lib/schemas/instrument-spec";
import { nearestNote } from "@/lib/lutherie/pitch";
import { formatForce, formatGaugeIn, formatHz, formatLengthIn, formatPercent, formatUnitWeight } from "@/lib/lutherie/units";

type Props = { result: Pick<ComputeResult, "strings" | "totals" | "units" | "constants" | "referencePitchHz"> };

export function StringTable({ result }: Props) {
  const { constants: c, units: u } = result;
  return (
    <Table caption="Tension and stress per string">
      <THead>
        <tr>
          <Th>String</Th>
          <Th className="text-right">Pitch (Hz)</Th>
          <Th className="text-right">Length ({u})</Th>
          <Th className="text-right">Gauge / core (in)</Th>
          <Th className="text-right">Unit weight (kg/m)</Th>
          <Th className="text-right">Tension (N)</Th>
          <Th className="text-right">Tension (lbf)</Th>
          <Th className="text-right">Stress (% of A228 min.)</Th>
          <Th className="text-right">Breaks near</Th>
          <Th className="text-right">Inharmonicity B</Th>
        </tr>
      </THead>
      <TBody>
        {result.strings.map((s) => {
          const tone = s.stressPercentOfBreaking >= c.stressErrorPercent ? "danger" : s.stressPercentOfBreaking >= c.stressWarningPercent ? "warning" : "success";
          const breaks = nearestNote(s.breakingFrequencyHz, result.referencePitchHz);
          return (
            <tr key={s.string}>
              <Td className="whitespace-nowrap font-mono">
                {s.string} · {s.note}
              </Td>
              <Td numeric>{formatHz(s.frequencyHz)}</Td>
              <Td numeric>{formatLengthIn(s.scaleLength, u)}</Td>
              <Td numeric>
                {formatGaugeIn(s.gaugeIn)}
                {s.construction === "plain-steel" ? "" : ` / ${formatGaugeIn(s.coreIn)} ${s.coreShape}`}
              </Td>
              <Td numeric>
                {formatUnitWeight(s.unitWeightKgPerM)}
                {s.unitWeightSource === "entered" ? " (measured)" : ""}
              </Td>
              <Td numeric>{formatForce(s.tensionN, "N")}</Td>
              <Td numeric>{formatForce(s.tensionN, "lbf")}</Td>
              <Td numeric>
                <Badge tone={tone}>{formatPercent(s.stressPercentOfBreaking)} %</Badge>
                {s.strengthBasis === "above-table" ? <span title="Core thicker than the table's 0.026 in: the percentage may read low"> *</span> : null}
              </Td>
              <Td numeric>{breaks.name}</Td>
              <Td numeric>{s.inharmonicityB.toExponential(2)}</Td>
            </tr>
          );
        })}
        <tr className="bg-spruce-100 font-semibold">
          <Td colSpan={5}>Total string tension</Td>
          <Td numeric>{formatForce(result.totals.tensionN, "N")}</Td>
          <Td numeric>{formatForce(result.totals.tensionN, "lbf")}</Td>
          <Td colSpan={3} />
        </tr>
      </TBody>
    </Table>
  );
}
