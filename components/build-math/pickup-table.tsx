// Each pickup's place on every string (x/L) and the harmonics it nearly cancels there.
import { Table, TBody, Td, Th, THead } from "@/components/ui/table";
import type { ComputeResult } from "@/lib/schemas/instrument-spec";
import { formatLengthIn } from "@/lib/lutherie/units";

export function PickupTable({ result }: { result: Pick<ComputeResult, "pickups" | "units" | "strings"> }) {
  if (result.pickups.length === 0) return null;
  return (
    <Table caption="Pickup position on each string">
      <THead>
        <tr>
          <Th>Pickup</Th>
          <Th>String</Th>
          <Th className="text-right">From bridge ({result.units})</Th>
          <Th className="text-right">x / L</Th>
          <Th>Nearly cancels (n)</Th>
        </tr>
      </THead>
      <TBody>
        {result.pickups.flatMap((p, j) =>
          p.perString.map((s, i) => (
            <tr key={`${j}-${s.string}`} className={i === 0 ? "border-t-2 border-spruce-200" : undefined}>
              <Td className="font-semibold">{i === 0 ? p.label : ""}</Td>
              <Td className="font-mono">
                {s.string} · {result.strings[i]?.note}
              </Td>
              <Td numeric>{formatLengthIn(s.fromBridge, result.units)}</Td>
              <Td numeric>{s.ratio.toFixed(4)}</Td>
              <Td className="font-mono text-xs">{s.nearlyCancelled.length ? s.nearlyCancelled.join(", ") : "—"}</Td>
            </tr>
          )),
        )}
      </TBody>
    </Table>
  );
}
