"use client";

// One stored spec version as read: its build options and the calculator's result components, with
// every length in the workshop's unit. The stored result is used as is when the units agree;
// otherwise the same pure computation runs on the spec converted to the workshop's unit.
import { useMemo } from "react";
import { BuildResults } from "@/components/build-math/build-results";
import { Card, CardBody, CardHeader } from "@/components/ui/card";
import { computeSpec } from "@/lib/lutherie/compute-spec";
import { convertSpecUnits } from "@/lib/lutherie/spec-units";
import type { LengthUnit } from "@/lib/lutherie/units";
import type { ComputeResult } from "@/lib/schemas/instrument-spec";
import type { SpecVersionDetail } from "@/lib/schemas/spec-version";
import { BuildOptionsList } from "./build-options-fields";

export function resultInUnit(v: Pick<SpecVersionDetail, "spec" | "result">, unit: LengthUnit): ComputeResult {
  return v.spec.units === unit ? v.result : computeSpec(convertSpecUnits(v.spec, unit));
}

export function SpecVersionView({ version, unit, fileName }: { version: SpecVersionDetail; unit: LengthUnit; fileName: string }) {
  const result = useMemo(() => resultInUnit(version, unit), [version, unit]);
  return (
    <div className="space-y-5">
      <Card>
        <CardHeader title="Build options" subtitle={version.spec.name ? `Spec name: ${version.spec.name}` : undefined} />
        <CardBody>
          <BuildOptionsList options={version.options} />
        </CardBody>
      </Card>
      <BuildResults result={result} fileName={fileName} />
    </div>
  );
}
