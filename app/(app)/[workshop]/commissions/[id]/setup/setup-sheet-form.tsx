"use client";

// The final setup sheet form: numbers in the workshop's unit (stored in mm and N), the shared zod
// schema as resolver, the common-practice checks and the helpers' figures live as you type, and
// the server's 422 field errors placed back on their fields.
import { useRouter } from "next/navigation";
import { useMemo, useState } from "react";
import { useForm, useWatch, type Resolver } from "react-hook-form";
import { lazySchema, lazyZodResolver } from "@/components/forms/lazy-schema";
import { useLazySchema } from "@/components/forms/use-lazy-schema";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { Field, describedBy } from "@/components/ui/field";
import { Textarea } from "@/components/ui/input";
import { Select } from "@/components/ui/select";
import { TBody, THead, Table, Td, Th } from "@/components/ui/table";
import type { SetupSheet } from "@/lib/schemas/setup-sheet";
import { ELECTRONICS_CHECKS } from "@/lib/schemas/setup-sheet-values";
import type { SetupSheetView } from "@/lib/schemas/setup-sheet-out";
import { checkSetupSheet } from "@/lib/setup/checks";
import { setupFigures } from "@/lib/setup/figures";
import { describePullTest, describeSaddleMove } from "@/lib/setup/format";
import { setupForceUnit, sheetFromDisplay, sheetToDisplay } from "@/lib/setup/sheet-units";
import { SetupChecks } from "@/components/setup/setup-checks";
import { NumberCell, setupFieldId, useSetupError } from "@/components/setup/setup-fields";
import { saveSetupSheetAction, signSetupSheetAction } from "./actions";

type Values = SetupSheet;

/** A pull test left blank is no pull test. */
function normalise(v: Values): Values {
  return {
    ...v,
    strings: v.strings.map((s) => {
      const pt = s.pullTest as { forceN?: number; deflectionMm?: number } | null | undefined;
      const blank = !pt || (pt.forceN === undefined && pt.deflectionMm === undefined);
      return { ...s, pullTest: blank ? null : s.pullTest };
    }),
  };
}

const setupSheetSchema = lazySchema(() => import("@/lib/schemas/setup-sheet").then((m) => m.setupSheetSchema));
const schemaResolver = lazyZodResolver(setupSheetSchema.load);
const resolver: Resolver<Values> = (values, context, options) => schemaResolver(normalise(values), context, options as never) as never;

function initialValues(view: SetupSheetView): Values {
  if (view.sheet) {
    const d = sheetToDisplay(view.sheet.values, view.unit);
    return { ...d, strings: d.strings.map((s) => ({ ...s, pullTest: s.pullTest ?? ({ forceN: undefined, deflectionMm: undefined } as never) })) };
  }
  const blank = undefined as unknown as number;
  return {
    strings: (view.spec?.strings ?? []).map((s) => ({ string: s.string, actionAt12Mm: blank, nutSlotAt1Mm: blank, intonationCents: blank, pullTest: { forceN: blank, deflectionMm: blank } })),
    neck: { reliefMm: blank, reliefAtFret: 8, trussRodNotes: "" },
    pickups: (view.spec?.pickups ?? []).map((label) => ({ label, bassSideMm: blank, trebleSideMm: blank })),
    electronics: { checks: {}, notes: "" },
    notes: "",
  };
}

