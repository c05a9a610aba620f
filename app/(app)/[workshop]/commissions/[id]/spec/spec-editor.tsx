"use client";

// The workshop's spec editor: the calculator's spec form and result components on the commission,
// plus the build options. Figures follow every keystroke (the same pure computation the server
// stores with the version); computed errors and warnings also appear on the fields they concern.
// Saving stores a new version in millimetres; the form shows the workshop's unit.
import { useMemo, useState } from "react";
import { useForm, type FieldPath } from "react-hook-form";
import { BuildResults } from "@/components/build-math/build-results";
import { PresetPicker } from "@/components/build-math/preset-picker";
import { SpecFormFields } from "@/components/build-math/spec-form";
import { focusSpecField } from "@/components/build-math/spec-form-fields";
import { specResolver, useLiveResult } from "@/components/build-math/use-live-result";
import { commissionPaths } from "@/components/commissions/api-paths";
import { BuildOptionsFields } from "@/components/commissions/build-options-fields";
import { useCommissionChange } from "@/components/commissions/use-commission-change";
import { lazyZodResolver } from "@/components/forms/lazy-schema";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { Card, CardBody, CardHeader } from "@/components/ui/card";
import { useToast } from "@/components/ui/toast";
import { ApiError, errorMessage } from "@/lib/http/api-client";
import { DEFAULT_PRESET_ID, presetById } from "@/lib/lutherie/presets";
import { convertSpecUnits } from "@/lib/lutherie/spec-units";
import { forceUnitFor, formatForce, type LengthUnit } from "@/lib/lutherie/units";
import type { BuildOptions } from "@/lib/schemas/build-options";
import { DEFAULT_BUILD_OPTIONS } from "@/lib/schemas/build-options-values";
import type { InstrumentSpec } from "@/lib/schemas/instrument-spec";
import type { SpecVersionDetail, SpecVersionSummary } from "@/lib/schemas/spec-version";
import { diffValues } from "@/lib/workflow/spec-diff";

const buildOptionsResolver = lazyZodResolver(() => import("@/lib/schemas/build-options").then((m) => m.buildOptionsSchema));

export interface SpecEditorProps {
  slug: string;
  commissionId: number;
  fileName: string;
  unit: LengthUnit;
  /** The latest version, which the editor starts from (null: start from a preset). */
  base: SpecVersionDetail | null;
}

export function SpecEditor({ slug, commissionId, fileName, unit, base }: SpecEditorProps) {
  const toast = useToast();
  const initialSpec = useMemo(() => convertSpecUnits(base ? base.spec : presetById(DEFAULT_PRESET_ID).spec, unit), [base, unit]);
  const specForm = useForm<InstrumentSpec>({ resolver: specResolver, mode: "onChange", defaultValues: initialSpec });
  const optionsForm = useForm({ resolver: buildOptionsResolver, defaultValues: base?.options ?? DEFAULT_BUILD_OPTIONS });
  const { result, shown } = useLiveResult(specForm, initialSpec);
  const [formError, setFormError] = useState<string | null>(null);
  const save = useCommissionChange<{ spec: InstrumentSpec; options: BuildOptions }, { version: SpecVersionSummary }>(slug, (body) => ({ path: commissionPaths(slug).versions(commissionId), json: body }));

  const errors = shown.issues.filter((i) => i.level === "error").length;
  const warnings = shown.issues.length - errors;
  const fu = forceUnitFor(unit);

  const focusField = (path: string) => focusSpecField(specForm, path);

  const submit = () => {
    setFormError(null);
    void specForm.handleSubmit(
      (spec) =>
        optionsForm.handleSubmit(
          async (options) => {
            const stored = convertSpecUnits(spec, "mm");
            if (base && diffValues({ spec: convertSpecUnits(base.spec, "mm"), options: base.options }, { spec: stored, options }).length === 0) {
              setFormError(`Nothing has changed since version ${base.version}.`);
              return;
            }
            try {
              const { version } = await save.mutateAsync({ spec: stored, options });
              toast.show(`Saved as version ${version.version}.`, "success");
            } catch (err) {
              setFormError(placeIssues(err));
            }
          },
          () => setFormError("Some build options need fixing (marked below)."),
        )(),
      () => setFormError("Some fields need fixing (marked in the form)."),
    )();
  };

  /** Puts a 422's issues on the spec form or the options form by their path. */
  const placeIssues = (err: unknown): string | null => {
    if (!(err instanceof ApiError) || err.issues.length === 0) return errorMessage(err);
    let unplaced = false;
    for (const i of err.issues) {
      if (i.path.startsWith("spec.")) specForm.setError(i.path.slice(5) as FieldPath<InstrumentSpec>, { type: "server", message: i.message });
      else if (i.path.startsWith("options.")) optionsForm.setError(i.path.slice(8) as keyof BuildOptions, { type: "server", message: i.message });
      else unplaced = true;
    }
    return unplaced ? err.message : "Some fields need fixing (marked in the form).";
  };

  return (
    <div className="space-y-5">
      <Card>
        <CardHeader
          title={base ? `Draft version ${base.version + 1}` : "Draft the first version"}
          subtitle={`Lengths in ${unit === "mm" ? "millimetres" : "inches"} (the workshop's unit); gauges in inches. ${base ? `Starts from version ${base.version}.` : ""}`}
          action={<PresetPicker onPick={(p) => specForm.reset(convertSpecUnits(p.spec, unit))} />}
        />
        <CardBody>
          <form noValidate onSubmit={(e) => e.preventDefault()} aria-label="Instrument spec">
            <SpecFormFields form={specForm} issues={shown.issues} />
          </form>
        </CardBody>
      </Card>

      <Card>
        <CardHeader title="Build options" subtitle="Woods, finish, bridge, hardware and electronics" />
        <CardBody>
          <form noValidate onSubmit={(e) => e.preventDefault()} aria-label="Build options">
            <BuildOptionsFields form={optionsForm} />
          </form>
        </CardBody>
      </Card>

      <div className="sticky bottom-2 z-10 flex flex-wrap items-center justify-between gap-3 rounded-panel border border-spruce-300 bg-white/95 px-4 py-3 shadow-lift backdrop-blur" role="region" aria-label="Live summary">
        <p className="text-sm">
          Total tension{" "}
          <span className="font-mono font-semibold" data-testid="live-total-tension">
            {formatForce(shown.totals.tensionN, fu)} {fu}
          </span>{" "}
          · <span className={errors ? "font-semibold text-ember-700" : undefined}>{errors} errors</span> · <span className={warnings ? "text-amber-700" : undefined}>{warnings} warnings</span>
          {result ? null : <span className="text-amber-700"> · figures from the last valid spec</span>}
        </p>
        <Button onClick={submit} busy={save.isPending}>
          Save as version {base ? base.version + 1 : 1}
        </Button>
      </div>
      {formError ? <Alert tone="error">{formError}</Alert> : null}
      {errors ? <Alert tone="warning">This spec has errors in its build math: it can be saved as a draft, but not sent to the client until a version without errors is saved.</Alert> : null}

      <BuildResults result={shown} stale={!result} onSelectIssue={focusField} fileName={fileName} />
    </div>
  );
}
