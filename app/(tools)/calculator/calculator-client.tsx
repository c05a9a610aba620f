"use client";

// The calculator: the spec form on the left, live results on the right, the spec mirrored into the
// address bar so the link can be shared. Computation runs here in the browser with the same pure
// code as POST /api/compute, so typing never waits on the network.
import { useEffect, useState } from "react";
import { useForm } from "react-hook-form";
import { BuildResults } from "@/components/build-math/build-results";
import { PresetPicker } from "@/components/build-math/preset-picker";
import { SetupHelpers } from "@/components/build-math/lazy-setup-helpers";
import { SpecFormFields } from "@/components/build-math/spec-form";
import { focusSpecField } from "@/components/build-math/spec-form-fields";
import { UnitSwitch } from "@/components/build-math/unit-switch";
import { specResolver, useLiveResult } from "@/components/build-math/use-live-result";
import { Button } from "@/components/ui/button";
import { Card, CardBody, CardHeader } from "@/components/ui/card";
import { useToast } from "@/components/ui/toast";
import { convertSpecUnits } from "@/lib/lutherie/spec-units";
import { encodeSpec, SPEC_QUERY_PARAM } from "@/lib/lutherie/spec-url";
import type { LengthUnit } from "@/lib/lutherie/units";
import type { InstrumentSpec } from "@/lib/schemas/instrument-spec";

/** Values typed as NaN (empty required fields) become empty again before a reset. */
function withoutNaN<T>(value: T): T {
  return JSON.parse(JSON.stringify(value, (_k, v) => (typeof v === "number" && Number.isNaN(v) ? undefined : v))) as T;
}

export function CalculatorClient({ initialSpec, linkProblem }: { initialSpec: InstrumentSpec; linkProblem: boolean }) {
  const toast = useToast();
  const form = useForm<InstrumentSpec>({ resolver: specResolver, mode: "onChange", defaultValues: initialSpec });
  const { values, parsed, result, shown } = useLiveResult(form, initialSpec);
  const [shareUrl, setShareUrl] = useState("");
  const units = (values.units ?? initialSpec.units) as LengthUnit;

  useEffect(() => {
    if (!result || !parsed?.success) return;
    // Mirror the spec into the address bar, a moment after typing stops.
    const t = setTimeout(() => {
      const url = `${window.location.pathname}?${SPEC_QUERY_PARAM}=${encodeSpec(parsed.data)}`;
      window.history.replaceState(window.history.state, "", url);
      setShareUrl(window.location.href);
    }, 250);
    return () => clearTimeout(t);
  }, [result, parsed]);

  const switchUnits = (to: LengthUnit) => form.reset(convertSpecUnits(withoutNaN(form.getValues()), to));

  const focusField = (path: string) => focusSpecField(form, path);

  const copyLink = async () => {
    try {
      await navigator.clipboard.writeText(window.location.href);
      toast.show("Link copied: it opens this exact spec.", "success");
    } catch {
      toast.show("The browser did not allow copying; copy the link from the box instead.", "error");
    }
  };

  const scaleForHelpers = shown.strings[0]?.scaleLength ?? shown.scale.treble;

  return (
    <div className="space-y-6">
      {linkProblem ? (
        <p role="alert" className="rounded-panel border border-ember-100 bg-ember-50 px-4 py-3 text-sm text-ember-700">
          The spec in this link could not be read (it may be cut short or edited), so the 6-string preset is shown instead.
        </p>
      ) : null}
      <div className="flex flex-wrap items-center justify-between gap-3">
        <PresetPicker onPick={(p) => form.reset(convertSpecUnits(p.spec, units))} />
        <UnitSwitch value={units} onChange={switchUnits} />
      </div>

      <div className="grid grid-cols-1 items-start gap-6 lg:grid-cols-[minmax(0,38rem)_minmax(0,1fr)]">
        <Card>
          <CardHeader title="Spec" subtitle="Lengths in the chosen unit; gauges in inches" />
          <CardBody>
            <form noValidate onSubmit={(e) => e.preventDefault()} aria-label="Instrument spec">
              <SpecFormFields form={form} />
            </form>
          </CardBody>
        </Card>

        <div className="min-w-0 space-y-6">
          {result || !parsed ? null : (
            <p role="status" className="rounded-panel border border-amber-100 bg-amber-50 px-4 py-3 text-sm text-amber-700">
              Some fields need fixing (marked in the form). The figures below are for the last valid spec.
            </p>
          )}
          <BuildResults result={shown} stale={!result} onSelectIssue={focusField} fileName="scalewright-frets" />

          <Card>
            <CardHeader title="Setup helpers" subtitle="Pull-test tension and intonation saddle move" />
            <CardBody>
              <SetupHelpers key={units} units={units} scaleLength={scaleForHelpers} />
            </CardBody>
          </Card>

          <Card>
            <CardHeader title="Share this spec" subtitle="The link carries every field; nothing is stored on our side" />
            <CardBody className="flex flex-wrap items-center gap-2">
              <input
                readOnly
                aria-label="Link to this spec"
                value={shareUrl}
                onFocus={(e) => e.currentTarget.select()}
                className="h-10 min-w-0 flex-1 rounded-chip border border-spruce-300 bg-spruce-50 px-3 font-mono text-xs"
              />
              <Button variant="secondary" size="sm" onClick={copyLink}>
                Copy link
              </Button>
            </CardBody>
          </Card>
        </div>
      </div>
    </div>
  );
}
