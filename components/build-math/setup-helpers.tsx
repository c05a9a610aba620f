"use client";

// Setup helpers beside a spec: tension from a pull test and the saddle move for a 12th-fret error.
import { useId, useState } from "react";
import { Field } from "@/components/ui/field";
import { Input } from "@/components/ui/input";
import { pullTestTension, saddleMoveForCents } from "@/lib/lutherie/setup";
import { forceUnitFor, formatForce, formatLengthIn, type LengthUnit } from "@/lib/lutherie/units";

function parseInput(text: string): number {
  return text.trim() === "" ? Number.NaN : Number(text.replace(",", "."));
}

function NumberInput({ label, value, onChange, hint, error }: { label: string; value: string; onChange: (v: string) => void; hint?: string; error?: string }) {
  const id = useId();
  return (
    <Field id={id} label={label} hint={hint} error={error}>
      <Input id={id} inputMode="decimal" value={value} onChange={(e) => onChange(e.target.value)} aria-invalid={error ? true : undefined} />
    </Field>
  );
}

export function SetupHelpers({ units, scaleLength }: { units: LengthUnit; scaleLength: number }) {
  const [force, setForce] = useState("5");
  const [deflection, setDeflection] = useState(units === "in" ? "0.1" : "2.5");
  const [span, setSpan] = useState(String(Math.round(scaleLength * 1000) / 1000));
  const [cents, setCents] = useState("4");
  const f = parseInput(force);
  const d = parseInput(deflection);
  const s = parseInput(span);
  const c = parseInput(cents);
  const pullOk = f > 0 && d > 0 && s > 0 && d < s / 2;
  const pull = pullOk ? pullTestTension(f, d, s) : null;
  const moveOk = Number.isFinite(c) && Math.abs(c) <= 100 && s > 0;
  const move = moveOk ? saddleMoveForCents(s, c) : null;
  const fu = forceUnitFor(units);

  return (
    <div className="grid gap-6 md:grid-cols-2">
      <section aria-labelledby="pull-test" className="space-y-3">
        <h3 id="pull-test" className="text-base font-semibold">
          Tension from a pull test
        </h3>
        <p className="text-xs text-graphite-500">
          Pull the string sideways at mid-span with a force gauge and measure how far the midpoint moves. T = F / (2 sin θ), θ = atan(2δ/S).
          Keep the deflection small and wear eye protection.
        </p>
        <div className="grid grid-cols-3 gap-3">
          <NumberInput label="Force (N)" value={force} onChange={setForce} error={f > 0 ? undefined : "Above 0"} />
          <NumberInput label={`Deflection (${units})`} value={deflection} onChange={setDeflection} error={d > 0 && d < s / 2 ? undefined : "Above 0, below half the span"} />
          <NumberInput label={`Span (${units})`} value={span} onChange={setSpan} error={s > 0 ? undefined : "Above 0"} />
        </div>
        <p className="text-sm" aria-live="polite">
          {pull ? (
            <>
              Tension <strong>{formatForce(pull.tensionN, "N")} N</strong> ({formatForce(pull.tensionN, "lbf")} lbf); small-angle estimate{" "}
              {formatForce(pull.smallAngleTensionN, fu)} {fu}.
            </>
          ) : (
            "Enter the force, deflection and span."
          )}
        </p>
      </section>
      <section aria-labelledby="saddle-move" className="space-y-3">
        <h3 id="saddle-move" className="text-base font-semibold">
          Saddle move for a 12th-fret error
        </h3>
        <p className="text-xs text-graphite-500">
          Compare the note fretted at 12 with the open string&apos;s octave (positive cents: sharp). Model B: the move lengthens the open
          string and the fretted half, then you retune. Uses the span above as the scale length.
        </p>
        <NumberInput label="Error at fret 12 (cents)" value={cents} onChange={setCents} error={moveOk ? undefined : "Between −100 and 100"} />
        <p className="text-sm" aria-live="polite">
          {move !== null ? (
            <>
              Move the saddle <strong>{formatLengthIn(Math.abs(move), units)} {units}</strong>{" "}
              {move > 0 ? "away from the nut (the note is sharp)" : move < 0 ? "toward the nut (the note is flat)" : "— no move needed"}. Retune and check again.
            </>
          ) : (
            "Enter the error in cents."
          )}
        </p>
      </section>
    </div>
  );
}
