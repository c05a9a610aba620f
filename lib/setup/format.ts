// Display text for setup figures, shared by the setup page and its form. Pure.
import { formatForce, formatLength, formatPercent, type LengthUnit } from "@/lib/lutherie/units";
import type { StringFigures } from "./figures";

/** "0.47 mm away from the nut" / "0.12 in toward the nut" / "none". */
export function describeSaddleMove(moveMm: number | null, unit: LengthUnit): string {
  if (moveMm === null || !Number.isFinite(moveMm)) return "-";
  if (formatLength(Math.abs(moveMm), unit) === formatLength(0, unit)) return "none";
  return `${formatLength(Math.abs(moveMm), unit)} ${unit} ${moveMm > 0 ? "away from the nut" : "toward the nut"}`;
}

/** Pull-test tension beside the spec's, in the workshop's force unit. */
export function describePullTest(p: NonNullable<StringFigures["pullTest"]>, forceUnit: "N" | "lbf"): { measured: string; spec: string; difference: string } {
  const sign = p.differenceN >= 0 ? "+" : "-";
  return {
    measured: `${formatForce(p.tensionN, forceUnit)} ${forceUnit}`,
    spec: `${formatForce(p.specTensionN, forceUnit)} ${forceUnit}`,
    difference: `${sign}${formatForce(Math.abs(p.differenceN), forceUnit)} ${forceUnit} (${sign}${formatPercent(Math.abs(p.differencePercent))} %)`,
  };
}