export function SetupSheetForm({ slug, view }: { slug: string; view: SetupSheetView }) {
  const router = useRouter();
  const unit = view.unit;
  const fu = setupForceUnit(unit);
  const strings = view.spec?.strings ?? [];
  const [notice, setNotice] = useState<{ tone: "success" | "error"; text: string } | null>(null);
  const form = useForm<Values>({ resolver, defaultValues: initialValues(view), mode: "onBlur" });
  const { register, control, handleSubmit, setError, formState } = form;
  const watched = useWatch({ control }) as Values;
  const schema = useLazySchema(setupSheetSchema);

  // Live: the saddle moves as soon as a string's cents parse; the checks and pull-test figures once
  // the whole sheet parses (in mm, as the server sees it).
  const live = useMemo(() => {
    const withCents = (watched.strings ?? []).filter((s) => Number.isFinite(s?.intonationCents)).map((s) => ({ ...s, pullTest: null }));
    const moves = new Map(setupFigures({ strings: withCents }, strings).map((f) => [f.string, f.saddleMoveMm]));
    const parsed = schema?.safeParse(normalise(watched));
    if (!parsed?.success) return { issues: [], figures: null, moves };
    const mm = sheetFromDisplay(parsed.data, unit);
    return { issues: checkSetupSheet(mm, view.ranges, { stringCount: strings.length, strings, unit }), figures: setupFigures(mm, strings), moves };
  }, [watched, schema, strings, unit, view.ranges]);
  const warningAt = (path: string) => live.issues.find((i) => i.path === path && i.level === "warning")?.message;

  const submit = (sign: boolean) =>
    handleSubmit(async (values) => {
      setNotice(null);
      const saved = await saveSetupSheetAction(slug, { commissionId: view.commission.id, values: sheetFromDisplay(normalise(values), unit) });
      if (!saved.ok) {
        for (const [path, message] of Object.entries(saved.fieldErrors)) setError(path.replace(/^values\./, "") as never, { type: "server", message });
        setNotice({ tone: "error", text: saved.message });
        return;
      }
      let text = `Saved revision ${saved.data.sheet?.revision}.`;
      if (sign) {
        const signed = await signSetupSheetAction(slug, { commissionId: view.commission.id, revision: saved.data.sheet!.revision });
        if (!signed.ok) {
          setNotice({ tone: "error", text: `Saved, but not signed: ${signed.message}` });
          router.refresh();
          return;
        }
        text = signed.data.sheet?.status === "signed" ? `Revision ${signed.data.sheet.revision} is signed and locked.` : `Revision ${signed.data.sheet?.revision} is signed by you and locked; it waits for the owner's sign-off.`;
      }
      const warnings = saved.data.issues.filter((i) => i.level === "warning").length;
      setNotice({ tone: "success", text: warnings ? `${text} ${warnings} value(s) outside the common-practice ranges.` : text });
      router.refresh();
    });

  const reliefError = useSetupError(control, "neck.reliefAtFret");

  return (
    <form onSubmit={submit(false)} noValidate className="space-y-6" aria-label="Setup sheet">
      {notice ? <Alert tone={notice.tone}>{notice.text}</Alert> : null}

      <section aria-labelledby="setup-strings-heading" className="space-y-2">
        <h3 id="setup-strings-heading" className="text-base font-semibold">
          Strings <span className="text-xs font-normal text-graphite-500">(lengths in {unit}, forces in {fu}; strings at pitch, instrument in playing position)</span>
        </h3>
        <Table caption="Measurements per string">
          <THead>
            <tr>
              <Th>String</Th>
              <Th>Action at 12th ({unit})</Th>
              <Th>Nut slot at 1st ({unit})</Th>
              <Th>Intonation at 12th (cents, + sharp)</Th>
              <Th>Suggested saddle move</Th>
              <Th>Pull test force ({fu})</Th>
              <Th>Deflection ({unit})</Th>
              <Th>Pull-test tension / spec / difference</Th>
            </tr>
          </THead>
          <TBody>
            {strings.map((s, i) => {
              const fig = live.figures?.[i];
              const pt = fig?.pullTest ? describePullTest(fig.pullTest, fu) : null;
              return (
                <tr key={s.string}>
                  <Td className="whitespace-nowrap font-semibold">
                    {s.string} <span className="font-mono text-xs text-graphite-500">{s.note}</span>
                    <input type="hidden" {...register(`strings.${i}.string`, { valueAsNumber: true })} />
                  </Td>
                  <Td>
                    <NumberCell control={control} register={register} name={`strings.${i}.actionAt12Mm`} label={`String ${s.string} action at the 12th fret (${unit})`} warning={warningAt(`strings.${i}.actionAt12Mm`)} />
                  </Td>
                  <Td>
                    <NumberCell control={control} register={register} name={`strings.${i}.nutSlotAt1Mm`} label={`String ${s.string} nut slot height at the 1st fret (${unit})`} warning={warningAt(`strings.${i}.nutSlotAt1Mm`)} />
                  </Td>
                  <Td>
                    <NumberCell control={control} register={register} name={`strings.${i}.intonationCents`} label={`String ${s.string} intonation error at the 12th fret (cents)`} warning={warningAt(`strings.${i}.intonationCents`)} />
                  </Td>
                  <Td className="whitespace-nowrap text-xs" aria-live="polite" data-testid={`saddle-move-${s.string}`}>
                    {describeSaddleMove(live.moves.get(s.string) ?? null, unit)}
                  </Td>
                  <Td>
                    <NumberCell control={control} register={register} name={`strings.${i}.pullTest.forceN`} label={`String ${s.string} pull test force (${fu})`} optional warning={warningAt(`strings.${i}.pullTest.forceN`)} />
                  </Td>
                  <Td>
                    <NumberCell control={control} register={register} name={`strings.${i}.pullTest.deflectionMm`} label={`String ${s.string} pull test deflection (${unit})`} optional />
                  </Td>
                  <Td className="whitespace-nowrap text-xs" data-testid={`pull-test-${s.string}`}>
                    {pt ? `${pt.measured} / ${pt.spec} / ${pt.difference}` : "-"}
                  </Td>
                </tr>
              );
            })}
          </TBody>
        </Table>
        <p className="text-xs text-graphite-500">
          Saddle move by model B over each string&apos;s own scale length: the move lengthens the open string and its fretted half; retune and
          measure again. Pull test: push the string sideways at mid-span with a force gauge; the tension is F / (2 sin θ), θ = atan(2δ/S), S
          the scale length. Keep the deflection small and wear eye protection.
        </p>
      </section>

      <section aria-labelledby="setup-neck-heading" className="grid gap-4 sm:grid-cols-[repeat(2,minmax(0,12rem))_1fr]">
        <h3 id="setup-neck-heading" className="text-base font-semibold sm:col-span-3">
          Neck
        </h3>
        <NumberCell control={control} register={register} name="neck.reliefMm" label={`Neck relief (${unit})`} visibleLabel warning={warningAt("neck.reliefMm")} />
        <Field id={setupFieldId("neck.reliefAtFret")} label="Measured at fret" error={reliefError}>
          <Select
            id={setupFieldId("neck.reliefAtFret")}
            {...describedBy(setupFieldId("neck.reliefAtFret"), reliefError)}
            options={[7, 8, 9].map((n) => ({ value: String(n), label: `Fret ${n}` }))}
            {...register("neck.reliefAtFret", { valueAsNumber: true })}
          />
        </Field>
        <Field id={setupFieldId("neck.trussRodNotes")} label="Truss rod notes">
          <Textarea id={setupFieldId("neck.trussRodNotes")} rows={2} placeholder="Direction and amount of each adjustment, how the neck settled" {...register("neck.trussRodNotes")} />
        </Field>
      </section>

      {view.spec?.pickups.length ? (
        <section aria-labelledby="setup-pickups-heading" className="space-y-2">
          <h3 id="setup-pickups-heading" className="text-base font-semibold">
            Pickup height <span className="text-xs font-normal text-graphite-500">(pole top to string, string held at the last fret, {unit})</span>
          </h3>
          <Table caption="Pickup heights">
            <THead>
              <tr>
                <Th>Pickup</Th>
                <Th>Bass side ({unit})</Th>
                <Th>Treble side ({unit})</Th>
              </tr>
            </THead>
            <TBody>
              {view.spec.pickups.map((label, i) => (
                <tr key={`${label}-${i}`}>
                  <Td className="font-semibold">
                    {label}
                    <input type="hidden" {...register(`pickups.${i}.label`)} />
                  </Td>
                  <Td>
                    <NumberCell control={control} register={register} name={`pickups.${i}.bassSideMm`} label={`${label} pickup height, bass side (${unit})`} warning={warningAt(`pickups.${i}.bassSideMm`)} />
                  </Td>
                  <Td>
                    <NumberCell control={control} register={register} name={`pickups.${i}.trebleSideMm`} label={`${label} pickup height, treble side (${unit})`} warning={warningAt(`pickups.${i}.trebleSideMm`)} />
                  </Td>
                </tr>
              ))}
            </TBody>
          </Table>
        </section>
      ) : null}

      <fieldset className="space-y-2">
        <legend className="text-base font-semibold">Electronics</legend>
        <ul className="grid gap-1 sm:grid-cols-2">
          {ELECTRONICS_CHECKS.map((c) => (
            <li key={c.key}>
              <label className="flex items-start gap-2 text-sm">
                <input type="checkbox" className="mt-1" {...register(`electronics.checks.${c.key}`)} />
                {c.label}
              </label>
            </li>
          ))}
        </ul>
        <Field id={setupFieldId("electronics.notes")} label="Electronics notes">
          <Textarea id={setupFieldId("electronics.notes")} rows={2} {...register("electronics.notes")} />
        </Field>
        <p className="text-xs text-graphite-500">Pickup wiring and anything mains-powered: follow local electrical codes and licensed practice.</p>
      </fieldset>

      <Field id={setupFieldId("notes")} label="Other notes">
        <Textarea id={setupFieldId("notes")} rows={3} {...register("notes")} />
      </Field>

      <section aria-labelledby="setup-checks-heading" className="space-y-2">
        <h3 id="setup-checks-heading" className="text-base font-semibold">
          Checks
        </h3>
        {live.figures ? <SetupChecks issues={live.issues} idPrefix="setup" /> : <p className="text-sm text-graphite-500">Fill in every measurement to see the checks.</p>}
      </section>

      <div className="flex flex-wrap gap-3">
        <Button type="submit" variant="secondary" busy={formState.isSubmitting}>
          Save draft
        </Button>
        <Button type="button" onClick={submit(true)} busy={formState.isSubmitting}>
          Save and sign
        </Button>
      </div>
      <p className="text-xs text-graphite-500">
        Signing locks this revision{view.requireOwnerSignoff ? "; the workshop's owner then signs it off" : ""}. A change after that starts a new revision.
      </p>
    </form>
  );
}
